import { EngineInputError, requireInRange } from '../errors';
import type { HouseSpec } from '../house.types';
import type { ReferenceData } from '../reference-data.types';
import type { SiteClimate } from '../climate/site-climate';
import { fuelRow, type FuelRow } from '../season/fuel';
import { houseThermal } from '../season/house-heat-loss';
import {
  HEAT_LOSS_FACTOR_LIMITS,
  installedHeaterOutput,
  prepareSeason,
  variantParameters,
} from '../season/prepare-season';
import { validateCalendar, type ProductionCalendar } from '../season/production-calendar';
import { MAX_SEASON_DAYS, validateSeasonRange } from '../season/season-hours';
import { simulateSeason, type SeasonHours, type SimulationParameters } from '../season/season-simulation';
import type { LoggedClimateInput, PreparedSeason, SeasonSite, SeasonVariant } from '../season/season-types';
import { SunCache } from '../season/sun-hours';
import { guideline14Statistics } from './fit-statistics';
import { goldenSectionMinimum } from './golden-section';
import { describeFactor, describeFit } from './calibration-words';
import { studentTQuantile } from './student-t';

/**
 * Calibration against fuel bills: one multiplier k on each house's heat-loss coefficient
 * (coverings, perimeter and air leakage) per meter, fitted by least squares so that the hourly
 * season model, run over each bill's period, burns what the bill says.
 *
 * A meter is one fuel and one set of houses (a bill or tank delivery serves every house of its
 * set). For a meter's periods i with billed fuel energy yᵢ (kWh of fuel, higher heat content)
 * and non-heating use uᵢ (kWh of fuel over the period):
 *   ŷᵢ(k) = uᵢ + Σ_houses heat delivered over the period with UA × k ÷ heater efficiency
 *   k̂ = argmin Σ (yᵢ − ŷᵢ(k))²   over 0.2 ≤ k ≤ 5, by golden-section search
 * ŷ is not exactly linear in k (the sun offsets part of the loss; the heaters cap what is
 * delivered), hence the one-dimensional search rather than a closed form.
 * The 90 % interval is linearised: s² = Σ(yᵢ − ŷᵢ)² / (n − 1), Jᵢ = dŷᵢ/dk by central
 * difference, se = √(s² / ΣJᵢ²), k̂ ± t(0.95, n − 1) · se.
 * NMBE and CV(RMSE) follow ASHRAE Guideline 14-2014 with p = 1 (see fit-statistics.ts).
 */

export const MIN_PERIODS_FOR_FIT = 3;

export interface CalibrationHouseInput {
  id: string;
  name: string;
  house: HouseSpec;
  calendar: ProductionCalendar | null;
}

export interface CalibrationPeriodInput {
  /** the record's id, echoed back */
  id: string;
  /** first and last day the bill covers, inclusive, 'YYYY-MM-DD' */
  startDate: string;
  endDate: string;
  fuelId: string;
  houseIds: string[];
  /** fuel billed over the period, kWh of fuel energy (higher heat content) */
  billedFuelKWh: number;
  /** fuel burnt for other uses than heating the houses (a dryer, a boiler for washing), kWh per day */
  nonHeatingFuelKWhPerDay: number;
  /** the outdoor temperatures of the period: a log covering it, or the farm's normals */
  climate: SiteClimate | LoggedClimateInput;
  climateFrom: 'temperature-log' | 'normals';
}

export interface CalibrationInput {
  site: SeasonSite;
  houses: CalibrationHouseInput[];
  periods: CalibrationPeriodInput[];
}

export interface CalibrationPeriodResult {
  id: string;
  startDate: string;
  endDate: string;
  days: number;
  climateFrom: 'temperature-log' | 'normals';
  billedFuelKWh: number;
  nonHeatingFuelKWh: number;
  /** modelled fuel with the handbook heat loss (k = 1), non-heating use included, kWh */
  handbookFuelKWh: number;
  /** modelled fuel with the fitted factor, non-heating use included; null when no fit, kWh */
  fittedFuelKWh: number | null;
  /** whether the period took part in the fit; when not, `note` says why */
  usedInFit: boolean;
  note: string | null;
}

export interface MeterFit {
  /** fuel and sorted house ids, e.g. 'propane:3,4' */
  key: string;
  fuelId: string;
  fuelLabel: string;
  houseIds: string[];
  houseNames: string[];
  fitted: boolean;
  /** why no factor could be fitted, in the user's words; null when fitted */
  refusal: string | null;
  factor: number | null;
  factorLow90: number | null;
  factorHigh90: number | null;
  standardError: number | null;
  degreesOfFreedom: number | null;
  tQuantile: number | null;
  nmbePercent: number | null;
  cvRmsePercent: number | null;
  meetsGuideline14: boolean | null;
  /** the fit against Guideline 14's monthly limits, in plain words */
  verdict: string;
  /** what the factor most likely means, in plain words */
  meaning: string;
  periods: CalibrationPeriodResult[];
}

export interface CalibrationResult {
  meters: MeterFit[];
  /** each house's factor (from the meter with the most periods serving it); null when none was fitted */
  houses: Array<{ houseId: string; name: string; factor: number | null; meterKey: string | null }>;
  notes: string[];
}

interface HouseRun {
  /** per-period simulation parameters at k = 1 and the house's efficiency for the bill's fuel */
  parameters: SimulationParameters;
  hours: SeasonHours;
  efficiency: number;
}

interface PreparedPeriod {
  input: CalibrationPeriodInput;
  days: number;
  runs: HouseRun[];
  nonHeatingFuelKWh: number;
}

const K_TOLERANCE = 1e-5;

export function calibrateHeatLoss(
  input: CalibrationInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): CalibrationResult {
  if (!input || typeof input !== 'object') throw new EngineInputError('input', 'input is required');
  const houses = new Map<string, CalibrationHouseInput>();
  input.houses.forEach((house, index) => {
    if (house.calendar) validateCalendar(house.calendar, `houses[${index}].calendar`);
    houses.set(house.id, house);
  });
  const thermals = new Map(
    input.houses.map((house) => [house.id, houseThermal(house.house, input.site.elevationM, ref)] as const),
  );

  // Group the periods into meters: one fuel, one set of houses.
  const meters = new Map<string, { fuel: FuelRow; houseIds: string[]; periods: CalibrationPeriodInput[] }>();
  input.periods.forEach((period, index) => {
    const field = `periods[${index}]`;
    const fuel = fuelRow(ref, period.fuelId, `${field}.fuelId`);
    validateSeasonRange({ startDate: period.startDate, endDate: period.endDate }, field);
    requireInRange(`${field}.billedFuelKWh`, period.billedFuelKWh, Number.MIN_VALUE, 1e12);
    requireInRange(`${field}.nonHeatingFuelKWhPerDay`, period.nonHeatingFuelKWhPerDay, 0, 1e9);
    if (period.houseIds.length === 0) throw new EngineInputError(`${field}.houseIds`, 'name at least one house');
    for (const houseId of period.houseIds) {
      if (!houses.has(houseId)) throw new EngineInputError(`${field}.houseIds`, `no house ${houseId} in the input`);
    }
    const houseIds = [...new Set(period.houseIds)].sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
    const key = `${fuel.id}:${houseIds.join(',')}`;
    const meter = meters.get(key) ?? { fuel, houseIds, periods: [] };
    meter.periods.push(period);
    meters.set(key, meter);
  });

  // Lay out the hours once per climate over the span of its bills when that fits in one season
  // run (a period's own days are then picked out by its setpoints: days outside it are unheated);
  // otherwise once per period.
  const preparedByPeriod = new Map<CalibrationPeriodInput, PreparedSeason>();
  const byClimate = new Map<CalibrationPeriodInput['climate'], CalibrationPeriodInput[]>();
  for (const period of input.periods) byClimate.set(period.climate, [...(byClimate.get(period.climate) ?? []), period]);
  for (const [climate, periods] of byClimate) {
    const startDate = periods.reduce(
      (first, period) => (period.startDate < first ? period.startDate : first),
      periods[0].startDate,
    );
    const endDate = periods.reduce(
      (last, period) => (period.endDate > last ? period.endDate : last),
      periods[0].endDate,
    );
    const span = Math.round((Date.parse(endDate) - Date.parse(startDate)) / 86_400_000) + 1;
    const ranges =
      span <= MAX_SEASON_DAYS
        ? [{ startDate, endDate, periods }]
        : periods.map((period) => ({ ...period, periods: [period] }));
    for (const range of ranges) {
      const firstHouse = houses.get(range.periods[0].houseIds[0])!;
      const fuel = fuelRow(ref, range.periods[0].fuelId);
      const prepared = prepareSeason(
        {
          house: firstHouse.house,
          site: input.site,
          climate,
          season: { startDate: range.startDate, endDate: range.endDate },
          calendar: firstHouse.calendar,
          fuel: { fuelId: fuel.id, pricePerUnit: 0, priceUnit: 'si' },
          heaterEfficiency: efficiencyFor(firstHouse, fuel),
        },
        ref,
        sunCache,
      );
      for (const period of range.periods) preparedByPeriod.set(period, prepared);
    }
  }

  const meterFits: MeterFit[] = [];
  for (const [key, meter] of meters) {
    const prepared: PreparedPeriod[] = meter.periods
      .slice()
      .sort((a, b) => a.startDate.localeCompare(b.startDate))
      .map((period) => {
        const { dayCount } = validateSeasonRange({ startDate: period.startDate, endDate: period.endDate });
        const runs = meter.houseIds.map((houseId) => {
          const house = houses.get(houseId)!;
          const season = preparedByPeriod.get(period)!;
          const efficiency = efficiencyFor(house, meter.fuel);
          const variant: SeasonVariant = {
            house: house.house,
            calendar: house.calendar,
            season: { startDate: period.startDate, endDate: period.endDate },
            fuel: { fuelId: meter.fuel.id, pricePerUnit: 0, priceUnit: 'si' },
            fuelRow: meter.fuel,
            heaterEfficiency: efficiency,
            heaterOutputW: installedHeaterOutput(house.house, ref).outputW,
          };
          const { parameters } = variantParameters(season, variant, ref, { thermal: thermals.get(houseId)! });
          return { parameters, hours: season.hours, efficiency };
        });
        return { input: period, days: dayCount, runs, nonHeatingFuelKWh: period.nonHeatingFuelKWhPerDay * dayCount };
      });
    meterFits.push(fitMeter(key, meter.fuel, meter.houseIds, houses, prepared));
  }

  return { meters: meterFits, houses: houseFactors(input.houses, meterFits), notes: calibrationNotes() };
}

/** Efficiency of the house's heaters burning `fuel` (the first such group; else the first heater). */
function efficiencyFor(house: CalibrationHouseInput, fuel: FuelRow): number {
  const heater = house.house.heaters.find((group) => group.fuelId === fuel.id);
  if (!heater) {
    throw new EngineInputError(
      'houseIds',
      `${house.name} has no heater burning ${fuel.label.toLowerCase()}, so a bill for that fuel cannot be matched to it`,
    );
  }
  return heater.efficiency;
}

/** Modelled heating fuel of a period with the heat-loss coefficients and the coupling to the night sky × k, kWh (non-heating use excluded). */
function heatingFuelKWh(period: PreparedPeriod, k: number): number {
  let total = 0;
  for (const run of period.runs) {
    const result = simulateSeason(run.hours, {
      ...run.parameters,
      uaDayWPerK: run.parameters.uaDayWPerK * k,
      uaNightWPerK: run.parameters.uaNightWPerK * k,
      skyNightM2: run.parameters.skyNightM2 * k,
    });
    total += result.totalHeatWh / 1000 / run.efficiency;
  }
  return total;
}

function fitMeter(
  key: string,
  fuel: FuelRow,
  houseIds: string[],
  houses: Map<string, CalibrationHouseInput>,
  periods: PreparedPeriod[],
): MeterFit {
  const handbook = periods.map((period) => heatingFuelKWh(period, 1));
  const used = periods.map((_, index) => handbook[index] > 0);
  const fitPeriods = periods.filter((_, index) => used[index]);
  const base = {
    key,
    fuelId: fuel.id,
    fuelLabel: fuel.label,
    houseIds,
    houseNames: houseIds.map((id) => houses.get(id)!.name),
  };
  const periodResults = (fitted: number[] | null): CalibrationPeriodResult[] =>
    periods.map((period, index) => ({
      id: period.input.id,
      startDate: period.input.startDate,
      endDate: period.input.endDate,
      days: period.days,
      climateFrom: period.input.climateFrom,
      billedFuelKWh: period.input.billedFuelKWh,
      nonHeatingFuelKWh: period.nonHeatingFuelKWh,
      handbookFuelKWh: handbook[index] + period.nonHeatingFuelKWh,
      fittedFuelKWh: fitted ? fitted[index] : null,
      usedInFit: used[index],
      note: used[index]
        ? null
        : 'The model finds no heating demand in this period (the houses are empty or it is warm enough), so it says nothing about heat loss and is left out of the fit.',
    }));

  if (fitPeriods.length < MIN_PERIODS_FOR_FIT) {
    const unheated = periods.length - fitPeriods.length;
    const refusal =
      `A factor needs at least ${MIN_PERIODS_FOR_FIT} bills with heating in them for the same houses and fuel; ` +
      `${base.houseNames.join(' and ')} on ${fuel.label.toLowerCase()} ${fitPeriods.length === 1 ? 'has' : 'have'} ${fitPeriods.length}` +
      (unheated > 0 ? ` (${unheated} more fall in periods with no heating demand)` : '') +
      '. Add the bills of more heating months and run the calibration again.';
    return { ...base, ...noFit(refusal), periods: periodResults(null) };
  }

  const billedHeating = fitPeriods.map((period) => period.input.billedFuelKWh - period.nonHeatingFuelKWh);
  if (billedHeating.every((value) => value <= 0)) {
    const refusal =
      'The non-heating use entered is as large as every bill, which leaves no fuel for heating to fit a factor to. Check the non-heating use per day.';
    return { ...base, ...noFit(refusal), periods: periodResults(null) };
  }

  const sumOfSquares = (k: number) =>
    fitPeriods.reduce((sum, period, index) => {
      const residual = billedHeating[index] - heatingFuelKWh(period, k);
      return sum + residual * residual;
    }, 0);
  const factor = goldenSectionMinimum(
    sumOfSquares,
    HEAT_LOSS_FACTOR_LIMITS.min,
    HEAT_LOSS_FACTOR_LIMITS.max,
    K_TOLERANCE,
  );

  const fitted = periods.map((period) => heatingFuelKWh(period, factor) + period.nonHeatingFuelKWh);
  const measured = fitPeriods.map((period) => period.input.billedFuelKWh);
  const modelled = fitted.filter((_, index) => used[index]);
  const stats = guideline14Statistics(measured, modelled, 1);

  const n = fitPeriods.length;
  const step = 1e-3 * factor;
  let jacobianSquares = 0;
  for (const period of fitPeriods) {
    const slope = (heatingFuelKWh(period, factor + step) - heatingFuelKWh(period, factor - step)) / (2 * step);
    jacobianSquares += slope * slope;
  }
  const residualVariance = sumOfSquares(factor) / (n - 1);
  const standardError = jacobianSquares > 0 ? Math.sqrt(residualVariance / jacobianSquares) : Infinity;
  const tQuantile = studentTQuantile(0.95, n - 1);
  const atLimit =
    factor - HEAT_LOSS_FACTOR_LIMITS.min < 10 * K_TOLERANCE || HEAT_LOSS_FACTOR_LIMITS.max - factor < 10 * K_TOLERANCE;

  return {
    ...base,
    fitted: true,
    refusal: null,
    factor,
    factorLow90: factor - tQuantile * standardError,
    factorHigh90: factor + tQuantile * standardError,
    standardError,
    degreesOfFreedom: n - 1,
    tQuantile,
    nmbePercent: stats.nmbePercent,
    cvRmsePercent: stats.cvRmsePercent,
    meetsGuideline14: stats.meetsMonthlyLimits,
    verdict: describeFit(stats, n),
    meaning: describeFactor(factor, atLimit),
    periods: periodResults(fitted),
  };
}

function noFit(refusal: string) {
  return {
    fitted: false,
    refusal,
    factor: null,
    factorLow90: null,
    factorHigh90: null,
    standardError: null,
    degreesOfFreedom: null,
    tQuantile: null,
    nmbePercent: null,
    cvRmsePercent: null,
    meetsGuideline14: null,
    verdict: refusal,
    meaning: 'No factor was fitted, so estimates stay on the handbook values.',
  };
}

function houseFactors(houses: CalibrationHouseInput[], meters: MeterFit[]): CalibrationResult['houses'] {
  return houses.map((house) => {
    const serving = meters
      .filter((meter) => meter.fitted && meter.houseIds.includes(house.id))
      .sort((a, b) => b.periods.filter((p) => p.usedInFit).length - a.periods.filter((p) => p.usedInFit).length);
    const meter = serving[0];
    return { houseId: house.id, name: house.name, factor: meter?.factor ?? null, meterKey: meter?.key ?? null };
  });
}

function calibrationNotes(): string[] {
  return [
    'Fuel is compared as the energy it holds (its higher heat content), so bills in any unit of the fuel add up.',
    'The factor multiplies the heat-loss coefficient of the coverings, the perimeter and the air leakage together: the bills cannot tell them apart.',
    'Where several houses share a meter or tank, they share one factor.',
  ];
}
