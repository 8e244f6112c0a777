import { requireInRange } from '../errors';
import { OUTDOOR_TEMPERATURE_LIMITS_C } from '../vocabulary';
import type { ReferenceData, ReferenceRow } from '../reference-data.types';
import { requiredRow } from './heating-reference';

/**
 * Long-wave loss to the night sky (reference-data/sky-radiation.json).
 *
 * The sky radiates like a black body at T_sky = ε_sky^¼ × T_air (kelvin). Its emissivity on a clear
 * night follows the dew point (Berdahl & Martin 1984); clouds raise it toward 1 (Clark & Allen
 * 1978). Tabulated U-values count the covering's exchange with surroundings at the outdoor air
 * temperature, so what a clear sky adds is the radiation the crop sends through a covering that
 * passes thermal infrared to a sky colder than the air:
 *   q = τ_IR × ε_crop × σ × (T_air⁴ − T_sky⁴)   per m² of floor (the crop sees the sky through the roof).
 * Films of ordinary polyethylene pass about half; glass, rigid plastics and IR-absorbing films
 * little, which is why they lose less on clear nights.
 *
 * The covering's outer surface also sees the sky instead of air at T_air: it radiates an extra
 * ε_o σ (T_air⁴ − T_sky⁴) per m², which the outside film h_o must bring in from the air, so the
 * covering behaves as if the outdoor air were colder by ΔT = ε_o σ (T_air⁴ − T_sky⁴) / h_o
 * (`coverSkyCoolingK`): more loss through U, and a colder inside surface that drips sooner.
 */

interface SkyRow extends ReferenceRow {
  valueWPerM2K4?: number;
  a?: number;
  b?: number;
  c?: number;
  c1?: number;
  c2?: number;
  c3?: number;
  value?: number;
  valueK?: number;
  coefficient?: number;
  exponent?: number;
}

const KELVIN_AT_0_C = 273.15;

export interface SkyConstants {
  stefanBoltzmann: number;
  clearSky: { a: number; b: number; c: number };
  cloud: { c1: number; c2: number; c3: number };
  cropEmissivity: number;
  clearNightDewPointDepressionK: number;
  rows: SkyRow[];
}

export function skyConstants(ref: ReferenceData): SkyConstants {
  const sigma = requiredRow<SkyRow>(ref, 'sky-radiation', 'stefan-boltzmann');
  const clear = requiredRow<SkyRow>(ref, 'sky-radiation', 'clear-sky-berdahl-martin');
  const cloud = requiredRow<SkyRow>(ref, 'sky-radiation', 'cloud-factor-clark-allen');
  const crop = requiredRow<SkyRow>(ref, 'sky-radiation', 'crop-emissivity');
  const depression = requiredRow<SkyRow>(ref, 'sky-radiation', 'clear-night-dew-point-depression');
  return {
    stefanBoltzmann: sigma.valueWPerM2K4 as number,
    clearSky: { a: clear.a as number, b: clear.b as number, c: clear.c as number },
    cloud: { c1: cloud.c1 as number, c2: cloud.c2 as number, c3: cloud.c3 as number },
    cropEmissivity: crop.value as number,
    clearNightDewPointDepressionK: depression.valueK as number,
    rows: [sigma, clear, cloud, crop, depression],
  };
}

/**
 * ε_clear = a + b (T_dp/100) + c (T_dp/100)², T_dp in °C (Berdahl & Martin 1984). The quadratic turns
 * at T_dp = −100·b/(2c) (−38.4 °C) and would rise again for drier air, far outside the dew points it
 * was fitted to; below the turning point it is held at its minimum so a drier sky is never warmer.
 */
export function clearSkyEmissivity(dewPointC: number, constants: SkyConstants): number {
  const { a, b, c } = constants.clearSky;
  const t = Math.max(dewPointC / 100, -b / (2 * c));
  return Math.min(1, Math.max(0, a + b * t + c * t * t));
}

/** ε_sky = ε_clear × (1 + c1 N + c2 N² + c3 N³), N opaque cloud cover in tenths, at most 1 (Clark & Allen 1978). */
export function skyEmissivity(clearEmissivity: number, cloudCoverTenths: number, constants: SkyConstants): number {
  const n = Math.min(10, Math.max(0, cloudCoverTenths));
  const { c1, c2, c3 } = constants.cloud;
  return Math.min(1, clearEmissivity * (1 + c1 * n + c2 * n * n + c3 * n * n * n));
}

/** T_sky = ε^¼ × T_air, °C. */
export function skyTemperatureC(airC: number, emissivity: number): number {
  return Math.pow(emissivity, 0.25) * (airC + KELVIN_AT_0_C) - KELVIN_AT_0_C;
}

export interface SkyLossInput {
  outdoorC: number;
  /** dew point of the outdoor air, °C; default the air less the clear-night depression */
  dewPointC?: number;
  /** opaque cloud cover, tenths (0 clear, 10 overcast) */
  cloudCoverTenths: number;
  floorAreaM2: number;
  /** share of long-wave radiation the covering passes (0–1) */
  thermalIrTransmittance: number;
}

export interface SkyLoss {
  dewPointC: number;
  skyEmissivity: number;
  skyTemperatureC: number;
  /** extra loss over the tabulated U, W per m² of floor */
  wPerM2Floor: number;
  /** extra loss of the whole house, W */
  lossW: number;
}

/** The loss a sky colder than the air adds through a covering that passes thermal infrared. */
export function skyRadiationLoss(input: SkyLossInput, constants: SkyConstants): SkyLoss {
  const outdoorC = requireInRange(
    'conditions.designOutdoorC',
    input.outdoorC,
    OUTDOOR_TEMPERATURE_LIMITS_C.min,
    OUTDOOR_TEMPERATURE_LIMITS_C.max,
  );
  const dewPointC = Math.min(outdoorC, input.dewPointC ?? outdoorC - constants.clearNightDewPointDepressionK);
  const emissivity = skyEmissivity(clearSkyEmissivity(dewPointC, constants), input.cloudCoverTenths, constants);
  const skyC = skyTemperatureC(outdoorC, emissivity);
  const airK = outdoorC + KELVIN_AT_0_C;
  const skyK = skyC + KELVIN_AT_0_C;
  const tau = Math.min(1, Math.max(0, input.thermalIrTransmittance));
  const wPerM2Floor = tau * constants.cropEmissivity * constants.stefanBoltzmann * (airK ** 4 - skyK ** 4);
  return {
    dewPointC,
    skyEmissivity: emissivity,
    skyTemperatureC: skyC,
    wPerM2Floor,
    lossW: wPerM2Floor * input.floorAreaM2,
  };
}

/**
 * How much colder the outdoor air seems to a covering whose outer surface (emissivity ε_o) sees a
 * sky at `skyC` instead of air at `outdoorC`, with outside film coefficient h_o: ε_o σ (T_air⁴ − T_sky⁴) / h_o.
 */
export function coverSkyCoolingK(
  outerEmissivity: number,
  outdoorC: number,
  skyC: number,
  outsideFilmWPerM2K: number,
  constants: SkyConstants,
): number {
  const airK = outdoorC + KELVIN_AT_0_C;
  const skyK = skyC + KELVIN_AT_0_C;
  return (Math.max(0, outerEmissivity) * constants.stefanBoltzmann * (airK ** 4 - skyK ** 4)) / outsideFilmWPerM2K;
}
