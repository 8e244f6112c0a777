import { ApiProperty } from '@nestjs/swagger';
import type { StoredCalibrationResult, StoredMeter, StoredPeriod } from '../calibration-types';

export class CalibrationPeriodDto implements StoredPeriod {
  @ApiProperty({ description: 'the fuel record this period is' }) recordId: number;
  @ApiProperty() startDate: string;
  @ApiProperty() endDate: string;
  @ApiProperty() days: number;
  @ApiProperty({ enum: ['temperature-log', 'normals'], description: 'where the outdoor temperatures came from' })
  climateFrom: 'temperature-log' | 'normals';
  @ApiProperty({ type: String, nullable: true }) temperatureLogName: string | null;
  @ApiProperty() quantityUnit: string;
  @ApiProperty({ description: 'billed, in quantityUnit' }) billedQuantity: number;
  @ApiProperty({ description: 'modelled with the handbook heat loss, non-heating use included, in quantityUnit' })
  handbookQuantity: number;
  @ApiProperty({ type: Number, nullable: true, description: 'modelled with the fitted factor, in quantityUnit' })
  fittedQuantity: number | null;
  @ApiProperty({ description: 'kWh of fuel energy' }) billedFuelKWh: number;
  @ApiProperty() handbookFuelKWh: number;
  @ApiProperty({ type: Number, nullable: true }) fittedFuelKWh: number | null;
  @ApiProperty() nonHeatingFuelKWh: number;
  @ApiProperty() usedInFit: boolean;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
}

export class CalibrationMeterDto implements StoredMeter {
  @ApiProperty({ description: "one fuel and one set of houses, e.g. 'propane:3,4'" }) key: string;
  @ApiProperty() fuelId: string;
  @ApiProperty() fuelLabel: string;
  @ApiProperty({ type: [Number] }) houseIds: number[];
  @ApiProperty({ type: [String] }) houseNames: string[];
  @ApiProperty() fitted: boolean;
  @ApiProperty({ type: String, nullable: true, description: 'why no factor was fitted' }) refusal: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 'multiplier on the heat-loss coefficient' })
  factor: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'lower end of the 90 % interval' })
  factorLow90: number | null;
  @ApiProperty({ type: Number, nullable: true }) factorHigh90: number | null;
  @ApiProperty({ type: Number, nullable: true }) standardError: number | null;
  @ApiProperty({ type: Number, nullable: true }) degreesOfFreedom: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'ASHRAE Guideline 14 NMBE, %' }) nmbePercent: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'ASHRAE Guideline 14 CV(RMSE), %' })
  cvRmsePercent: number | null;
  @ApiProperty({ type: Boolean, nullable: true, description: '|NMBE| ≤ 5 % and CV(RMSE) ≤ 15 % (monthly limits)' })
  meetsGuideline14: boolean | null;
  @ApiProperty() verdict: string;
  @ApiProperty() meaning: string;
  @ApiProperty({ type: [CalibrationPeriodDto] }) periods: CalibrationPeriodDto[];
}

export class CalibrationHouseFactorDto {
  @ApiProperty() houseId: number;
  @ApiProperty() name: string;
  @ApiProperty({ type: Number, nullable: true }) factor: number | null;
  @ApiProperty({ type: String, nullable: true }) meterKey: string | null;
}

export class CalibrationDto implements StoredCalibrationResult {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty({ description: 'when the calibration was run, ISO 8601' }) createdAt: string;
  @ApiProperty({ description: 'fuel records the fit ran on' }) recordCount: number;
  @ApiProperty({ type: [CalibrationMeterDto] }) meters: CalibrationMeterDto[];
  @ApiProperty({ type: [CalibrationHouseFactorDto] }) houses: CalibrationHouseFactorDto[];
  @ApiProperty({ type: [String] }) notes: string[];
}
