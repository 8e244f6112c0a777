/**
 * How each quantity is shown in either unit system: the one table the UI (`frontend/src/lib/units.ts`)
 * and the server-built report (`backend/src/reports/report-units.ts`) both read, so a label, a factor
 * or a number of decimals is changed in one place. Factors are exact definitions (NIST SP 811,
 * Appendix B) or built from them, so a round trip loses nothing but floating-point noise.
 *
 * shown = valueSi / siPerUnit + offset;  valueSi = (shown − offset) × siPerUnit
 */

export type UnitSystem = 'si' | 'us';

// Exact definitions.
export const METRES_PER_FOOT = 0.3048;
export const SQUARE_METRES_PER_SQUARE_FOOT = METRES_PER_FOOT ** 2; // 0.092 903 04
export const CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3; // 0.028 316 846 592
export const JOULES_PER_BTU = 1055.05585262; // International Table Btu
export const SECONDS_PER_HOUR = 3600;
export const JOULES_PER_KWH = 3.6e6;
export const KELVIN_PER_FAHRENHEIT_DEGREE = 5 / 9;
export const LITRES_PER_US_GALLON = 3.785411784;
export const KILOGRAMS_PER_POUND = 0.45359237;
export const SQUARE_METRES_PER_SQUARE_INCH = 0.0254 ** 2; // 6.4516 E-04
export const LUX_PER_FOOTCANDLE = 1 / SQUARE_METRES_PER_SQUARE_FOOT; // lumen per ft² → lumen per m²
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665; // defines the pound-force
export const METRES_PER_SECOND_PER_MILE_PER_HOUR = 0.44704;
/** lbf/in² = 0.453 592 37 kg × 9.806 65 m/s² / (0.0254 m)² */
export const PASCALS_PER_PSI = (KILOGRAMS_PER_POUND * STANDARD_GRAVITY_M_PER_S2) / SQUARE_METRES_PER_SQUARE_INCH;
/** 1 therm = 100 000 Btu_IT (the "EC" therm; the US-statute therm on the 59 °F Btu is 0.02 % smaller). */
export const JOULES_PER_THERM = 1e5 * JOULES_PER_BTU;
export const JOULES_PER_MMBTU = 1e6 * JOULES_PER_BTU;

// Derived from the exact ones.
export const WATTS_PER_BTU_PER_HOUR = JOULES_PER_BTU / SECONDS_PER_HOUR;
export const WATTS_PER_M2K_PER_BTU_PER_HFT2F =
  WATTS_PER_BTU_PER_HOUR / SQUARE_METRES_PER_SQUARE_FOOT / KELVIN_PER_FAHRENHEIT_DEGREE;
export const CUBIC_METRES_PER_SECOND_PER_CFM = CUBIC_METRES_PER_CUBIC_FOOT / 60;
export const M3_PER_S_M2_PER_CFM_PER_FT2 = CUBIC_METRES_PER_SECOND_PER_CFM / SQUARE_METRES_PER_SQUARE_FOOT;
export const W_PER_MK_PER_BTU_PER_HFTF = WATTS_PER_BTU_PER_HOUR / METRES_PER_FOOT / KELVIN_PER_FAHRENHEIT_DEGREE;
export const W_PER_K_PER_BTU_PER_HF = WATTS_PER_BTU_PER_HOUR / KELVIN_PER_FAHRENHEIT_DEGREE;
export const METRES_PER_SECOND_PER_FOOT_PER_MINUTE = METRES_PER_FOOT / 60;
export const KG_PER_M3_PER_LB_PER_FT3 = KILOGRAMS_PER_POUND / CUBIC_METRES_PER_CUBIC_FOOT;
export const J_PER_KGK_PER_BTU_PER_LBF = JOULES_PER_BTU / KILOGRAMS_PER_POUND / KELVIN_PER_FAHRENHEIT_DEGREE;
/** combustion-air inlet sizing: in² of free area per 1000 Btu/h of heater input */
export const M2_PER_W_PER_IN2_PER_KBTUH = SQUARE_METRES_PER_SQUARE_INCH / (1000 * WATTS_PER_BTU_PER_HOUR);

export interface DisplayUnit {
  /** symbol shown after the number */
  label: string;
  /** SI value per shown unit */
  siPerUnit: number;
  /** decimals shown and offered in inputs */
  decimals: number;
  /** added after scaling (°F only) */
  offset?: number;
}

const unit = (label: string, siPerUnit: number, decimals: number, offset?: number): DisplayUnit =>
  offset === undefined ? { label, siPerUnit, decimals } : { label, siPerUnit, decimals, offset };

/** SI units per quantity: the API's unit, except power (W shown as kW) and energy (J as kWh). */
export const DISPLAY_UNITS = {
  length: { si: unit('m', 1, 2), us: unit('ft', METRES_PER_FOOT, 1) },
  area: { si: unit('m²', 1, 1), us: unit('ft²', SQUARE_METRES_PER_SQUARE_FOOT, 0) },
  // SI value in m², for openings such as a combustion-air inlet: cm² / in²
  smallArea: { si: unit('cm²', 1e-4, 0), us: unit('in²', SQUARE_METRES_PER_SQUARE_INCH, 0) },
  volume: { si: unit('m³', 1, 0), us: unit('ft³', CUBIC_METRES_PER_CUBIC_FOOT, 0) },
  temperature: { si: unit('°C', 1, 1), us: unit('°F', KELVIN_PER_FAHRENHEIT_DEGREE, 1, 32) },
  temperatureDifference: { si: unit('K', 1, 1), us: unit('°F', KELVIN_PER_FAHRENHEIT_DEGREE, 1) },
  power: { si: unit('kW', 1000, 1), us: unit('Btu/h', WATTS_PER_BTU_PER_HOUR, 0) },
  uValue: { si: unit('W/(m²·K)', 1, 2), us: unit('Btu/(h·ft²·°F)', WATTS_PER_M2K_PER_BTU_PER_HFT2F, 3) },
  airFlow: { si: unit('m³/s', 1, 2), us: unit('cfm', CUBIC_METRES_PER_SECOND_PER_CFM, 0) },
  airFlowPerFloorArea: { si: unit('m³/(s·m²)', 1, 4), us: unit('cfm/ft²', M3_PER_S_M2_PER_CFM_PER_FT2, 1) },
  energy: { si: unit('kWh', JOULES_PER_KWH, 0), us: unit('MMBtu', JOULES_PER_MMBTU, 2) },
  irradiance: { si: unit('W/m²', 1, 0), us: unit('W/m²', 1, 0) },
  // electrical input of lamps per floor area: W/m² / W/ft² (1 W/ft² = 10.764 W/m²)
  powerPerFloorArea: { si: unit('W/m²', 1, 1), us: unit('W/ft²', 1 / SQUARE_METRES_PER_SQUARE_FOOT, 2) },
  heatContentPerVolume: {
    si: unit('MJ/m³', 1e6, 1),
    us: unit('Btu/ft³', JOULES_PER_BTU / CUBIC_METRES_PER_CUBIC_FOOT, 0),
  },
  // SI value is J per litre here (fuel is bought by the litre)
  heatContentPerLiquidVolume: {
    si: unit('MJ/L', 1e6, 2),
    us: unit('Btu/gal', JOULES_PER_BTU / LITRES_PER_US_GALLON, 0),
  },
  heatContentPerMass: { si: unit('MJ/kg', 1e6, 1), us: unit('Btu/lb', JOULES_PER_BTU / KILOGRAMS_PER_POUND, 0) },
  // The season routes give energy in kWh (not J): this quantity's SI value is kWh.
  energyKWh: { si: unit('kWh', 1, 0), us: unit('MMBtu', JOULES_PER_MMBTU / JOULES_PER_KWH, 2) },
  // K·day to a base temperature; a °F·day is 5/9 of a K·day.
  degreeDays: { si: unit('K·d', 1, 0), us: unit('°F·d', KELVIN_PER_FAHRENHEIT_DEGREE, 0) },
  // A share 0–1 shown as a percentage (clearness, light transmission, efficiency).
  fraction: { si: unit('%', 0.01, 0), us: unit('%', 0.01, 0) },
  durationHours: { si: unit('h', 1, 1), us: unit('h', 1, 1) },
  // perimeter heat-loss factor F (W per metre of perimeter per kelvin)
  perimeterFactor: { si: unit('W/(m·K)', 1, 2), us: unit('Btu/(h·ft·°F)', W_PER_MK_PER_BTU_PER_HFTF, 3) },
  // UA of a whole house
  conductance: { si: unit('W/K', 1, 0), us: unit('Btu/(h·°F)', W_PER_K_PER_BTU_PER_HF, 0) },
  velocity: { si: unit('m/s', 1, 2), us: unit('ft/min', METRES_PER_SECOND_PER_FOOT_PER_MINUTE, 0) },
  // wind is read in m/s and in miles per hour
  windSpeed: { si: unit('m/s', 1, 1), us: unit('mph', METRES_PER_SECOND_PER_MILE_PER_HOUR, 1) },
  illuminance: { si: unit('lx', 1, 0), us: unit('fc', LUX_PER_FOOTCANDLE, 0) },
  pressure: { si: unit('kPa', 1000, 1), us: unit('psi', PASCALS_PER_PSI, 2) },
  density: { si: unit('kg/m³', 1, 3), us: unit('lb/ft³', KG_PER_M3_PER_LB_PER_FT3, 4) },
  specificHeat: { si: unit('J/(kg·K)', 1, 0), us: unit('Btu/(lb·°F)', J_PER_KGK_PER_BTU_PER_LBF, 3) },
  // SI value in m² per W; shown as cm² per kW (1 cm²/kW = 1E-07 m²/W)
  areaPerPower: { si: unit('cm²/kW', 1e-7, 1), us: unit('in² per 1,000 Btu/h', M2_PER_W_PER_IN2_PER_KBTUH, 2) },
} satisfies Record<string, Record<UnitSystem, DisplayUnit>>;

/** Every quantity the app shows; the prose token kinds (`QuantityKind`) are a subset. */
export type DisplayQuantity = keyof typeof DISPLAY_UNITS;

export function isDisplayQuantity(name: string): name is DisplayQuantity {
  return Object.prototype.hasOwnProperty.call(DISPLAY_UNITS, name);
}

/** SI value → number in the reader's unit (unrounded). */
export function siToShown(quantity: DisplayQuantity, valueSi: number, system: UnitSystem): number {
  const shown: DisplayUnit = DISPLAY_UNITS[quantity][system];
  return valueSi / shown.siPerUnit + (shown.offset ?? 0);
}

/** Number in the reader's unit → SI value. */
export function shownToSi(quantity: DisplayQuantity, value: number, system: UnitSystem): number {
  const shown: DisplayUnit = DISPLAY_UNITS[quantity][system];
  return (value - (shown.offset ?? 0)) * shown.siPerUnit;
}

/**
 * The unit strings the API writes beside SI numbers (e.g. in assumption lists) → the quantity that
 * converts them. Units that read the same in both systems (1/h, %, ppm, fraction, counts) are absent.
 */
const QUANTITY_OF_SI_UNIT: Record<string, DisplayQuantity> = {
  m: 'length',
  'm²': 'area',
  'm³': 'volume',
  '°C': 'temperature',
  K: 'temperatureDifference',
  W: 'power',
  'W/(m²·K)': 'uValue',
  'W/(m·K)': 'perimeterFactor',
  'W/K': 'conductance',
  'm³/s': 'airFlow',
  'm³/(s·m²)': 'airFlowPerFloorArea',
  'W/m²': 'irradiance',
  'm/s': 'velocity',
  lx: 'illuminance',
  Pa: 'pressure',
  'kg/m³': 'density',
  'J/(kg·K)': 'specificHeat',
  'm²/W': 'areaPerPower',
};

export function quantityOfSiUnit(unit: string): DisplayQuantity | null {
  return QUANTITY_OF_SI_UNIT[unit.trim()] ?? null;
}
