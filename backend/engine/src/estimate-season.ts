import { BOUNDS } from './vocabulary';
import { EngineInputError, requireInRange } from './errors';
import type { HouseSpec } from './house.types';
import { quantityToken } from './vocabulary';
import { type Confidence } from './vocabulary';
import { referenceRow, type ReferenceData, type ReferenceRow } from './reference-data.types';
import { isoLocalHour } from './climate/calendar-days';
import { PEAK_ROW_ID, peakHoursAfterSolarNoon } from './climate/daily-temperature-curve';
import { OUTDOOR_TEMPERATURE_LIMITS_C } from './vocabulary';
import {
  clearnessByMonth,
  DEFAULT_CLEARNESS_ROW_ID,
  validateSiteClimate,
  type SiteClimate,
} from './climate/site-climate';
import { degreeDayHeatKWh, FAHRENHEIT_DEGREES_PER_KELVIN, seasonDegreeDays } from './season/degree-days';
import {
  fuelCautions,
  fuelCost,
  fuelForHeat,
  priceUnitLabel,
  validateFuelPrice,
  validateHeaterEfficiency,
  type FuelPrice,
  type FuelRow,
  type PriceUnit,
} from './season/fuel';
import { houseThermal, type HouseThermal } from './season/house-heat-loss';
import { dailySetpoints, validateCalendar, type ProductionCalendar } from './season/production-calendar';
import {
  buildSeasonHours,
  isLoggedTemperatures,
  type LoggedTemperatures,
  type SeasonRange,
  type TemperatureReading,
} from './season/season-hours';
import {
  simulateSeason,
  type SeasonHours,
  type SimulationParameters,
  type SimulationResult,
} from './season/season-simulation';
import { SunCache, type SunSite } from './season/sun-hours';
import { validateHeaterGroups } from './heating/heater-sizing';

// ---------------------------------------------------------------------------------------------
// Input

/** The farm as the season needs it. */
export interface SeasonSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  /**
   * Fixed offset of local standard time from UTC, hours (the API derives it from the farm's IANA
   * zone). Daylight saving time is ignored: all hours are local standard time.
   */
  utcOffsetHours: number;
}

/** Logged temperatures instead of normals; `resolution` is inferred from the times when absent. */
export interface LoggedClimateInput {
  readings: TemperatureReading[];
  resolution?: 'hourly' | 'daily';
  /** clearness by month (index 0 = January) to use with a log; defaults from reference data */
  clearnessByMonth?: number[];
}

export interface EstimateSeasonInput {
  house: HouseSpec;
  site: SeasonSite;
  climate: SiteClimate | LoggedClimateInput;
  /** the heating season or a year, inclusive dates, at most 366 days */
  season: SeasonRange;
  /** heated and empty periods; without it every day of the season is heated to the house's setpoints */
  calendar?: ProductionCalendar | null;
  fuel: FuelPrice;
  /** steady-state heater efficiency, 0.3–1.05 (output = input × efficiency) */
  heaterEfficiency: number;
  /** replaces the reference share of transmitted sunlight that offsets heating, 0–1 */
  solarUsefulFraction?: number;
}

// ---------------------------------------------------------------------------------------------
// Output

export type AssumptionConfidence = Confidence | 'user-entered';

export interface Assumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: AssumptionConfidence;
  /** true where the user's own value replaced the reference value */
  overridden: boolean;
}

export interface FuelAmount {
  /** heat delivered to the house, kWh */
  energyKWh: number;
  /** heat content of the fuel burnt (energy ÷ efficiency), kWh */
  fuelInputKWh: number;
  /** fuel in its SI purchase unit (fuel.unitSi) */
  fuelQuantitySi: number;
  /** fuel in its US purchase unit (fuel.unitUs) */
  fuelQuantityUs: number;
  /** money, in the currency of the price */
  cost: number;
}

export interface SeasonMonth extends FuelAmount {
  year: number;
  /** 1–12 */
  month: number;
  /** heated hours with any heat demand */
  heatingHours: number;
  /** highest hourly-average heat demand of the month, W */
  peakW: number;
  /** degree-days to the night setpoint, K·day */
  degreeDaysKDay: number;
  /** heat the installed heaters could not deliver, kWh */
  unmetHeatKWh: number;
  /** hours in which the heaters could not hold the setpoint */
  hoursBelowSetpoint: number;
}

export interface DegreeDayStep {
  key: 'degree-day' | 'hourly-curve' | 'day-setpoint' | 'curtain' | 'sun' | 'heater-capacity';
  label: string;
  energyKWh: number;
  /** change from the previous step, kWh */
  changeKWh: number;
}

export interface DegreeDayCrossCheck extends FuelAmount {
  /** the base each heated day is counted to; may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  baseDescription: string;
  /** the base when it is the same all season, else null, °C */
  baseTemperatureC: number | null;
  /** UA used (curtain open, the design condition), W/K */
  uaWPerK: number;
  degreeDaysKDay: number;
  degreeDaysFDay: number;
  /** hourly result ÷ degree-day result − 1 (null when the degree-day result is 0) */
  hourlyDifferenceFraction: number | null;
  /** from the degree-day figure to the hourly figure, one effect at a time (order matters) */
  steps: DegreeDayStep[];
  /** sentences that may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  explanation: string[];
}

export interface HeaterCapacity {
  /** Σ count × rated input × efficiency over the house's heater groups, W */
  installedOutputW: number;
  heaterCount: number;
  /** set when the heaters cannot hold the setpoint in some hour; may hold {{kind:valueSI}} tokens */
  caution: string | null;
}

export interface SeasonEstimate {
  period: { startDate: string; endDate: string; days: number; heatedDays: number };
  fuel: {
    fuelId: string;
    label: string;
    unitSi: string;
    unitUs: string;
    pricePerUnit: number;
    priceUnit: PriceUnit;
    /** the unit the price is per, e.g. 'US gal' */
    priceUnitLabel: string;
    heaterEfficiency: number;
  };
  heatLoss: { uaCurtainOpenWPerK: number; uaCurtainClosedWPerK: number; floorAreaM2: number };
  monthly: SeasonMonth[];
  total: FuelAmount & { heatingHours: number; unmetHeatKWh: number; hoursBelowSetpoint: number };
  /** what the house's heaters can deliver, and a caution when they fall short of the demand */
  heaterCapacity: HeaterCapacity;
  /** the hour of highest heat demand, null if no heat was needed */
  peak: { heatW: number; at: string; outdoorC: number } | null;
  /** share of the season's heat delivered at night (sunset to sunrise) */
  nightShareOfHeat: number;
  /** heat the sun supplied in place of the heater, kWh */
  solarOffsetKWh: number;
  degreeDays: DegreeDayCrossCheck;
  assumptions: Assumption[];
  cautions: string[];
}

// ---------------------------------------------------------------------------------------------
// Preparation shared with the measure comparison

interface UsefulFractionRow extends ReferenceRow {
  fraction: number;
}

export const SOLAR_USEFUL_FRACTION_ROW_ID = 'solar-useful-fraction';

/** Everything about a season that does not depend on the house's variant. */
export interface PreparedSeason {
  input: EstimateSeasonInput;
  hours: SeasonHours;
  fuel: FuelRow;
  clearness: number[];
  clearnessFromUser: boolean;
  solarUsefulFraction: number;
  solarUsefulFractionRow: UsefulFractionRow;
  /** installed output of the house's heaters, W */
  heaterOutputW: number;
  heaterCount: number;
}

export interface SeasonVariant {
  house: HouseSpec;
  calendar: ProductionCalendar | null;
  season: SeasonRange;
  fuel: FuelPrice;
  fuelRow: FuelRow;
  heaterEfficiency: number;
  /** installed heater output the hourly simulation caps delivered heat at, W (0 without heaters) */
  heaterOutputW: number;
}

export interface VariantRun {
  thermal: HouseThermal;
  parameters: SimulationParameters;
  result: SimulationResult;
}

function validateSite(site: SeasonSite): SunSite {
  if (!site || typeof site !== 'object') throw new EngineInputError('site', 'site is required');
  requireInRange('site.latitudeDeg', site.latitudeDeg, BOUNDS.latitudeDeg.min, BOUNDS.latitudeDeg.max);
  requireInRange('site.longitudeDeg', site.longitudeDeg, BOUNDS.longitudeDeg.min, BOUNDS.longitudeDeg.max);
  requireInRange('site.elevationM', site.elevationM, BOUNDS.elevationM.min, BOUNDS.elevationM.max);
  requireInRange('site.utcOffsetHours', site.utcOffsetHours, -12, 14);
  return { latitudeDeg: site.latitudeDeg, longitudeDeg: site.longitudeDeg, utcOffsetHours: site.utcOffsetHours };
}

function validateHouseSetpoints(house: HouseSpec): void {
  if (!house || typeof house !== 'object') throw new EngineInputError('house', 'house is required');
  const setpoints = house.setpoints;
  if (!setpoints) throw new EngineInputError('house.setpoints', 'house.setpoints is required');
  requireInRange('house.setpoints.dayHeatingC', setpoints.dayHeatingC, BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  requireInRange('house.setpoints.nightHeatingC', setpoints.nightHeatingC, BOUNDS.setpointC.min, BOUNDS.setpointC.max);
}

function validateLoggedClimate(climate: LoggedClimateInput): LoggedTemperatures {
  if (climate.readings.length === 0)
    throw new EngineInputError('climate.readings', 'the temperature log holds no readings');
  climate.readings.forEach((reading, index) => {
    const at = `climate.readings[${index}]`;
    const { min, max } = OUTDOOR_TEMPERATURE_LIMITS_C;
    requireInRange(`${at}.temperatureC`, reading.temperatureC, min, max);
    if (reading.minC !== undefined) requireInRange(`${at}.minC`, reading.minC, min, max);
    if (reading.maxC !== undefined) requireInRange(`${at}.maxC`, reading.maxC, min, max);
  });
  if (climate.clearnessByMonth !== undefined) {
    if (!Array.isArray(climate.clearnessByMonth) || climate.clearnessByMonth.length !== 12) {
      throw new EngineInputError('climate.clearnessByMonth', 'clearness needs 12 values, January to December');
    }
    climate.clearnessByMonth.forEach((value, index) =>
      requireInRange(`climate.clearnessByMonth[${index}]`, value, 0, 1),
    );
  }
  const resolution =
    climate.resolution ??
    (climate.readings.every((reading) => /^\d{4}-\d{2}-\d{2}$/.test(reading.at.trim())) ? 'daily' : 'hourly');
  if (resolution !== 'hourly' && resolution !== 'daily') {
    throw new EngineInputError('climate.resolution', "resolution must be 'hourly' or 'daily'");
  }
  return { readings: climate.readings, resolution };
}

/** Validates the input and lays out the season's hours (sun from the cache). */
export function prepareSeason(
  input: EstimateSeasonInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): PreparedSeason {
  if (!input || typeof input !== 'object') throw new EngineInputError('input', 'input is required');
  const site = validateSite(input.site);
  validateHouseSetpoints(input.house);
  const fuel = validateFuelPrice(input.fuel, ref);
  validateHeaterEfficiency(input.heaterEfficiency);
  if (input.calendar) validateCalendar(input.calendar);
  if (!input.climate || typeof input.climate !== 'object') throw new EngineInputError('climate', 'climate is required');

  let climate: SiteClimate | LoggedTemperatures;
  let clearness: number[];
  let clearnessFromUser: boolean;
  if (isLoggedTemperatures(input.climate as SiteClimate | LoggedTemperatures)) {
    const logged = input.climate as LoggedClimateInput;
    climate = validateLoggedClimate(logged);
    const defaults = clearnessByMonth(null, ref).clearness;
    clearness = logged.clearnessByMonth ?? defaults;
    clearnessFromUser = logged.clearnessByMonth !== undefined;
  } else {
    climate = validateSiteClimate(input.climate as SiteClimate);
    const byMonth = clearnessByMonth(climate, ref);
    clearness = byMonth.clearness;
    clearnessFromUser = byMonth.fromUser.some(Boolean);
  }

  const usefulRow = referenceRow<UsefulFractionRow>(ref, 'climate-defaults', SOLAR_USEFUL_FRACTION_ROW_ID);
  if (!usefulRow || typeof usefulRow.fraction !== 'number') {
    throw new Error(`reference-data/climate-defaults.json needs a ${SOLAR_USEFUL_FRACTION_ROW_ID} row`);
  }
  let solarUsefulFraction = usefulRow.fraction;
  if (input.solarUsefulFraction !== undefined && input.solarUsefulFraction !== null) {
    solarUsefulFraction = requireInRange('solarUsefulFraction', input.solarUsefulFraction, 0, 1);
  }

  const heaters = installedHeaterOutput(input.house, ref);
  const hours = buildSeasonHours({ site, range: input.season, climate, clearnessByMonth: clearness }, ref, sunCache);
  return {
    input,
    hours,
    fuel,
    clearness,
    clearnessFromUser,
    solarUsefulFraction,
    solarUsefulFractionRow: usefulRow,
    heaterOutputW: heaters.outputW,
    heaterCount: heaters.heaterCount,
  };
}

/** Installed output of a house's heaters: Σ count × rated input × efficiency, W. */
export function installedHeaterOutput(house: HouseSpec, ref: ReferenceData): { outputW: number; heaterCount: number } {
  const groups = validateHeaterGroups(house.heaters ?? [], ref);
  return {
    outputW: groups.reduce((sum, { group }) => sum + group.count * group.ratedInputW * group.efficiency, 0),
    heaterCount: groups.reduce((sum, { group }) => sum + group.count, 0),
  };
}

export function baseVariant(prepared: PreparedSeason): SeasonVariant {
  const { input } = prepared;
  return {
    house: input.house,
    calendar: input.calendar ?? null,
    season: input.season,
    fuel: input.fuel,
    fuelRow: prepared.fuel,
    heaterEfficiency: input.heaterEfficiency,
    heaterOutputW: prepared.heaterOutputW,
  };
}

export interface VariantOptions {
  /** ignore the sun (degree-day comparison steps) */
  withoutSun?: boolean;
  /** use the night setpoint by day too */
  nightSetpointAllDay?: boolean;
  /** leave the curtain open at night */
  curtainOpen?: boolean;
  /** subtract from every night setpoint, K */
  nightSetpointLowerK?: number;
  /** reuse a house's heat loss already computed */
  thermal?: HouseThermal;
  /** deliver whatever the house needs, ignoring the heaters' output (degree-day comparison steps) */
  uncapped?: boolean;
}

/** Simulation parameters for a variant of the house on the prepared season. */
export function variantParameters(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  ref: ReferenceData,
  options: VariantOptions = {},
): { thermal: HouseThermal; parameters: SimulationParameters } {
  const thermal = options.thermal ?? houseThermal(variant.house, prepared.input.site.elevationM, ref);
  const { daySetpointC, nightSetpointC } = dailySetpoints(
    prepared.hours.firstDayNumber,
    prepared.hours.dayCount,
    variant.house.setpoints,
    variant.calendar,
    options.nightSetpointLowerK ?? 0,
  );
  restrictToSeason(prepared.hours, variant.season, daySetpointC, nightSetpointC);
  return {
    thermal,
    parameters: {
      uaDayWPerK: thermal.uaOpenWPerK,
      uaNightWPerK: options.curtainOpen ? thermal.uaOpenWPerK : thermal.uaClosedWPerK,
      solarGainAreaM2: options.withoutSun
        ? 0
        : thermal.roofCovering.lightTransmittance * thermal.geometry.floorAreaM2 * prepared.solarUsefulFraction,
      daySetpointC: options.nightSetpointAllDay ? nightSetpointC : daySetpointC,
      nightSetpointC,
      heaterOutputW: options.uncapped ? Infinity : variant.heaterOutputW,
    },
  };
}

/** Marks days outside a variant's season (e.g. a later start) as unheated. */
function restrictToSeason(
  hours: SeasonHours,
  season: SeasonRange,
  daySetpointC: Float64Array,
  nightSetpointC: Float64Array,
): void {
  const start = Date.parse(`${season.startDate}T00:00:00Z`) / 86_400_000;
  const end = Date.parse(`${season.endDate}T00:00:00Z`) / 86_400_000;
  for (let day = 0; day < hours.dayCount; day++) {
    const dayNumberValue = hours.firstDayNumber + day;
    if (dayNumberValue < start || dayNumberValue > end) {
      daySetpointC[day] = NaN;
      nightSetpointC[day] = NaN;
    }
  }
}

export function runVariant(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  ref: ReferenceData,
  options: VariantOptions = {},
): VariantRun {
  const { thermal, parameters } = variantParameters(prepared, variant, ref, options);
  return { thermal, parameters, result: simulateSeason(prepared.hours, parameters) };
}

export function fuelAmount(heatKWh: number, variant: SeasonVariant): FuelAmount {
  const quantity = fuelForHeat(heatKWh, variant.fuelRow, variant.heaterEfficiency);
  return {
    energyKWh: heatKWh,
    fuelInputKWh: quantity.fuelInputKWh,
    fuelQuantitySi: quantity.quantitySi,
    fuelQuantityUs: quantity.quantityUs,
    cost: fuelCost(quantity, variant.fuel),
  };
}

// ---------------------------------------------------------------------------------------------
// The estimate

/**
 * Season heating energy, fuel and cost by an hourly simulation, with a degree-day cross-check
 * and the assumptions behind every number. Pass a shared `sunCache` when estimating the same
 * site repeatedly.
 */
export function estimateSeason(
  input: EstimateSeasonInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): SeasonEstimate {
  const prepared = prepareSeason(input, ref, sunCache);
  const variant = baseVariant(prepared);
  const run = runVariant(prepared, variant, ref);
  return describeSeason(prepared, variant, run, ref);
}

function describeSeason(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  run: VariantRun,
  ref: ReferenceData,
): SeasonEstimate {
  const { hours } = prepared;
  const { result, thermal, parameters } = run;
  const degreeDays = seasonDegreeDays(hours, parameters.nightSetpointC);

  const monthly: SeasonMonth[] = hours.months.map((slot, index) => ({
    year: slot.year,
    month: slot.month,
    ...fuelAmount(result.monthlyHeatWh[index] / 1000, variant),
    heatingHours: result.monthlyHeatingHours[index],
    peakW: result.monthlyPeakW[index],
    degreeDaysKDay: degreeDays.byMonthSlot[index],
    unmetHeatKWh: result.monthlyUnmetHeatWh[index] / 1000,
    hoursBelowSetpoint: result.monthlyHoursBelowSetpoint[index],
  }));

  let heatedDays = 0;
  for (let day = 0; day < hours.dayCount; day++)
    if (parameters.daySetpointC[day] === parameters.daySetpointC[day]) heatedDays++;

  const peak =
    result.peakHourIndex >= 0
      ? {
          heatW: result.peakW,
          at: isoLocalHour(hours.firstDayNumber + Math.floor(result.peakHourIndex / 24), result.peakHourIndex % 24),
          outdoorC: hours.outdoorC[result.peakHourIndex],
        }
      : null;

  return {
    period: {
      startDate: prepared.input.season.startDate,
      endDate: prepared.input.season.endDate,
      days: hours.dayCount,
      heatedDays,
    },
    fuel: {
      fuelId: variant.fuelRow.id,
      label: variant.fuelRow.label,
      unitSi: variant.fuelRow.unitSi,
      unitUs: variant.fuelRow.unitUs,
      pricePerUnit: variant.fuel.pricePerUnit,
      priceUnit: variant.fuel.priceUnit,
      priceUnitLabel: priceUnitLabel(variant.fuelRow, variant.fuel.priceUnit),
      heaterEfficiency: variant.heaterEfficiency,
    },
    heatLoss: {
      uaCurtainOpenWPerK: thermal.uaOpenWPerK,
      uaCurtainClosedWPerK: thermal.uaClosedWPerK,
      floorAreaM2: thermal.geometry.floorAreaM2,
    },
    monthly,
    total: {
      ...fuelAmount(result.totalHeatWh / 1000, variant),
      heatingHours: result.heatingHours,
      unmetHeatKWh: result.unmetHeatWh / 1000,
      hoursBelowSetpoint: result.hoursBelowSetpoint,
    },
    heaterCapacity: {
      installedOutputW: variant.heaterOutputW,
      heaterCount: prepared.heaterCount,
      caution: capacityCaution(variant.heaterOutputW, result, 'season'),
    },
    peak,
    nightShareOfHeat: result.totalHeatWh > 0 ? result.nightHeatWh / result.totalHeatWh : 0,
    solarOffsetKWh: result.solarOffsetWh / 1000,
    degreeDays: degreeDayCrossCheck(prepared, variant, run, degreeDays.total, ref),
    assumptions: assumptions(prepared, variant, thermal, ref),
    cautions: fuelCautions(variant.fuelRow),
  };
}

function degreeDayCrossCheck(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  run: VariantRun,
  degreeDaysKDay: number,
  ref: ReferenceData,
): DegreeDayCrossCheck {
  const { thermal, parameters, result } = run;
  const uaWPerK = thermal.uaOpenWPerK;
  const degreeDayKWh = degreeDayHeatKWh(uaWPerK, degreeDaysKDay);

  // Walk from the degree-day figure to the hourly one, adding one effect at a time.
  // Like the degree-day figure, these steps deliver whatever the house needs; the heaters' limit
  // comes last, as its own step, when they fall short.
  const hourlyNoSunNight = runVariant(prepared, variant, ref, {
    thermal,
    withoutSun: true,
    nightSetpointAllDay: true,
    curtainOpen: true,
    uncapped: true,
  });
  const withDaySetpoint = runVariant(prepared, variant, ref, {
    thermal,
    withoutSun: true,
    curtainOpen: true,
    uncapped: true,
  });
  const withCurtain = runVariant(prepared, variant, ref, { thermal, withoutSun: true, uncapped: true });
  const short = result.unmetHeatWh > 0;
  const uncappedKWh = short
    ? runVariant(prepared, variant, ref, { thermal, uncapped: true }).result.totalHeatWh / 1000
    : result.totalHeatWh / 1000;
  const energies = [
    degreeDayKWh,
    hourlyNoSunNight.result.totalHeatWh / 1000,
    withDaySetpoint.result.totalHeatWh / 1000,
    withCurtain.result.totalHeatWh / 1000,
    uncappedKWh,
  ];
  const labels: Array<[DegreeDayStep['key'], string]> = [
    ['degree-day', 'Degree-day method: daily mean temperatures, night setpoint all day, curtain open, no sun'],
    ['hourly-curve', 'Hour by hour through the daily temperature curve (same setpoint, curtain open, no sun)'],
    ['day-setpoint', 'Day setpoint between sunrise and sunset'],
    ['curtain', 'Curtain drawn at night'],
    ['sun', 'Sunlight through the roof offsets heating by day'],
  ];
  if (short) {
    energies.push(result.totalHeatWh / 1000);
    labels.push(['heater-capacity', 'Heat the installed heaters cannot deliver in the coldest hours']);
  }
  const steps: DegreeDayStep[] = labels.map(([key, label], index) => ({
    key,
    label,
    energyKWh: energies[index],
    changeKWh: index === 0 ? 0 : energies[index] - energies[index - 1],
  }));

  const night = parameters.nightSetpointC;
  let uniformBase: number | null = null;
  let mixed = false;
  for (let day = 0; day < night.length; day++) {
    const value = night[day];
    if (value !== value) continue;
    if (uniformBase === null) uniformBase = value;
    else if (Math.abs(uniformBase - value) > 1e-9) mixed = true;
  }
  const baseTemperatureC = mixed ? null : uniformBase;
  const hourlyKWh = result.totalHeatWh / 1000;

  return {
    ...fuelAmount(degreeDayKWh, variant),
    baseDescription:
      baseTemperatureC === null
        ? "each heated day's night setpoint (the calendar's setpoints differ)"
        : `the night setpoint, ${quantityToken('temperature', baseTemperatureC)}`,
    baseTemperatureC,
    uaWPerK,
    degreeDaysKDay,
    degreeDaysFDay: degreeDaysKDay * FAHRENHEIT_DEGREES_PER_KELVIN,
    hourlyDifferenceFraction: degreeDayKWh > 0 ? hourlyKWh / degreeDayKWh - 1 : null,
    steps,
    explanation: explainDifference(steps, variant, hourlyKWh, degreeDayKWh, result),
  };
}

const JOULES_PER_KWH = 3.6e6;

/** Energy in kWh as a prose token (the token holds joules, the SI unit). */
function energyToken(kWh: number): string {
  return quantityToken('energy', kWh * JOULES_PER_KWH);
}

function percentOf(change: number, base: number): string {
  if (base <= 0) return energyToken(change);
  return `${change >= 0 ? '+' : '−'}${Math.abs((100 * change) / base).toFixed(0)} %`;
}

function explainDifference(
  steps: DegreeDayStep[],
  variant: SeasonVariant,
  hourlyKWh: number,
  degreeDayKWh: number,
  result: SimulationResult,
): string[] {
  const lines: string[] = [];
  const base = degreeDayKWh;
  lines.push(
    'The degree-day method multiplies the heat-loss coefficient by 24 h and by the degree-days to the night setpoint, ' +
      'as if the house were held at the night setpoint all day with the curtain open and no sun. ' +
      `It gives ${energyToken(degreeDayKWh)} of heat; the hour-by-hour estimate gives ${energyToken(hourlyKWh)}.`,
  );
  const [, curve, daySetpoint, curtain, sun] = steps;
  lines.push(
    `Hour by hour: cold nights still need heat on days whose mean is above the base, and warm afternoons need none; this changes the figure by ${percentOf(curve.changeKWh, base)}.`,
  );
  if (Math.abs(daySetpoint.changeKWh) > 1e-6) {
    lines.push(`Holding the day setpoint from sunrise to sunset adds ${percentOf(daySetpoint.changeKWh, base)}.`);
  } else {
    lines.push('Day and night setpoints are the same, so the day setpoint adds nothing.');
  }
  if (variant.house.curtainId) {
    lines.push(`Drawing the curtain from sunset to sunrise changes it by ${percentOf(curtain.changeKWh, base)}.`);
  } else {
    lines.push('The house has no curtain.');
  }
  lines.push(
    `Sunlight through the roof covers part of the daytime loss: ${percentOf(sun.changeKWh, base)}. The degree-day method leaves the sun out, which is why it usually reads high for greenhouses.`,
  );
  if (result.unmetHeatWh > 0) {
    lines.push(
      `The degree-day figure assumes the heaters deliver whatever the house needs. The installed heaters (${quantityToken('power', variant.heaterOutputW)}) ` +
        `fall short for ${result.hoursBelowSetpoint} hours, so the hour-by-hour figure delivers ${energyToken(result.unmetHeatWh / 1000)} less heat ` +
        `(${percentOf(-result.unmetHeatWh / 1000, base)}) than the house needs; fuel is counted on the heat delivered.`,
    );
  }
  lines.push(
    'Both methods use the same climate, so neither sees the cold snaps and cloudy spells that monthly normals average away; logged temperatures show them.',
  );
  return lines;
}

/**
 * The caution shown when the heaters cannot hold the setpoint in some hour; null when they can.
 * `scope` names the span of time the numbers cover.
 */
export function capacityCaution(
  heaterOutputW: number,
  shortfall: { unmetHeatWh: number; hoursBelowSetpoint: number; peakW: number },
  scope: 'season' | 'night',
): string | null {
  if (shortfall.hoursBelowSetpoint <= 0) return null;
  const hours = `${shortfall.hoursBelowSetpoint} ${shortfall.hoursBelowSetpoint === 1 ? 'hour' : 'hours'}`;
  const span = scope === 'season' ? 'of the season' : 'of the night';
  if (heaterOutputW <= 0) {
    return (
      `The house has no heaters: the crop sits below its setpoint for ${hours} ${span}, ` +
      `and none of the ${energyToken(shortfall.unmetHeatWh / 1000)} of heat it needs is delivered. See the heater sizing.`
    );
  }
  return (
    `The crop sits below its setpoint for ${hours} ${span}: the heaters (installed output ${quantityToken('power', heaterOutputW)}) ` +
    `cannot give the up to ${quantityToken('power', shortfall.peakW)} the house needs then, and ${energyToken(shortfall.unmetHeatWh / 1000)} ` +
    'of heat goes undelivered. See the heater sizing.'
  );
}

function rowAssumption(
  key: string,
  label: string,
  value: number | string,
  unit: string,
  row: ReferenceRow,
  overridden = false,
): Assumption {
  return {
    key,
    label,
    value,
    unit,
    source: overridden ? 'entered by the user' : row.source,
    confidence: overridden ? 'user-entered' : row.confidence,
    overridden,
  };
}

function assumptions(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  thermal: HouseThermal,
  ref: ReferenceData,
): Assumption[] {
  const list: Assumption[] = [];
  const derived = (key: string, label: string, value: number | string, unit: string, source: string): Assumption => ({
    key,
    label,
    value,
    unit,
    source,
    confidence: 'derived',
    overridden: false,
  });
  list.push(
    derived(
      'ua-curtain-open',
      'Heat-loss coefficient, curtain open (coverings, perimeter and air leakage)',
      round(thermal.uaOpenWPerK, 1),
      'W/K',
      'computed from reference-data coverings.json, perimeter.json, air-leakage.json and the house dimensions',
    ),
  );
  if (variant.house.curtainId) {
    list.push(
      derived(
        'ua-curtain-closed',
        'Heat-loss coefficient, curtain drawn (sunset to sunrise)',
        round(thermal.uaClosedWPerK, 1),
        'W/K',
        'computed with the curtain row of reference-data/curtains.json',
      ),
    );
  }
  const roof = thermal.roofCovering;
  list.push({
    key: 'roof-light-transmittance',
    label: `Light transmittance of the roof covering (${roof.label ?? roof.id})`,
    value: roof.lightTransmittance,
    unit: '–',
    source: roof.lightSource ?? roof.source,
    confidence: roof.lightConfidence ?? roof.confidence,
    overridden: false,
  });
  list.push(
    rowAssumption(
      'solar-useful-fraction',
      prepared.solarUsefulFractionRow.label ?? 'Share of transmitted sunlight that offsets heating',
      prepared.solarUsefulFraction,
      '–',
      prepared.solarUsefulFractionRow,
      prepared.input.solarUsefulFraction !== undefined && prepared.input.solarUsefulFraction !== null,
    ),
  );
  const clearnessRow = referenceRow(ref, 'climate-defaults', DEFAULT_CLEARNESS_ROW_ID)!;
  list.push(
    rowAssumption(
      'clearness-by-month',
      'Sky clearness, January to December (actual ÷ clear-sky sunlight)',
      prepared.clearness.map((value) => value.toFixed(2)).join(' '),
      '–',
      clearnessRow,
      prepared.clearnessFromUser,
    ),
  );
  list.push({
    key: 'clear-sky-model',
    label: 'Clear-sky sunlight on a horizontal surface, by month',
    value: 'monthly A, B, C coefficients',
    unit: '',
    source: referenceRow(ref, 'clear-sky', 'month-01')?.source ?? 'reference-data/clear-sky.json',
    confidence: referenceRow(ref, 'clear-sky', 'month-01')?.confidence ?? 'memory',
    overridden: false,
  });
  if (!isLoggedTemperatures(prepared.input.climate as SiteClimate | LoggedTemperatures)) {
    const minimumRow = referenceRow(ref, 'climate-defaults', 'daily-curve-minimum-at-sunrise');
    if (minimumRow)
      list.push(
        rowAssumption('daily-curve-minimum', 'Daily minimum temperature at sunrise', 'sunrise', '', minimumRow),
      );
  }
  const peakRow = referenceRow(ref, 'climate-defaults', PEAK_ROW_ID)!;
  list.push(
    rowAssumption(
      'daily-curve-peak',
      peakRow.label ?? 'Daily maximum after solar noon',
      peakHoursAfterSolarNoon(ref),
      'h',
      peakRow,
    ),
  );
  list.push({
    key: 'daily-curve-interpolation',
    label:
      'Days between monthly normals: straight-line interpolation between mid-month values; half-cosine curve from minimum to maximum',
    value: 'cosine',
    unit: '',
    source: 'common practice, no single source',
    confidence: 'common-practice',
    overridden: false,
  });
  const fuel = variant.fuelRow;
  list.push(
    rowAssumption(
      'fuel-heat-content-si',
      `Heat content of ${fuel.label}`,
      fuel.heatContentJPerUnitSi / 1e6,
      `MJ/${fuel.unitSi}`,
      fuel,
    ),
  );
  list.push({
    ...rowAssumption(
      'fuel-heat-content-us',
      `Heat content of ${fuel.label}`,
      fuel.heatContentBtuPerUnitUs,
      `Btu/${fuel.unitUs}`,
      fuel,
    ),
    confidence: (fuel.usConfidence as Confidence | undefined) ?? fuel.confidence,
  });
  list.push(
    derived(
      'installed-heater-output',
      'Installed heater output (count × rated input × efficiency); heat delivered in an hour is capped at it',
      round(variant.heaterOutputW, 0),
      'W',
      "computed from the house's heater groups",
    ),
  );
  list.push({
    key: 'heater-efficiency',
    label: 'Heater efficiency (output ÷ input)',
    value: variant.heaterEfficiency,
    unit: '–',
    source: 'entered by the user',
    confidence: 'user-entered',
    overridden: true,
  });
  list.push({
    key: 'fuel-price',
    label: `Price of ${fuel.label}`,
    value: variant.fuel.pricePerUnit,
    unit: `per ${priceUnitLabel(fuel, variant.fuel.priceUnit)}`,
    source: 'entered by the user',
    confidence: 'user-entered',
    overridden: true,
  });
  const baseRow = referenceRow(ref, 'degree-days', 'greenhouse-base-night-setpoint');
  if (baseRow)
    list.push(rowAssumption('degree-day-base', 'Degree-day base: the night setpoint', 'night setpoint', '°C', baseRow));
  list.push({
    key: 'local-standard-time',
    label: 'Hours are local standard time (daylight saving time ignored)',
    value: prepared.input.site.utcOffsetHours,
    unit: 'h from UTC',
    source: 'method',
    confidence: 'common-practice',
    overridden: false,
  });
  list.push({
    key: 'no-heat-storage',
    label: 'Each hour balances on its own: heat stored in soil, structure and crop is not modelled',
    value: 1,
    unit: 'h time step',
    source: 'method',
    confidence: 'common-practice',
    overridden: false,
  });
  return list;
}

function round(value: number, digits: number): number {
  const factor = 10 ** digits;
  return Math.round(value * factor) / factor;
}
