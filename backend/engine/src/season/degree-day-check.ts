import { quantityToken } from '../vocabulary';
import { EngineInputError } from '../errors';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { degreeDayHeatKWh, FAHRENHEIT_DEGREES_PER_KELVIN, seasonDegreeDays } from './degree-days';
import { fuelAmount, runVariant } from './prepare-season';
import type { SimulationResult } from './season-simulation';
import type {
  ConventionalBaseCheck,
  DegreeDayCrossCheck,
  DegreeDayStep,
  PreparedSeason,
  SeasonVariant,
  VariantRun,
} from './season-types';

/** The degree-day figure, walked step by step to the hourly one, and the heater-shortfall caution. */

export function degreeDayCrossCheck(
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
    withoutLamps: true,
    withoutSky: true,
  });
  const withDaySetpoint = runVariant(prepared, variant, ref, {
    thermal,
    withoutSun: true,
    curtainOpen: true,
    uncapped: true,
    withoutLamps: true,
    withoutSky: true,
  });
  const withCurtain = runVariant(prepared, variant, ref, {
    thermal,
    withoutSun: true,
    uncapped: true,
    withoutLamps: true,
    withoutSky: true,
  });
  const hasLamps = run.parameters.lamps !== null && run.parameters.lamps !== undefined;
  const withSky = runVariant(prepared, variant, ref, { thermal, withoutSun: true, uncapped: true, withoutLamps: true });
  const short = result.unmetHeatWh > 0;
  const uncappedKWh =
    short || hasLamps
      ? runVariant(prepared, variant, ref, { thermal, uncapped: true }).result.totalHeatWh / 1000
      : result.totalHeatWh / 1000;
  const withSunKWh = hasLamps
    ? runVariant(prepared, variant, ref, { thermal, uncapped: true, withoutLamps: true }).result.totalHeatWh / 1000
    : uncappedKWh;
  const energies = [
    degreeDayKWh,
    hourlyNoSunNight.result.totalHeatWh / 1000,
    withDaySetpoint.result.totalHeatWh / 1000,
    withCurtain.result.totalHeatWh / 1000,
    withSky.result.totalHeatWh / 1000,
    withSunKWh,
  ];
  const labels: Array<[DegreeDayStep['key'], string]> = [
    ['degree-day', 'Degree-day method: daily mean temperatures, night setpoint all day, curtain open, no sun'],
    ['hourly-curve', 'Hour by hour through the daily temperature curve (same setpoint, curtain open, no sun)'],
    ['day-setpoint', 'Day setpoint between sunrise and sunset'],
    ['curtain', 'Curtain drawn at night'],
    ['sky', 'Long-wave radiation to the night sky (through the roof and from the coverings)'],
    ['sun', 'Sunlight through the roof offsets heating by day'],
  ];
  if (hasLamps) {
    energies.push(uncappedKWh);
    labels.push(['lamps', 'Heat from the supplemental lamps in the hours they run']);
  }
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
    conventionalBase: conventionalBaseCheck(prepared, variant, run, ref),
  };
}

/**
 * Degree-days of the same heated days to the conventional 65 °F base (reference-data
 * degree-days.json, 'hdd-base-us'), through the same formula, so the figure can be set beside
 * published base-65 degree-days.
 */
function conventionalBaseCheck(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  run: VariantRun,
  ref: ReferenceData,
): ConventionalBaseCheck {
  const row = referenceRow<ReferenceRow & { baseC: number }>(ref, 'degree-days', 'hdd-base-us');
  if (!row)
    throw new EngineInputError('degree-days', "the reference data lack the 65 °F degree-day base ('hdd-base-us')");
  const night = run.parameters.nightSetpointC;
  const baseOfDay = night.map((setpoint) => (setpoint === setpoint ? row.baseC : Number.NaN));
  const degreeDaysKDay = seasonDegreeDays(prepared.hours, baseOfDay).total;
  return {
    ...fuelAmount(degreeDayHeatKWh(run.thermal.uaOpenWPerK, degreeDaysKDay), variant),
    baseTemperatureC: row.baseC,
    degreeDaysKDay,
    degreeDaysFDay: degreeDaysKDay * FAHRENHEIT_DEGREES_PER_KELVIN,
    note:
      `The conventional ${quantityToken('temperature', row.baseC)} base assumes a building's internal gains (people, lights, ` +
      'appliances) cover the last few degrees; a greenhouse at night has almost none, so the night-setpoint base is the one to use for a greenhouse.',
    source: `${row.source}; the reasoning on internal gains: ASHRAE Handbook — Fundamentals, degree-day method (recalled, not checked)`,
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
  const [, curve, daySetpoint, curtain, sky, sun] = steps;
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
    `At night the sky is colder than the air: the crop radiates to it through a roof that passes long-wave radiation, ` +
      `and the coverings' outer surfaces lose to it as if the air were colder. The degree-day method leaves this out; it adds ${percentOf(sky.changeKWh, base)}.`,
  );
  lines.push(
    `Sunlight through the roof covers part of the daytime loss: ${percentOf(sun.changeKWh, base)}. The degree-day method leaves the sun out, which is why it usually reads high for greenhouses.`,
  );
  const lamps = steps.find((step) => step.key === 'lamps');
  if (lamps) {
    lines.push(
      `Heat from the supplemental lamps, in the hours they run, covers part of the loss: ${percentOf(lamps.changeKWh, base)}. ` +
        'The degree-day method knows nothing of them.',
    );
  }
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
