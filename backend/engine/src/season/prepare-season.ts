import { BOUNDS, OUTDOOR_TEMPERATURE_LIMITS_C } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData } from '../reference-data.types';
import { clearnessByMonth, validateSiteClimate, type SiteClimate } from '../climate/site-climate';
import { requireHhvEfficiency, validateHeaterGroups } from '../heating/heater-sizing';
import { fuelCost, fuelForHeat, validateFuelPrice, validateHeaterEfficiency } from './fuel';
import type { SkyCoupling } from '../heating/sky-radiation';
import { houseThermal, type EnvelopeParts, type HouseThermal } from './house-heat-loss';
import { dailySetpoints, validateCalendar } from './production-calendar';
import { buildSeasonHours, isLoggedTemperatures, type LoggedTemperatures, type SeasonRange } from './season-hours';
import { simulateSeason, type SeasonHours, type SimulationParameters } from './season-simulation';
import { SunCache, type SunSite } from './sun-hours';
import { shadeTransmittanceByMonth, validateShadeCloth } from '../solar/shade-cloth';
import { validateLamps } from '../lamps/lamps';
import { seasonLampSchedule, type SeasonLampSchedule } from './season-lamps';
import type {
  EstimateSeasonInput,
  FuelAmount,
  LoggedClimateInput,
  PreparedSeason,
  SeasonSite,
  SeasonVariant,
  UsefulFractionRow,
  VariantRun,
} from './season-types';

/**
 * Validation of the season input and the season's hours laid out once; a variant of the house
 * (a measure, a degree-day step) then runs on them.
 */

export const SOLAR_USEFUL_FRACTION_ROW_ID = 'solar-useful-fraction';

/** Range a heat-loss factor (calibrated against fuel bills) may take. */
export const HEAT_LOSS_FACTOR_LIMITS = { min: 0.2, max: 5 } as const;

/**
 * A house's heat-loss coefficients multiplied by `factor`: every part of UA and the coupling to the
 * night sky alike, so the factor stands for measured ÷ modelled loss as a whole.
 */
export function scaledThermal(thermal: HouseThermal, factor: number): HouseThermal {
  if (factor === 1) return thermal;
  const scaleParts = (parts: EnvelopeParts): EnvelopeParts =>
    Object.fromEntries(Object.entries(parts).map(([key, value]) => [key, value * factor])) as EnvelopeParts;
  const scaleSky = (sky: SkyCoupling): SkyCoupling => ({
    ...sky,
    cropM2: sky.cropM2 * factor,
    coverM2: sky.coverM2 * factor,
    totalM2: sky.totalM2 * factor,
  });
  return {
    ...thermal,
    uaOpenWPerK: thermal.uaOpenWPerK * factor,
    uaClosedWPerK: thermal.uaClosedWPerK * factor,
    partsOpenWPerK: scaleParts(thermal.partsOpenWPerK),
    partsClosedWPerK: scaleParts(thermal.partsClosedWPerK),
    skyOpen: scaleSky(thermal.skyOpen),
    skyClosed: scaleSky(thermal.skyClosed),
  };
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
  validateShadeCloth(input.house);
  validateLamps(input.house.lamps, 'house.lamps', ref);
  const fuel = validateFuelPrice(input.fuel, ref);
  validateHeaterEfficiency(input.heaterEfficiency);
  requireHhvEfficiency('heaterEfficiency', input.heaterEfficiency, fuel);
  if (input.calendar) validateCalendar(input.calendar);
  if (!input.climate || typeof input.climate !== 'object') throw new EngineInputError('climate', 'climate is required');

  let climate: SiteClimate | LoggedTemperatures;
  let clearness: number[];
  let clearnessFromUser: boolean;
  let dewPointCByMonth: Array<number | null> | null = null;
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
    dewPointCByMonth = dewPointsByMonth(climate);
  }

  const usefulRow = referenceRow<UsefulFractionRow>(ref, 'climate-defaults', SOLAR_USEFUL_FRACTION_ROW_ID);
  if (!usefulRow || typeof usefulRow.fraction !== 'number') {
    throw new Error(`reference-data/climate-defaults.json needs a ${SOLAR_USEFUL_FRACTION_ROW_ID} row`);
  }
  let solarUsefulFraction = usefulRow.fraction;
  if (input.solarUsefulFraction !== undefined && input.solarUsefulFraction !== null) {
    solarUsefulFraction = requireInRange('solarUsefulFraction', input.solarUsefulFraction, 0, 1);
  }

  if (input.heatLossFactor !== undefined && input.heatLossFactor !== null) {
    requireInRange('heatLossFactor', input.heatLossFactor, HEAT_LOSS_FACTOR_LIMITS.min, HEAT_LOSS_FACTOR_LIMITS.max);
  }

  const heaters = installedHeaterOutput(input.house, ref);
  const hours = buildSeasonHours(
    { site, range: input.season, climate, clearnessByMonth: clearness, dewPointCByMonth },
    ref,
    sunCache,
  );
  return {
    input,
    hours,
    fuel,
    clearness,
    clearnessFromUser,
    dewPointCByMonth,
    solarUsefulFraction,
    solarUsefulFractionRow: usefulRow,
    heaterOutputW: heaters.outputW,
    heaterCount: heaters.heaterCount,
  };
}

/** The climate's dew point by month (index 0 = January), or null when it gives none for any month. */
function dewPointsByMonth(climate: SiteClimate): Array<number | null> | null {
  const byMonth: Array<number | null> = new Array<number | null>(12).fill(null);
  for (const row of climate.monthly) {
    if (typeof row.meanDewPointC === 'number') byMonth[row.month - 1] = row.meanDewPointC;
  }
  return byMonth.some((value) => value !== null) ? byMonth : null;
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
  /** leave the lamps' heat out (degree-day comparison steps) */
  withoutLamps?: boolean;
  /** leave out the radiation to the night sky (degree-day comparison steps) */
  withoutSky?: boolean;
}

/** Simulation parameters for a variant of the house on the prepared season. */
export function variantParameters(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  ref: ReferenceData,
  options: VariantOptions = {},
): { thermal: HouseThermal; parameters: SimulationParameters; lamps: SeasonLampSchedule | null } {
  const thermal =
    options.thermal ??
    scaledThermal(houseThermal(variant.house, prepared.input.site.elevationM, ref), prepared.input.heatLossFactor ?? 1);
  const { daySetpointC, nightSetpointC } = dailySetpoints(
    prepared.hours.firstDayNumber,
    prepared.hours.dayCount,
    variant.house.setpoints,
    variant.calendar,
    options.nightSetpointLowerK ?? 0,
  );
  restrictToSeason(prepared.hours, variant.season, daySetpointC, nightSetpointC);
  const lamps = seasonLampSchedule(
    prepared.hours,
    variant.house.lamps,
    thermal.geometry.floorAreaM2,
    (day) => daySetpointC[day] === daySetpointC[day],
  );
  return {
    thermal,
    lamps,
    parameters: {
      uaDayWPerK: thermal.uaOpenWPerK,
      uaNightWPerK: options.curtainOpen ? thermal.uaOpenWPerK : thermal.uaClosedWPerK,
      skyNightM2: options.withoutSky ? 0 : (options.curtainOpen ? thermal.skyOpen : thermal.skyClosed).totalM2,
      solarGainAreaM2: options.withoutSun
        ? 0
        : thermal.roofCovering.lightTransmittance *
          thermal.envelopeLightFactor *
          thermal.geometry.floorAreaM2 *
          prepared.solarUsefulFraction,
      // a shade cloth takes its share of the sun in the months it is in place
      solarShadeByMonth: shadeTransmittanceByMonth(variant.house),
      daySetpointC: options.nightSetpointAllDay ? nightSetpointC : daySetpointC,
      nightSetpointC,
      heaterOutputW: options.uncapped ? Infinity : variant.heaterOutputW,
      lamps: lamps && !options.withoutLamps ? lamps : null,
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
  const { thermal, parameters, lamps } = variantParameters(prepared, variant, ref, options);
  return { thermal, parameters, lamps, result: simulateSeason(prepared.hours, parameters) };
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
