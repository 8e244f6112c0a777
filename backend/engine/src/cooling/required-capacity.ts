import type { ExhaustFans } from '../house.types';
import { standardAtmosphericPressurePa } from '../psychrometrics';
import type { ReferenceData } from '../reference-data.types';
import { elevationFactorRow, ventilationValue } from './cooling-reference';

export const METRES_PER_FOOT = 0.3048; // exact by definition

export interface CapacityFactors {
  elevation: number;
  light: number;
  temperatureRise: number;
  velocity: number;
  /** elevation × light × temperatureRise */
  house: number;
  /** the larger of house and velocity */
  applied: number;
}

export interface CapacityResult {
  baseRateM3PerSM2: number;
  factors: CapacityFactors;
  /** base rate × applied factor × floor area: the floor-area method alone, m³/s */
  floorAreaMethodFlowM3PerS: number;
  /** flow the lamps' heat adds over the floor-area method, m³/s (0 without lamps or when they run in a dim hour) */
  lampFlowM3PerS: number;
  /** the design-day solar hour that sets the requirement with the lamps, null when the floor-area method does */
  lampGoverningHour: number | null;
  /** the larger of the floor-area method and the lit hours' need, m³/s */
  requiredFlowM3PerS: number;
  installedFlowM3PerS: number;
  verdict: 'adequate' | 'short' | 'no-fans';
  fansNeeded: number | null;
  additionalFansNeeded: number | null;
  inletAreaNeededM2: number;
  inletAreaM2: number;
  inletVerdict: 'adequate' | 'short';
}

export interface ElevationFactor {
  factor: number;
  /** true above the table's last elevation, where the factor is extrapolated by air density */
  beyondTable: boolean;
}

/**
 * Elevation factor: linear between the table's points; above the last point the last factor is
 * scaled by the standard-atmosphere pressure ratio (thinner air carries less heat per m³).
 */
export function elevationFactor(elevationM: number, ref: ReferenceData): ElevationFactor {
  const row = elevationFactorRow(ref);
  const elevationFt = Math.max(0, elevationM) / METRES_PER_FOOT;
  const points = row.elevationsFt;
  const factors = row.factors;
  const last = points.length - 1;
  if (elevationFt <= points[0]) return { factor: factors[0], beyondTable: false };
  if (elevationFt > points[last]) {
    const densityRatio =
      standardAtmosphericPressurePa(points[last] * METRES_PER_FOOT) / standardAtmosphericPressurePa(elevationM);
    return { factor: factors[last] * densityRatio, beyondTable: true };
  }
  for (let i = 1; i <= last; i += 1) {
    if (elevationFt <= points[i]) {
      const share = (elevationFt - points[i - 1]) / (points[i] - points[i - 1]);
      return { factor: factors[i - 1] + share * (factors[i] - factors[i - 1]), beyondTable: false };
    }
  }
  return { factor: factors[last], beyondTable: false };
}

/** F_vel = √(reference distance / pad-to-fan distance), never below 1. */
export function velocityFactor(padToFanDistanceM: number, ref: ReferenceData): number {
  const referenceDistanceM = ventilationValue(ref, 'velocity-factor', 'referenceDistanceM').value;
  return Math.max(1, Math.sqrt(referenceDistanceM / padToFanDistanceM));
}

/** F_light = peak interior light / the reference light of the base rate (5,000 fc). */
export function lightFactor(peakInteriorLightLux: number, ref: ReferenceData): number {
  return peakInteriorLightLux / ventilationValue(ref, 'light-factor', 'referenceLux').value;
}

/** The peak interior light the light factor reads, and where it came from. */
export interface InteriorLight {
  /** 'design day': the design day's clear-sky sun through the roof; 'entered': a figure in the request */
  from: 'design day' | 'entered';
  /** peak light at plant height under the roof, before any shade cloth, lux */
  unshadedLux: number;
  /** share a shade cloth in place on the design date passes; 1 without one */
  shadeTransmittance: number;
  /** unshadedLux × shadeTransmittance: what the light factor reads, lux */
  lux: number;
}

/**
 * Peak interior light for the light factor. Without an entered figure it is the design day's own
 * light: the day's highest clear-sky global irradiance × the roof's light transmittance (less the
 * opaque kneewall's share) × the luminous efficacy of daylight, so the exhaust rate and the
 * hour-by-hour balance see the same sun. An entered figure is the light under the roof before
 * any shade cloth. A shade cloth in place multiplies either; shade never adds light.
 */
export function interiorLight(
  input: {
    enteredUnshadedLux?: number;
    peakGlobalHorizontalWPerM2: number;
    roofLightTransmittance: number;
    shadeTransmittance: number;
  },
  ref: ReferenceData,
): InteriorLight {
  const entered = input.enteredUnshadedLux !== undefined;
  const unshadedLux = entered
    ? (input.enteredUnshadedLux as number)
    : input.peakGlobalHorizontalWPerM2 *
      input.roofLightTransmittance *
      ventilationValue(ref, 'daylight-luminous-efficacy', 'lumensPerWatt').value;
  const shade = Math.min(1, Math.max(0, input.shadeTransmittance));
  return {
    from: entered ? 'entered' : 'design day',
    unshadedLux,
    shadeTransmittance: shade,
    lux: unshadedLux * shade,
  };
}

export function temperatureRiseFactor(allowedTemperatureRiseK: number, ref: ReferenceData): number {
  return ventilationValue(ref, 'temperature-rise-factor', 'referenceRiseK').value / allowedTemperatureRiseK;
}

/** The lamps' heat on the design day, for the fan requirement. */
export interface CapacityLamps {
  /** lamp heat in each of the 24 design-day hours, W */
  heatByHourW: number[];
  /** each hour's clear-sky sunlight ÷ the design day's highest, 0–1 */
  sunShareByHour: number[];
  /** ρ·c_p of the air the fans move, J/(m³·K) */
  airHeatCapacityJPerM3K: number;
}

export interface CapacityInput {
  /** supplemental lamps on the design day; null or absent without lamps */
  lamps?: CapacityLamps | null;
  floorAreaM2: number;
  elevationM: number;
  peakInteriorLightLux: number;
  allowedTemperatureRiseK: number;
  padToFanDistanceM: number;
  fans: ExhaustFans;
  inletAreaM2: number;
}

/** Flow the inlets (and pads) must pass: the larger of what is installed and what is required. */
export function designFlowM3PerS(capacity: Pick<CapacityResult, 'requiredFlowM3PerS' | 'installedFlowM3PerS'>): number {
  return Math.max(capacity.requiredFlowM3PerS, capacity.installedFlowM3PerS);
}

/**
 * Summer exhaust capacity by the floor-area method: base rate × max(F_elev·F_light·F_temp, F_vel)
 * × floor area, compared with the installed fans; inlet area for the design flow at the maximum
 * inlet velocity.
 *
 * With lamps (reference-data/lamps.json 'lamp-heat-in-summer'): every design-day hour h needs
 *   V̇(h) = base rate × F_elev·F_light·F_temp × floor area × sun(h) ÷ sun(max) + Q_lamp(h) ÷ (ρ·c_p·ΔT_allowed),
 * the floor-area method scaled to that hour's sunlight plus the flow that carries the lamps' heat
 * away at the allowed rise; the requirement is the larger of the floor-area method and every V̇(h).
 * Without lamps V̇(h) never exceeds the floor-area method, so lamps can only raise the requirement.
 */
export function requiredCapacity(
  input: CapacityInput,
  ref: ReferenceData,
): CapacityResult & { elevationBeyondTable: boolean } {
  const baseRateM3PerSM2 = ventilationValue(ref, 'summer-base-rate', 'rateM3PerSM2').value;
  const elevation = elevationFactor(input.elevationM, ref);
  const light = lightFactor(input.peakInteriorLightLux, ref);
  const temperatureRise = temperatureRiseFactor(input.allowedTemperatureRiseK, ref);
  const velocity = velocityFactor(input.padToFanDistanceM, ref);
  const house = elevation.factor * light * temperatureRise;
  const applied = Math.max(house, velocity);

  const floorAreaMethodFlowM3PerS = baseRateM3PerSM2 * applied * input.floorAreaM2;
  let requiredFlowM3PerS = floorAreaMethodFlowM3PerS;
  let lampGoverningHour: number | null = null;
  if (input.lamps) {
    const sunlitFlowM3PerS = baseRateM3PerSM2 * house * input.floorAreaM2;
    const perWatt = 1 / (input.lamps.airHeatCapacityJPerM3K * input.allowedTemperatureRiseK);
    input.lamps.heatByHourW.forEach((heatW, hour) => {
      if (!(heatW > 0)) return;
      const flow = sunlitFlowM3PerS * (input.lamps!.sunShareByHour[hour] ?? 0) + heatW * perWatt;
      if (flow > requiredFlowM3PerS) {
        requiredFlowM3PerS = flow;
        lampGoverningHour = hour;
      }
    });
  }
  const installedFlowM3PerS = input.fans.count * input.fans.capacityEachM3PerS;
  const verdict: CapacityResult['verdict'] =
    input.fans.count === 0 || installedFlowM3PerS <= 0
      ? 'no-fans'
      : installedFlowM3PerS >= requiredFlowM3PerS * (1 - 1e-9)
        ? 'adequate'
        : 'short';

  const fanSizeKnown = input.fans.capacityEachM3PerS > 0;
  // the small tolerance keeps an exact multiple (e.g. 4.0000000001 fans) from rounding up
  const fansNeeded = fanSizeKnown
    ? Math.max(1, Math.ceil(requiredFlowM3PerS / input.fans.capacityEachM3PerS - 1e-9))
    : null;
  const additionalFansNeeded = fansNeeded === null ? null : Math.max(0, fansNeeded - input.fans.count);

  const maxInletVelocityMPerS = ventilationValue(ref, 'inlet-velocity', 'maxVelocityMPerS').value;
  const inletAreaNeededM2 = designFlowM3PerS({ requiredFlowM3PerS, installedFlowM3PerS }) / maxInletVelocityMPerS;

  return {
    baseRateM3PerSM2,
    factors: { elevation: elevation.factor, light, temperatureRise, velocity, house, applied },
    floorAreaMethodFlowM3PerS,
    lampFlowM3PerS: requiredFlowM3PerS - floorAreaMethodFlowM3PerS,
    lampGoverningHour,
    requiredFlowM3PerS,
    installedFlowM3PerS,
    verdict,
    fansNeeded,
    additionalFansNeeded,
    inletAreaNeededM2,
    inletAreaM2: input.inletAreaM2,
    inletVerdict: input.inletAreaM2 >= inletAreaNeededM2 * (1 - 1e-9) ? 'adequate' : 'short',
    elevationBeyondTable: elevation.beyondTable,
  };
}
