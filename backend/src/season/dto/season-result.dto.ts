import { ApiProperty, IntersectionType } from '@nestjs/swagger';
import { HeatLossBasisUsedDto } from './heat-loss-basis.dto';
import type { DegreeDayStep } from '@thermbay/engine/estimate-season';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import { ASSUMPTION_CONFIDENCES } from '@thermbay/engine/vocabulary';
import { PRICE_UNITS } from './season-request.dto';
import { PROSE_TOKENS_NOTE } from '@thermbay/engine/vocabulary';
import type { HeatLossComponentKey } from '@thermbay/engine/heating/heat-loss';
import { HEAT_LOSS_COMPONENT_KEYS } from '../../estimates/dto/heating-result.dto';

/*
 * The engine's SeasonEstimate and NightDemand described class by class for the
 * OpenAPI document, so the frontend's generated types match what the engine returns. Property
 * names are the engine's. The measures' comparison is in measure-result.dto.ts.
 */

export const SEASON_ASSUMPTION_CONFIDENCES = ASSUMPTION_CONFIDENCES;
export const DEGREE_DAY_STEP_KEYS: ReadonlyArray<DegreeDayStep['key']> = [
  'degree-day',
  'hourly-curve',
  'day-setpoint',
  'curtain',
  'sky',
  'sun',
  'lamps',
  'heater-capacity',
];

export class SeasonFuelAmountDto {
  @ApiProperty({ description: 'heat delivered to the house, kWh' }) energyKWh: number;
  @ApiProperty({ description: 'heat content of the fuel burnt (energy ÷ efficiency), kWh' }) fuelInputKWh: number;
  @ApiProperty({ description: "fuel in its SI purchase unit (the fuel's unitSi)" }) fuelQuantitySi: number;
  @ApiProperty({ description: "fuel in its US purchase unit (the fuel's unitUs)" }) fuelQuantityUs: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: "money, in the farm's currency; null when no fuel price is known (heat and fuel are still given)",
  })
  cost: number | null;
}

export class SeasonPeriodDto {
  @ApiProperty({ description: 'YYYY-MM-DD' }) startDate: string;
  @ApiProperty({ description: 'YYYY-MM-DD, inclusive' }) endDate: string;
  @ApiProperty() days: number;
  @ApiProperty({ description: 'days the production calendar heats' }) heatedDays: number;
}

export class SeasonFuelDto {
  @ApiProperty() fuelId: string;
  @ApiProperty() label: string;
  @ApiProperty({ example: 'L' }) unitSi: string;
  @ApiProperty({ example: 'US gal' }) unitUs: string;
  @ApiProperty({ type: Number, nullable: true, description: 'null when no price is known' })
  pricePerUnit: number | null;
  @ApiProperty({ enum: PRICE_UNITS }) priceUnit: PriceUnit;
  @ApiProperty({ description: "the unit the price is per, e.g. 'US gal'" }) priceUnitLabel: string;
  @ApiProperty({ description: 'output ÷ input' }) heaterEfficiency: number;
}

export class SeasonHeatLossDto {
  @ApiProperty({ description: 'W/K' }) uaCurtainOpenWPerK: number;
  @ApiProperty({ description: 'W/K (equals the open value without a curtain)' }) uaCurtainClosedWPerK: number;
  @ApiProperty({ description: 'm²' }) floorAreaM2: number;
}

export class SeasonMonthDto extends SeasonFuelAmountDto {
  @ApiProperty() year: number;
  @ApiProperty({ minimum: 1, maximum: 12 }) month: number;
  @ApiProperty({ description: 'heated hours with any heat demand' }) heatingHours: number;
  @ApiProperty({ description: 'highest hourly-average heat demand of the month, W' }) peakW: number;
  @ApiProperty({ description: 'degree-days to the night setpoint, K·day' }) degreeDaysKDay: number;
  @ApiProperty({ minimum: 0, description: 'heat the installed heaters could not deliver, kWh' }) unmetHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'hours in which the heaters could not hold the setpoint' })
  hoursBelowSetpoint: number;
  @ApiProperty({ minimum: 0, description: 'electricity the supplemental lamps use in the month, kWh (0 without)' })
  lampElectricityKWh: number;
  @ApiProperty({ minimum: 0, description: 'the part of it that ends as heat inside the house, kWh' })
  lampHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'heat the heaters did not have to deliver because the lamps gave it, kWh' })
  lampHeatSavedKWh: number;
}

export class SeasonTotalDto extends SeasonFuelAmountDto {
  @ApiProperty() heatingHours: number;
  @ApiProperty({ minimum: 0, description: 'heat the installed heaters could not deliver, kWh' }) unmetHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'hours in which the heaters could not hold the setpoint' })
  hoursBelowSetpoint: number;
}

export class SeasonHeaterCapacityDto {
  @ApiProperty({
    description:
      'Σ count × rated input × efficiency of the house’s heaters, W; heat delivered in an hour is capped at it',
  })
  installedOutputW: number;
  @ApiProperty({ description: 'heater units installed' }) heaterCount: number;
  @ApiProperty({
    type: String,
    nullable: true,
    description: `set when the heaters cannot hold the setpoint in some hour; ${PROSE_TOKENS_NOTE}`,
  })
  caution: string | null;
}

export class SeasonLampsDto {
  @ApiProperty({ type: String, nullable: true, description: 'reference-data lamps id' }) lampTypeId: string | null;
  @ApiProperty({ type: String, nullable: true }) lampTypeLabel: string | null;
  @ApiProperty({ description: 'W/m² of floor' }) powerDensityWPerM2: number;
  @ApiProperty({ type: Number, isArray: true, description: 'January to December, h' }) hoursPerDayByMonth: number[];
  @ApiProperty({ description: 'share of the input that heats the house, 0–1' }) heatToHouseFraction: number;
  @ApiProperty({ description: 'electrical input of all the lamps while they run, W' }) electricW: number;
  @ApiProperty({ description: 'heat they give the house while they run, W' }) heatW: number;
  @ApiProperty({ minimum: 0, description: 'electricity the lamps add over the season (heated days only), kWh' })
  electricityKWh: number;
  @ApiProperty({ minimum: 0, description: 'the part of it that ends as heat inside the house, kWh' })
  heatToHouseKWh: number;
  @ApiProperty({ minimum: 0, description: 'heat the heaters did not deliver because the lamps gave it, kWh' })
  heatSavedKWh: number;
  @ApiProperty({
    type: SeasonFuelAmountDto,
    description: 'the fuel (and money, with a price) that heat would have taken',
  })
  fuelSaved: SeasonFuelAmountDto;
  @ApiProperty({
    minimum: 0,
    maximum: 1,
    description: 'heat saved ÷ heat into the house: the rest came when the house needed no heat',
  })
  usefulShareOfHeat: number;
}

export class SeasonPeakDto {
  @ApiProperty({ description: 'W' }) heatW: number;
  @ApiProperty({ description: 'local standard time, YYYY-MM-DDTHH:MM' }) at: string;
  @ApiProperty({ description: '°C' }) outdoorC: number;
}

export class DegreeDayStepDto {
  @ApiProperty({ enum: DEGREE_DAY_STEP_KEYS }) key: DegreeDayStep['key'];
  @ApiProperty() label: string;
  @ApiProperty({ description: 'kWh' }) energyKWh: number;
  @ApiProperty({ description: 'change from the previous step, kWh' }) changeKWh: number;
}

export class ConventionalBaseCheckDto extends SeasonFuelAmountDto {
  @ApiProperty({ description: '18.333 °C (65 °F)' }) baseTemperatureC: number;
  @ApiProperty({ description: 'degree-days of the heated days to that base, K·day' }) degreeDaysKDay: number;
  @ApiProperty({ description: '°F·day' }) degreeDaysFDay: number;
  @ApiProperty({ description: `why the setpoint base is the one for a greenhouse; ${PROSE_TOKENS_NOTE}` }) note: string;
  @ApiProperty() source: string;
}

export class DegreeDayCrossCheckDto extends SeasonFuelAmountDto {
  @ApiProperty({ description: `the base each heated day is counted to; ${PROSE_TOKENS_NOTE}` }) baseDescription: string;
  @ApiProperty({ type: Number, nullable: true, description: 'the base when it is the same all season, else null, °C' })
  baseTemperatureC: number | null;
  @ApiProperty({ description: 'UA used (curtain open), W/K' }) uaWPerK: number;
  @ApiProperty({ description: 'K·day' }) degreeDaysKDay: number;
  @ApiProperty({ description: '°F·day' }) degreeDaysFDay: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'hourly result ÷ degree-day result − 1 (null when the degree-day result is 0)',
  })
  hourlyDifferenceFraction: number | null;
  @ApiProperty({
    type: DegreeDayStepDto,
    isArray: true,
    description: 'from the degree-day figure to the hourly one, one effect at a time',
  })
  steps: DegreeDayStepDto[];
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) explanation: string[];
  @ApiProperty({
    type: ConventionalBaseCheckDto,
    description: 'the same method to the conventional 65 °F (18.3 °C) base, beside the setpoint base',
  })
  conventionalBase: ConventionalBaseCheckDto;
}

export class SeasonAssumptionDto {
  @ApiProperty() key: string;
  @ApiProperty({ description: PROSE_TOKENS_NOTE }) label: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }] }) value: number | string;
  @ApiProperty() unit: string;
  @ApiProperty() source: string;
  @ApiProperty({ enum: SEASON_ASSUMPTION_CONFIDENCES }) confidence: string;
  @ApiProperty({ description: "true where the user's own value replaced the reference value" }) overridden: boolean;
}

export class SeasonLossPartDto {
  @ApiProperty({ enum: HEAT_LOSS_COMPONENT_KEYS, description: "the design night's component keys" })
  key: HeatLossComponentKey;
  @ApiProperty() label: string;
  @ApiProperty({ description: 'heat lost through this part over the heated hours that lose heat, kWh' })
  energyKWh: number;
  @ApiProperty({ description: 'share of all the heat lost, 0–1' }) share: number;
}

export class SeasonLossBreakdownDto {
  @ApiProperty({ type: SeasonLossPartDto, isArray: true, description: 'the night sky is the part with key sky' })
  parts: SeasonLossPartDto[];
  @ApiProperty({ description: 'Σ parts, kWh' }) lostKWh: number;
  @ApiProperty({ description: "the sky's part (long-wave radiation to the night sky), kWh" }) skyKWh: number;
  @ApiProperty({ description: 'heat the sun supplied in place of the heaters, kWh' }) solarOffsetKWh: number;
  @ApiProperty({ description: 'heat the heaters could not deliver, kWh' }) unmetHeatKWh: number;
  @ApiProperty({ description: 'lostKWh − solarOffsetKWh − unmetHeatKWh: the heat delivered, kWh' })
  deliveredKWh: number;
}

export class SeasonEstimateDto {
  @ApiProperty({ type: SeasonPeriodDto }) period: SeasonPeriodDto;
  @ApiProperty({ type: SeasonFuelDto }) fuel: SeasonFuelDto;
  @ApiProperty({ type: SeasonHeatLossDto }) heatLoss: SeasonHeatLossDto;
  @ApiProperty({ type: SeasonMonthDto, isArray: true, description: 'one row per calendar month the season touches' })
  monthly: SeasonMonthDto[];
  @ApiProperty({ type: SeasonTotalDto }) total: SeasonTotalDto;
  @ApiProperty({ type: SeasonHeaterCapacityDto }) heaterCapacity: SeasonHeaterCapacityDto;
  @ApiProperty({
    type: SeasonPeakDto,
    nullable: true,
    description: 'the hour of highest heat demand; null if no heat was needed',
  })
  peak: SeasonPeakDto | null;
  @ApiProperty({
    minimum: 0,
    maximum: 1,
    description: "share of the season's heat delivered at night (sunset to sunrise)",
  })
  nightShareOfHeat: number;
  @ApiProperty({ description: 'heat the sun supplied in place of the heater, kWh' }) solarOffsetKWh: number;
  @ApiProperty({
    type: SeasonLampsDto,
    nullable: true,
    description: "the supplemental lamps' electricity, heat and the fuel their heat saves; null without lamps",
  })
  lamps: SeasonLampsDto | null;
  @ApiProperty({
    type: SeasonLossBreakdownDto,
    description: "the season's heat by part of the house, with the night sky as its own part",
  })
  lossBreakdown: SeasonLossBreakdownDto;
  @ApiProperty({ type: DegreeDayCrossCheckDto }) degreeDays: DegreeDayCrossCheckDto;
  @ApiProperty({ type: SeasonAssumptionDto, isArray: true }) assumptions: SeasonAssumptionDto[];
  @ApiProperty({
    type: String,
    isArray: true,
    description: `combustion / electrical safety cautions; ${PROSE_TOKENS_NOTE}`,
  })
  cautions: string[];
}

// ---------------------------------------------------------------------------------------------
// Where each input of a per-house run came from

export class SeasonRunInputsDto {
  @ApiProperty({ enum: ['normals', 'temperature-log'] }) climateSource: 'normals' | 'temperature-log';
  @ApiProperty({ type: Number, nullable: true }) temperatureLogId: number | null;
  @ApiProperty({ type: String, nullable: true }) temperatureLogName: string | null;
  @ApiProperty() fuelId: string;
  @ApiProperty({ enum: ['request', 'house-heater'] }) fuelFrom: 'request' | 'house-heater';
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'null when the farm has no price for the fuel and the request gave none',
  })
  pricePerUnit: number | null;
  @ApiProperty({ enum: PRICE_UNITS }) priceUnit: PriceUnit;
  @ApiProperty({
    enum: ['request', 'farm-fuel-prices', 'none'],
    description: "'none': no price yet, so heat and fuel are given and every cost is null",
  })
  priceFrom: 'request' | 'farm-fuel-prices' | 'none';
  @ApiProperty({ example: 'USD', description: "the farm's currency (ISO 4217) every amount is in" }) currency: string;
  @ApiProperty() heaterEfficiency: number;
  @ApiProperty({ enum: ['request', 'house-heater'] }) heaterEfficiencyFrom: 'request' | 'house-heater';
  @ApiProperty({ description: "the farm's IANA zone" }) timeZone: string;
  @ApiProperty({ description: "the zone's standard-time offset from UTC (daylight saving ignored), h" })
  utcOffsetHours: number;
}

export class SeasonInputsUsedDto extends IntersectionType(SeasonRunInputsDto, HeatLossBasisUsedDto) {
  @ApiProperty() startDate: string;
  @ApiProperty() endDate: string;
  @ApiProperty({ enum: ['request', 'default-heating-season', 'temperature-log'] })
  seasonFrom: 'request' | 'default-heating-season' | 'temperature-log';
  @ApiProperty({
    description: "periods of the house's production calendar (0 = heated all season at the house setpoints)",
  })
  calendarPeriodCount: number;
}

export class HouseSeasonEstimateDto extends SeasonEstimateDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ type: SeasonInputsUsedDto }) inputsUsed: SeasonInputsUsedDto;
}

// ---------------------------------------------------------------------------------------------
// One night

export class NightHourDto {
  @ApiProperty({ description: 'start of the hour, local standard time' }) at: string;
  @ApiProperty({ description: '°C' }) outdoorC: number;
  @ApiProperty({ minimum: 0, maximum: 1, description: 'share of the hour after sunset / before sunrise' })
  nightShare: number;
  @ApiProperty({ description: "average heat demand over the hour's night share, W" }) heatW: number;
  @ApiProperty({ description: 'the part of heatW lost to the night sky, W' }) skyW: number;
  @ApiProperty({ description: 'heat the heaters deliver (at most their installed output), W' }) deliveredW: number;
  @ApiProperty({ description: 'true when the heaters cannot hold the night setpoint this hour' })
  belowSetpoint: boolean;
}

export class HouseNightDemandDto extends SeasonFuelAmountDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ description: 'the evening the night begins, YYYY-MM-DD' }) date: string;
  @ApiProperty({ type: String, nullable: true, description: 'local standard time; null where the sun does not set' })
  sunset: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'next morning, local standard time; null where the sun does not rise',
  })
  sunrise: string | null;
  @ApiProperty({ description: 'h' }) nightHours: number;
  @ApiProperty({ description: '°C' }) nightSetpointC: number;
  @ApiProperty({ description: 'UA with the curtain drawn (if any), W/K' }) uaWPerK: number;
  @ApiProperty({ description: 'highest hourly heat demand, W' }) peakW: number;
  @ApiProperty({ type: Number, nullable: true, description: 'coldest night hour, °C' }) minOutdoorC: number | null;
  @ApiProperty({ description: 'installed heater output, W' }) installedOutputW: number;
  @ApiProperty({ minimum: 0, description: 'heat the heaters could not deliver, kWh' }) unmetHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'heat lost to the night sky over the night (part of the need), kWh' })
  skyKWh: number;
  @ApiProperty({ minimum: 0, description: 'night hours in which the heaters cannot hold the setpoint' })
  hoursBelowSetpoint: number;
  @ApiProperty({ type: String, nullable: true, description: `set when some hour cannot be held; ${PROSE_TOKENS_NOTE}` })
  capacityCaution: string | null;
  @ApiProperty({ type: NightHourDto, isArray: true }) hourly: NightHourDto[];
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) cautions: string[];
  @ApiProperty({ type: SeasonRunInputsDto }) inputsUsed: SeasonRunInputsDto;
}
