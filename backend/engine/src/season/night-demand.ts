import { BOUNDS } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { ReferenceData } from '../reference-data.types';
import { civilDate, dayNumber, isoDate, isoLocalHour, parseIsoDate } from '../climate/calendar-days';
import {
  baseVariant,
  capacityCaution,
  fuelAmount,
  prepareSeason,
  variantParameters,
  type EstimateSeasonInput,
  type FuelAmount,
} from '../estimate-season';
import { fuelCautions } from './fuel';
import { SunCache } from './sun-hours';

/**
 * Heat and fuel for one night: from sunset on `date` to sunrise the next morning, the curtain
 * drawn (if the house has one), the house held at the night setpoint:
 *   E = Σ_hours (night share of the hour) × min(P, max(0, UA_curtain · (T_night − T_out) + S · D)) × 1 h,
 * S · D the loss to the night sky as in the season (season-simulation.ts),
 * P the installed heater output: an hour that needs more than P is one the heaters cannot hold.
 * Outdoor temperature comes from the climate's daily curve (or logged readings) at mid-hour.
 * Supplemental lamps are left out, as on the design night: the figure is the heat the heaters must
 * be able to give that night if the lamps are off.
 */
export interface NightDemandInput extends Omit<EstimateSeasonInput, 'season' | 'calendar'> {
  /** 'YYYY-MM-DD' of the evening the night begins */
  date: string;
  /** the night setpoint; the house's own when absent, °C */
  nightSetpointC?: number;
}

export interface NightHour {
  /** start of the hour, local standard time */
  at: string;
  outdoorC: number;
  /** share of the hour after sunset / before sunrise */
  nightShare: number;
  /** average heat demand over the hour's night share, W */
  heatW: number;
  /** the part of heatW lost to the night sky, W */
  skyW: number;
  /** heat the heaters deliver (at most their installed output), W */
  deliveredW: number;
  /** true when the heaters cannot hold the night setpoint this hour */
  belowSetpoint: boolean;
}

export interface NightDemand extends FuelAmount {
  date: string;
  /** local standard time; null where the sun does not set or rise (polar) */
  sunset: string | null;
  sunrise: string | null;
  nightHours: number;
  nightSetpointC: number;
  uaWPerK: number;
  peakW: number;
  minOutdoorC: number;
  /** installed heater output, W */
  installedOutputW: number;
  /** heat needed but not delivered (heaters too small), kWh */
  unmetHeatKWh: number;
  /** heat lost to the night sky over the night (part of the need), kWh */
  skyKWh: number;
  /** night hours in which the heaters cannot hold the setpoint */
  hoursBelowSetpoint: number;
  /** set when some hour cannot be held; may hold {{kind:valueSI}} tokens */
  capacityCaution: string | null;
  hourly: NightHour[];
  cautions: string[];
}

export function nightHeatingDemand(
  input: NightDemandInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): NightDemand {
  const date = parseIsoDate(input.date);
  if (!date) throw new EngineInputError('date', 'the date must be written YYYY-MM-DD');
  const nightSetpointC =
    input.nightSetpointC === undefined || input.nightSetpointC === null
      ? input.house?.setpoints?.nightHeatingC
      : requireInRange('nightSetpointC', input.nightSetpointC, BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  const house = { ...input.house, setpoints: { ...input.house.setpoints, nightHeatingC: nightSetpointC } };
  const first = dayNumber(date.year, date.month, date.day);
  const season = { startDate: input.date, endDate: isoDate(civilDate(first + 1)) };
  const prepared = prepareSeason({ ...input, house, season, calendar: null }, ref, sunCache);
  const variant = baseVariant(prepared);
  const { thermal, parameters } = variantParameters(prepared, variant, ref);
  const { hours } = prepared;

  const hourly: NightHour[] = [];
  let heatWh = 0;
  let unmetHeatWh = 0;
  let skyWh = 0;
  let hoursBelowSetpoint = 0;
  let nightHours = 0;
  let peakW = 0;
  let minOutdoorC = Infinity;
  // Noon to noon holds exactly one evening and the following morning.
  for (let hour = 12; hour < 36; hour++) {
    const nightShare = 1 - hours.dayFraction[hour];
    if (nightShare <= 0) continue;
    const outdoorC = hours.outdoorC[hour];
    const setpointC = parameters.nightSetpointC[Math.floor(hour / 24)];
    const skyW = parameters.skyNightM2 * hours.skyDeficitWPerM2[hour];
    const lossW = Math.max(0, parameters.uaNightWPerK * (setpointC - outdoorC) + skyW);
    const deliveredW = Math.min(lossW, parameters.heaterOutputW);
    const belowSetpoint = lossW > deliveredW;
    heatWh += nightShare * deliveredW;
    unmetHeatWh += nightShare * (lossW - deliveredW);
    if (lossW > 0) skyWh += nightShare * skyW;
    if (belowSetpoint) hoursBelowSetpoint++;
    nightHours += nightShare;
    if (lossW > peakW) peakW = lossW;
    if (outdoorC < minOutdoorC) minOutdoorC = outdoorC;
    hourly.push({
      at: isoLocalHour(first + Math.floor(hour / 24), hour % 24),
      outdoorC,
      nightShare,
      heatW: lossW,
      skyW: lossW > 0 ? skyW : 0,
      deliveredW,
      belowSetpoint,
    });
  }

  const sunToday = sunCache.get(prepared.input.site, date.year, ref);
  const todayIndex = first - dayNumber(date.year, 1, 1) + 1;
  const tomorrow = civilDate(first + 1);
  const sunTomorrow = sunCache.get(prepared.input.site, tomorrow.year, ref);
  const tomorrowIndex = first + 1 - dayNumber(tomorrow.year, 1, 1) + 1;
  const sunset = sunToday.noSunriseOrSunset[todayIndex] ? null : isoLocalHour(first, sunToday.sunsetHour[todayIndex]);
  const sunrise = sunTomorrow.noSunriseOrSunset[tomorrowIndex]
    ? null
    : isoLocalHour(first + 1, sunTomorrow.sunriseHour[tomorrowIndex]);

  return {
    date: input.date,
    sunset,
    sunrise,
    nightHours,
    nightSetpointC,
    uaWPerK: thermal.uaClosedWPerK,
    ...fuelAmount(heatWh / 1000, variant),
    peakW,
    minOutdoorC: Number.isFinite(minOutdoorC) ? minOutdoorC : NaN,
    installedOutputW: variant.heaterOutputW,
    unmetHeatKWh: unmetHeatWh / 1000,
    skyKWh: skyWh / 1000,
    hoursBelowSetpoint,
    capacityCaution: capacityCaution(variant.heaterOutputW, { unmetHeatWh, hoursBelowSetpoint, peakW }, 'night'),
    hourly,
    cautions: fuelCautions(variant.fuelRow),
  };
}
