import { IsCalendarDate, Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateBy,
  ValidateNested,
  type ValidationOptions,
  IsObject,
} from 'class-validator';
import { BOUNDS, HEATER_TYPES, type HeaterType } from '@thermbay/engine/vocabulary';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import { MEASURE_KINDS, type MeasureKind } from '@thermbay/engine/season/measures';
import { HEAT_LOSS_BASES, type HeatLossBasis } from './heat-loss-basis.dto';

export const PRICE_UNITS: readonly PriceUnit[] = ['si', 'us'];

/** Logged temperatures of the farm in place of its climate normals. */
export class TemperatureLogClimateSourceDto {
  @ApiProperty({ description: 'id of one of the farm’s temperature logs' }) temperatureLogId: number;
}

/** 'normals' = the farm's climate (monthly normals); { temperatureLogId } = one of its logs. */
export type ClimateSource = 'normals' | TemperatureLogClimateSourceDto;

export const CLIMATE_SOURCE_SCHEMA = {
  oneOf: [{ type: 'string', enum: ['normals'] }, { $ref: getSchemaPath(TemperatureLogClimateSourceDto) }],
  description:
    "'normals' (default: the farm's monthly climate normals) or { temperatureLogId } to use a logged year instead",
};

function IsClimateSource(options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isClimateSource',
      validator: {
        validate: (value: unknown) => {
          if (value === 'normals') return true;
          if (!value || typeof value !== 'object' || Array.isArray(value)) return false;
          const keys = Object.keys(value);
          const id = (value as { temperatureLogId?: unknown }).temperatureLogId;
          return keys.length === 1 && keys[0] === 'temperatureLogId' && Number.isInteger(id) && (id as number) > 0;
        },
        defaultMessage: () => "climateSource must be 'normals' or { temperatureLogId: <a log id> }",
      },
    },
    options,
  );
}

/** Options every per-house season calculation shares; each defaults from the house and the farm. */
export class SeasonOptionsDto {
  @ApiPropertyOptional(CLIMATE_SOURCE_SCHEMA)
  @Omittable()
  @IsClimateSource()
  climateSource?: ClimateSource;

  @ApiPropertyOptional({ description: "reference-data fuels id; default: the fuel of the house's first heater" })
  @Omittable()
  @IsString()
  @MaxLength(100)
  fuelId?: string;

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 1e6,
    description: "money per purchase unit; default: the farm's price for the fuel",
  })
  @Omittable()
  @IsNumber()
  @Min(0)
  @Max(1e6)
  pricePerUnit?: number;

  @ApiPropertyOptional({
    enum: PRICE_UNITS,
    description: "unit the given pricePerUnit is per: 'si' (the fuel's unitSi, default) or 'us' (its unitUs)",
  })
  @Omittable()
  @IsIn(PRICE_UNITS)
  priceUnit?: PriceUnit;

  @ApiPropertyOptional({
    minimum: BOUNDS.heaterEfficiency.min,
    maximum: BOUNDS.heaterEfficiency.max,
    description: "output ÷ input; default: the efficiency of the house's first heater burning the fuel",
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.heaterEfficiency.min)
  @Max(BOUNDS.heaterEfficiency.max)
  heaterEfficiency?: number;
}

export class SeasonRequestDto extends SeasonOptionsDto {
  @ApiPropertyOptional({
    description:
      "run for one of the house's alternatives instead of the house (its fields merged onto the house, and its calendar if it has one)",
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  alternativeId?: number;

  @ApiPropertyOptional({
    example: '2026-09-01',
    description:
      'first day, YYYY-MM-DD; give both dates or neither. Default: the heating season in progress or, between seasons, the next one (1 Sep – 31 May north of the equator, 1 Mar – 30 Nov south); with a temperature log, the whole days the log covers (at most 366)',
  })
  @Omittable()
  @IsCalendarDate()
  startDate?: string;

  @ApiPropertyOptional({
    example: '2027-05-31',
    description: 'last day (inclusive), YYYY-MM-DD; at most 366 days from startDate',
  })
  @Omittable()
  @IsCalendarDate()
  endDate?: string;

  @ApiPropertyOptional({
    enum: HEAT_LOSS_BASES,
    description:
      "'handbook' (default) or 'calibrated': each house's heat-loss coefficient × the factor of the farm's newest calibration against its fuel bills (a house without one stays on the handbook, and the answer says so)",
  })
  @Omittable()
  @IsIn(HEAT_LOSS_BASES)
  heatLossBasis?: HeatLossBasis;
}

export class NightDemandRequestDto extends SeasonOptionsDto {
  @ApiProperty({ example: '2027-01-15', description: 'the evening the night begins, YYYY-MM-DD' })
  @IsCalendarDate()
  date: string;

  @ApiPropertyOptional({
    minimum: BOUNDS.setpointC.min,
    maximum: BOUNDS.setpointC.max,
    description: "°C; default: the house's night setpoint",
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  nightSetpointC?: number;
}

export class MeasureFuelPriceDto {
  @ApiProperty({ description: 'reference-data fuels id' }) @IsString() @MaxLength(100) fuelId: string;
  @ApiPropertyOptional({
    minimum: 0,
    maximum: 1e6,
    description: 'without a price the fuel switch is reported as not applicable',
  })
  @Omittable()
  @IsNumber()
  @Min(0)
  @Max(1e6)
  pricePerUnit?: number;
  @ApiPropertyOptional({ enum: PRICE_UNITS, description: 'needed with a price' })
  @Omittable()
  @IsIn(PRICE_UNITS)
  priceUnit?: PriceUnit;
}

/** One energy measure; only the settings of its kind apply, the rest default from reference-data/measures.json. */
export class MeasureDto {
  @ApiProperty({ enum: MEASURE_KINDS }) @IsIn(MEASURE_KINDS) kind: MeasureKind;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    maximum: 1e9,
    description:
      'what the measure costs, same currency as the fuel price; omit (or null) when not known yet: the payback then asks for it',
  })
  @IsOptional()
  @IsNumber()
  @Min(0)
  @Max(1e9)
  costAmount?: number | null;

  @ApiPropertyOptional({ maxLength: 100 }) @Omittable() @IsString() @MaxLength(100) label?: string;

  @ApiPropertyOptional({
    enum: ['roof', 'sidewalls'],
    isArray: true,
    description: 'second-poly-layer: surfaces to cover',
  })
  @Omittable()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(2)
  @IsIn(['roof', 'sidewalls'], { each: true })
  surfaces?: Array<'roof' | 'sidewalls'>;

  @ApiPropertyOptional({ description: 'second-poly-layer: the coverings id the surfaces become' })
  @Omittable()
  @IsString()
  @MaxLength(100)
  coveringId?: string;

  @ApiPropertyOptional({
    description: 'perimeter-insulation: kneewalls id the kneewall is built of (default 2 in foam board)',
  })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  kneewallId?: string;

  @ApiPropertyOptional({
    minimum: BOUNDS.kneewallHeightM.min,
    maximum: BOUNDS.kneewallHeightM.max,
    description: 'perimeter-insulation: kneewall height, m, where the house gives none (default 0.91 m)',
  })
  @IsOptional()
  @IsNumber()
  @Min(BOUNDS.kneewallHeightM.min)
  @Max(BOUNDS.kneewallHeightM.max)
  kneewallHeightM?: number;

  @ApiPropertyOptional({ description: 'thermal-curtain: curtains id' })
  @Omittable()
  @IsString()
  @MaxLength(100)
  curtainId?: string;

  @ApiPropertyOptional({ description: 'sealing: air-leakage class to reach' })
  @Omittable()
  @IsString()
  @MaxLength(100)
  airLeakageClassId?: string;

  @ApiPropertyOptional({
    minimum: BOUNDS.airChangesPerHour.min,
    maximum: BOUNDS.airChangesPerHour.max,
    description: 'sealing: measured air changes per hour after sealing',
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.airChangesPerHour.min)
  @Max(BOUNDS.airChangesPerHour.max)
  airChangesPerHour?: number;

  @ApiPropertyOptional({
    minimum: 0,
    maximum: 15,
    description: 'night-setpoint-lower: K (0 is accepted and reported as not applicable)',
  })
  @Omittable()
  @IsNumber()
  @Min(0)
  @Max(15)
  lowerByK?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: 180, description: 'later-start: days' })
  @Omittable()
  @IsInt()
  @Min(1)
  @Max(180)
  delayDays?: number;

  @ApiPropertyOptional({
    enum: HEATER_TYPES,
    description:
      'heater-efficiency: the kind of heater the units are replaced by (default: condensing); its typical efficiency applies unless `efficiency` is given',
  })
  @IsOptional()
  @IsIn(HEATER_TYPES)
  heaterType?: HeaterType;

  @ApiPropertyOptional({
    minimum: BOUNDS.heaterEfficiency.min,
    maximum: BOUNDS.heaterEfficiency.max,
    description: 'heater-efficiency / fuel-switch: efficiency of the new heaters',
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.heaterEfficiency.min)
  @Max(BOUNDS.heaterEfficiency.max)
  efficiency?: number;

  @ApiPropertyOptional({
    type: MeasureFuelPriceDto,
    description: 'fuel-switch: the new fuel and its price (without it the measure is reported as not applicable)',
  })
  @Omittable()
  @IsObject()
  @ValidateNested()
  @Type(() => MeasureFuelPriceDto)
  fuel?: MeasureFuelPriceDto;
}

export class MeasuresRequestDto extends SeasonRequestDto {
  @ApiProperty({
    type: MeasureDto,
    isArray: true,
    maxItems: 30,
    description:
      'measures to compare; an empty list compares the default measures (reference-data/measures.json) that apply to the house, without costs, so a ranking shows at once',
  })
  @IsArray()
  @ArrayMaxSize(30)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => MeasureDto)
  measures: MeasureDto[];
}

export class SeasonBudgetRequestDto {
  @ApiPropertyOptional({ example: '2026-09-01', description: 'first day, YYYY-MM-DD (default as for a house season)' })
  @Omittable()
  @IsCalendarDate()
  startDate?: string;

  @ApiPropertyOptional({ example: '2027-05-31', description: 'last day (inclusive), YYYY-MM-DD' })
  @Omittable()
  @IsCalendarDate()
  endDate?: string;

  @ApiPropertyOptional(CLIMATE_SOURCE_SCHEMA)
  @Omittable()
  @IsClimateSource()
  climateSource?: ClimateSource;

  @ApiPropertyOptional({
    enum: HEAT_LOSS_BASES,
    description:
      "'handbook' (default) or 'calibrated': each house's heat-loss coefficient × the factor of the farm's newest calibration against its fuel bills (a house without one stays on the handbook, and the answer says so)",
  })
  @Omittable()
  @IsIn(HEAT_LOSS_BASES)
  heatLossBasis?: HeatLossBasis;
}

/** Query of the CSV export (a GET, so the log is named by id rather than a climateSource object). */
export class SeasonBudgetCsvQueryDto {
  @ApiPropertyOptional({
    enum: ['si', 'us'],
    description: 'si (default): kWh and each fuel’s SI unit; us: MMBtu and each fuel’s US unit',
  })
  @Omittable()
  @IsIn(['si', 'us'])
  units?: 'si' | 'us';

  @ApiPropertyOptional({ example: '2026-09-01' })
  @Omittable()
  @IsCalendarDate()
  startDate?: string;

  @ApiPropertyOptional({ example: '2027-05-31' })
  @Omittable()
  @IsCalendarDate()
  endDate?: string;

  @ApiPropertyOptional({ description: 'use this temperature log instead of the climate normals' })
  @Omittable()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  temperatureLogId?: number;

  @ApiPropertyOptional({
    enum: HEAT_LOSS_BASES,
    description: "'handbook' (default) or 'calibrated' (see the budget's heatLossBasis); the file name says which",
  })
  @Omittable()
  @IsIn(HEAT_LOSS_BASES)
  heatLossBasis?: HeatLossBasis;
}
