import { requireInRange } from '../errors';
import { OUTDOOR_TEMPERATURE_LIMITS_C, SURFACE_GROUPS, type SurfaceGroup } from '../vocabulary';
import type { ReferenceData, ReferenceRow } from '../reference-data.types';
import type { HeatLossCoefficients } from './heat-loss';
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
 *
 * Both paths are proportional to the same sky deficit σ (T_air⁴ − T_sky⁴) = σ T_air⁴ (1 − ε_sky)
 * (`skyDeficitWPerM2`), so a house's sky loss is `skyCoupling(...).totalM2` × that deficit. The design
 * night (clear-night.ts) and the season's hours (season/season-hours.ts) both go through it.
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
  hWPerM2K?: number;
}

const KELVIN_AT_0_C = 273.15;

export interface SkyConstants {
  stefanBoltzmann: number;
  clearSky: { a: number; b: number; c: number };
  cloud: { c1: number; c2: number; c3: number };
  cropEmissivity: number;
  clearNightDewPointDepressionK: number;
  /** outside surface film coefficient in winter wind, W/(m²·K) */
  outsideFilmWPerM2K: number;
  /** G/G_clear = 1 − a (N/8)^exponent (Kasten & Czeplak 1980) */
  cloudFromClearness: { a: number; exponent: number };
  /** the night dew point below the day's minimum temperature where the climate gives none, K */
  nightDewPointBelowDailyMinimumK: number;
  rows: {
    stefanBoltzmann: SkyRow;
    clearSky: SkyRow;
    cloud: SkyRow;
    crop: SkyRow;
    depression: SkyRow;
    outsideFilm: SkyRow;
    cloudFromClearness: SkyRow;
    nightDewPoint: SkyRow;
  };
}

export function skyConstants(ref: ReferenceData): SkyConstants {
  const sigma = requiredRow<SkyRow>(ref, 'sky-radiation', 'stefan-boltzmann');
  const clear = requiredRow<SkyRow>(ref, 'sky-radiation', 'clear-sky-berdahl-martin');
  const cloud = requiredRow<SkyRow>(ref, 'sky-radiation', 'cloud-factor-clark-allen');
  const crop = requiredRow<SkyRow>(ref, 'sky-radiation', 'crop-emissivity');
  const depression = requiredRow<SkyRow>(ref, 'sky-radiation', 'clear-night-dew-point-depression');
  const outsideFilm = requiredRow<SkyRow>(ref, 'surface-coefficients', 'outside-winter');
  const cloudFromClearness = requiredRow<SkyRow>(ref, 'sky-radiation', 'cloud-cover-from-clearness-kasten-czeplak');
  const nightDewPoint = requiredRow<SkyRow>(ref, 'sky-radiation', 'night-dew-point-from-daily-minimum');
  return {
    stefanBoltzmann: sigma.valueWPerM2K4 as number,
    clearSky: { a: clear.a as number, b: clear.b as number, c: clear.c as number },
    cloud: { c1: cloud.c1 as number, c2: cloud.c2 as number, c3: cloud.c3 as number },
    cropEmissivity: crop.value as number,
    clearNightDewPointDepressionK: depression.valueK as number,
    outsideFilmWPerM2K: outsideFilm.hWPerM2K as number,
    cloudFromClearness: { a: cloudFromClearness.a as number, exponent: cloudFromClearness.exponent as number },
    nightDewPointBelowDailyMinimumK: nightDewPoint.valueK as number,
    rows: {
      stefanBoltzmann: sigma,
      clearSky: clear,
      cloud,
      crop,
      depression,
      outsideFilm,
      cloudFromClearness,
      nightDewPoint,
    },
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

/** The cloud factor 1 + c1 N + c2 N² + c3 N³, N opaque cloud cover in tenths, 0–10 (Clark & Allen 1978). */
export function cloudFactor(cloudCoverTenths: number, constants: SkyConstants): number {
  const n = Math.min(10, Math.max(0, cloudCoverTenths));
  const { c1, c2, c3 } = constants.cloud;
  return 1 + c1 * n + c2 * n * n + c3 * n * n * n;
}

/** ε_sky = ε_clear × the cloud factor, at most 1 (Clark & Allen 1978). */
export function skyEmissivity(clearEmissivity: number, cloudCoverTenths: number, constants: SkyConstants): number {
  return Math.min(1, clearEmissivity * cloudFactor(cloudCoverTenths, constants));
}

/**
 * Opaque cloud cover in tenths from a clearness K (actual ÷ clear-sky global irradiance): Kasten &
 * Czeplak's G/G_clear = 1 − a (N/8)^b inverted, N/8 = ((1 − K)/a)^(1/b), at most 1 (overcast).
 */
export function cloudCoverTenthsFromClearness(clearness: number, constants: SkyConstants): number {
  const { a, exponent } = constants.cloudFromClearness;
  const k = Math.min(1, Math.max(0, clearness));
  return 10 * Math.min(1, Math.pow((1 - k) / a, 1 / exponent));
}

/** The sky's emissivity over air at `airC` with dew point `dewPointC` (held at or below the air) and cloud cover in tenths. */
export function skyEmissivityAt(
  airC: number,
  dewPointC: number,
  cloudCoverTenths: number,
  constants: SkyConstants,
): number {
  return skyEmissivity(clearSkyEmissivity(Math.min(airC, dewPointC), constants), cloudCoverTenths, constants);
}

/** T_sky = ε^¼ × T_air, °C. */
export function skyTemperatureC(airC: number, emissivity: number): number {
  return Math.pow(emissivity, 0.25) * (airC + KELVIN_AT_0_C) - KELVIN_AT_0_C;
}

/**
 * What a black surface at the air temperature loses to the sky, W/m²: σ (T_air⁴ − T_sky⁴), which is
 * σ T_air⁴ (1 − ε_sky) since T_sky⁴ = ε_sky T_air⁴ (no fourth root needed, so it is cheap hour by hour).
 */
export function skyDeficitWPerM2(airC: number, emissivity: number, constants: SkyConstants): number {
  const airK = airC + KELVIN_AT_0_C;
  const squared = airK * airK;
  return constants.stefanBoltzmann * squared * squared * (1 - emissivity);
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
  /** σ (T_air⁴ − T_sky⁴), W/m² */
  deficitWPerM2: number;
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
  const emissivity = skyEmissivityAt(outdoorC, dewPointC, input.cloudCoverTenths, constants);
  const deficitWPerM2 = skyDeficitWPerM2(outdoorC, emissivity, constants);
  const wPerM2Floor = clampFraction(input.thermalIrTransmittance) * constants.cropEmissivity * deficitWPerM2;
  return {
    dewPointC,
    skyEmissivity: emissivity,
    skyTemperatureC: skyTemperatureC(outdoorC, emissivity),
    deficitWPerM2,
    wPerM2Floor,
    lossW: wPerM2Floor * input.floorAreaM2,
  };
}

function clampFraction(value: number): number {
  return Math.min(1, Math.max(0, value));
}

/** How strongly a house is coupled to the sky: its sky loss in W is `totalM2` × the sky deficit in W/m². */
export interface SkyCoupling {
  /** the roof covering's thermal-infrared transmittance used (0 under a drawn curtain) */
  thermalIrTransmittance: number;
  /** the crop's radiation through the roof per W/m² of deficit: τ_IR × ε_crop × floor area, m² */
  cropM2: number;
  /** how much colder each covering's outer surface makes the air seem per W/m² of deficit: ε_o / h_o, K·m²/W */
  coverKPerWPerM2: Record<SurfaceGroup, number>;
  /** the extra loss through the coverings per W/m² of deficit: Σ U·A × ε_o / h_o, m² */
  coverM2: number;
  /** cropM2 + coverM2 */
  totalM2: number;
}

/**
 * The two paths to the sky for a house with these coefficients (curtain drawn or not, as they
 * were computed): the crop through the roof (a drawn curtain is treated as opaque to long-wave
 * radiation, common practice, no source: aluminised and most woven curtain fabrics pass little of
 * it), and each covering's outer surface through its U·A.
 */
export function skyCoupling(
  coefficients: HeatLossCoefficients,
  floorAreaM2: number,
  constants: SkyConstants,
): SkyCoupling {
  const roof = coefficients.rows.coverings.roof;
  const thermalIrTransmittance = coefficients.curtainApplied ? 0 : clampFraction(roof.thermalIrTransmittance ?? 0);
  const cropM2 = thermalIrTransmittance * constants.cropEmissivity * floorAreaM2;
  const coverKPerWPerM2 = {} as Record<SurfaceGroup, number>;
  let coverM2 = 0;
  for (const group of SURFACE_GROUPS) {
    const emissivity = Math.max(0, coefficients.rows.coverings[group].outerLongWaveEmissivity ?? 0);
    coverKPerWPerM2[group] = emissivity / constants.outsideFilmWPerM2K;
    coverM2 += coefficients.coveringWPerK[group] * coverKPerWPerM2[group];
  }
  return { thermalIrTransmittance, cropM2, coverKPerWPerM2, coverM2, totalM2: cropM2 + coverM2 };
}
