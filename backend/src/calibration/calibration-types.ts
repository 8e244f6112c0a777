/** What a saved calibration keeps: the inputs it ran on and its result, as stored JSON. */

export interface CalibrationInputsSnapshot {
  records: Array<{
    id: number;
    fuelId: string;
    quantity: number;
    quantityUnit: string;
    fuelEnergyKWh: number;
    startDate: string;
    endDate: string;
    houseIds: number[];
    nonHeatingPerDay: number | null;
    climateFrom: 'temperature-log' | 'normals';
    temperatureLogId: number | null;
  }>;
  houses: Array<{
    id: number;
    name: string;
    version: number;
    dayHeatingC: number;
    nightHeatingC: number;
    calendarPeriodCount: number;
  }>;
  /** records left out (no house left on them), with why */
  skipped: Array<{ recordId: number; reason: string }>;
}

export interface StoredPeriod {
  recordId: number;
  startDate: string;
  endDate: string;
  days: number;
  climateFrom: 'temperature-log' | 'normals';
  temperatureLogName: string | null;
  quantityUnit: string;
  billedQuantity: number;
  handbookQuantity: number;
  fittedQuantity: number | null;
  billedFuelKWh: number;
  handbookFuelKWh: number;
  fittedFuelKWh: number | null;
  nonHeatingFuelKWh: number;
  usedInFit: boolean;
  note: string | null;
}

export interface StoredMeter {
  key: string;
  fuelId: string;
  fuelLabel: string;
  houseIds: number[];
  houseNames: string[];
  fitted: boolean;
  refusal: string | null;
  factor: number | null;
  factorLow90: number | null;
  factorHigh90: number | null;
  standardError: number | null;
  degreesOfFreedom: number | null;
  nmbePercent: number | null;
  cvRmsePercent: number | null;
  meetsGuideline14: boolean | null;
  verdict: string;
  meaning: string;
  periods: StoredPeriod[];
}

export interface StoredCalibrationResult {
  meters: StoredMeter[];
  houses: Array<{ houseId: number; name: string; factor: number | null; meterKey: string | null }>;
  notes: string[];
}
