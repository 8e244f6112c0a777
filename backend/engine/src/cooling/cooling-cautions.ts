import { maxOf } from '../numbers';
import type { ReferenceData } from '../reference-data.types';
import { quantityToken } from '../vocabulary';
import { requireRow, ventilationValue, type PadTypeRow } from './cooling-reference';
import type { DesignDayResult } from './design-day';
import type { PadSizing } from './pads';
import { METRES_PER_FOOT, type CapacityResult, type InteriorLight } from './required-capacity';
import type { StagingResult } from './staging';
import type { WinterVentilation } from './winter-ventilation';

const STANDARD_CAUTIONS = [
  'Fans, motors, pad pumps and their controls sit in wet locations: wiring must be done by a qualified electrician with ground-fault protection, following local electrical codes.',
  'Exhaust fans lower the house pressure; with too little inlet area they can pull flue gases back down the chimneys of vented heaters (backdrafting), bringing carbon monoxide and ethylene into the house. Keep inlets open whenever fans run and have the venting checked by a licensed installer.',
  'These figures are planning estimates from handbook methods and a clear-sky design day; final fan, inlet and pad selection rests with the equipment supplier, a licensed installer and local codes.',
];

export interface CoolingCautionSources {
  capacity: CapacityResult;
  /** the site lies above the elevation-factor table */
  elevationBeyondTable: boolean;
  designDay: DesignDayResult;
  padType: PadTypeRow | null;
  pads: PadSizing | null;
  padToFanDistanceM: number;
  staging: StagingResult;
  winter: WinterVentilation;
  /** the peak interior light the light factor read */
  interiorLight: InteriorLight;
  /** the allowed inlet-to-fan rise the floor-area rate was sized for, K */
  allowedTemperatureRiseK: number;
  coolingSetpointC: number;
  /** share of the transmitted sun the crop takes up (design day) */
  transpirationFraction: number;
}

/**
 * Why "fans adequate" (the floor-area rate) and "setpoint not held" (the hour-by-hour design day)
 * can both be true although both read the same sun: the floor-area rate keeps the air within the
 * allowed rise above the air coming in and never looks at the cooling setpoint; the design day
 * asks for the setpoint itself. Hours are split into those where the incoming air alone, or the
 * incoming air plus that rise, is above the setpoint and those where the sun of the design day
 * outruns the rate. An
 * entered peak light (not the design day's) is named as a further cause. Empty unless the two
 * disagree.
 */
export function adequateButNotHeldExplanation(sources: {
  capacity: CapacityResult;
  designDay: Pick<DesignDayResult, 'hoursNotHeld' | 'supplyAirByHourC'>;
  padType: PadTypeRow | null;
  interiorLight: InteriorLight;
  allowedTemperatureRiseK: number;
  coolingSetpointC: number;
  transpirationFraction: number;
}): string | null {
  const { capacity, designDay, padType, interiorLight: light, allowedTemperatureRiseK, coolingSetpointC } = sources;
  if (capacity.verdict !== 'adequate' || designDay.hoursNotHeld.length === 0) return null;
  const incoming = padType ? 'air leaving the pads' : 'outdoor air';
  const supply = (hour: number) => designDay.supplyAirByHourC[hour];
  // the incoming air alone is at or above the setpoint: no fan rate holds it
  const hotHours = designDay.hoursNotHeld.filter((hour) => supply(hour) >= coolingSetpointC - 1e-9);
  // the incoming air plus the allowed rise is above the setpoint: the rate was sized for too large a rise
  const warmHours = designDay.hoursNotHeld.filter(
    (hour) => !hotHours.includes(hour) && supply(hour) + allowedTemperatureRiseK > coolingSetpointC + 1e-9,
  );
  const sunnyHours = designDay.hoursNotHeld.filter((hour) => !hotHours.includes(hour) && !warmHours.includes(hour));
  const parts = [
    `Why the fans are adequate yet the setpoint is not held: the floor-area rate sizes the fans to keep the house air within ${quantityToken('temperatureDifference', allowedTemperatureRiseK)} of the ${incoming} coming in, and does not look at the ${quantityToken('temperature', coolingSetpointC)} cooling setpoint; the design day asks for the setpoint itself.`,
  ];
  if (hotHours.length > 0) {
    const hottest = maxOf(hotHours.map(supply));
    parts.push(
      `At solar hours ${hotHours.join(', ')} the ${incoming} itself (up to ${quantityToken('temperature', hottest)}) is at or above the setpoint, so no fan rate can hold it${padType ? '' : '; only cooler incoming air, as evaporative pads give, can'}.`,
    );
  }
  if (warmHours.length > 0) {
    parts.push(
      `At solar hours ${warmHours.join(', ')} the ${incoming} plus that rise is above the setpoint: holding it takes more air than the rate, as a smaller allowed rise would ask for.`,
    );
  }
  if (sunnyHours.length > 0) {
    parts.push(
      `At solar hours ${sunnyHours.join(', ')} the clear-sky sun of the design day (${light.shadeTransmittance < 1 ? `${Math.round(light.shadeTransmittance * 100)} % of it passing the shade cloth` : 'no shade cloth'}, the crop taking up ${Math.round(sources.transpirationFraction * 100)} % of what comes in) warms the air by more than that rise at the rate: the handbook rate per floor area allows for less sun than this day brings.`,
    );
  }
  if (light.from === 'entered') {
    parts.push(
      `The light factor also read the entered peak light (${quantityToken('illuminance', light.lux)} after shade), not the design day's own: leave it out to have both read the same sun.`,
    );
  }
  return parts.join(' ');
}

/**
 * The cautions that go with a cooling estimate: electrical work, backdrafting and planning first,
 * then short fans, inlets or pads, hours the setpoint is not held, extrapolated elevation, long
 * inlet-to-fan runs, staging warnings and a costly winter fan stage.
 */
export function coolingCautions(
  {
    capacity,
    elevationBeyondTable,
    designDay,
    padType,
    pads,
    padToFanDistanceM,
    staging,
    winter,
    interiorLight,
    allowedTemperatureRiseK,
    coolingSetpointC,
    transpirationFraction,
  }: CoolingCautionSources,
  ref: ReferenceData,
): string[] {
  const cautions = [...STANDARD_CAUTIONS];
  if (capacity.verdict === 'no-fans') {
    cautions.push(
      'The house has no exhaust fans: the design day shows it closed up, with solar heat leaving only through the cover.',
    );
  } else if (capacity.verdict === 'short') {
    cautions.push(
      `Installed fans move ${quantityToken('airFlow', capacity.installedFlowM3PerS)} against ${quantityToken('airFlow', capacity.requiredFlowM3PerS)} required${capacity.additionalFansNeeded ? `; about ${capacity.additionalFansNeeded} more fan(s) of the same size are needed` : ''}.`,
    );
  }
  if (capacity.inletVerdict === 'short') {
    cautions.push(
      `Free inlet area ${quantityToken('area', capacity.inletAreaM2)} is below the ${quantityToken('area', capacity.inletAreaNeededM2)} needed: fans will move less air than rated and may backdraft heater chimneys.`,
    );
  }
  if (designDay.hoursNotHeld.length > 0) {
    cautions.push(
      `On the design day the cooling setpoint is not held at solar hours ${designDay.hoursNotHeld.join(', ')}; peak indoor ${quantityToken('temperature', padType ? (designDay.peakIndoorWithPadsC as number) : designDay.peakIndoorWithFansC)}.`,
    );
  }
  const explanation = adequateButNotHeldExplanation({
    capacity,
    designDay,
    padType,
    interiorLight,
    allowedTemperatureRiseK,
    coolingSetpointC,
    transpirationFraction,
  });
  if (explanation !== null) cautions.push(explanation);
  if (pads && pads.verdict === 'short') {
    cautions.push(
      `Pad area ${quantityToken('area', pads.areaM2)} is below the ${quantityToken('area', pads.areaNeededM2)} needed at the design face velocity: air will pass faster, cool less than the stated efficiency and may carry water droplets.`,
    );
  }
  if (elevationBeyondTable) {
    // the table's last elevation (feet in the source) is where extrapolation starts
    const tableElevationsFt = requireRow(ref, 'ventilation', 'elevation-factor').elevationsFt as number[];
    const tableTopM = tableElevationsFt[tableElevationsFt.length - 1] * METRES_PER_FOOT;
    cautions.push(
      `The site is above the elevation table (${quantityToken('length', tableTopM)}): the elevation factor is extrapolated from air density.`,
    );
  }
  const longestRun = ventilationValue(ref, 'pad-to-fan-distance-max', 'maxDistanceM');
  if (padToFanDistanceM > longestRun.value) {
    cautions.push(
      `Inlet-to-fan distance ${quantityToken('length', padToFanDistanceM)} is over the usual ${quantityToken('length', longestRun.value)}: the air warms too much along the house; consider inlets or pads along the side or fans at both ends.`,
    );
  }
  for (const warning of staging.warnings) cautions.push(warning);
  if (winter.heatCostW > 0.5 * winter.houseHeatLossW && winter.heatCostW > 0) {
    // Common practice, no source: humidity is vented in short heat-and-vent cycles, not all night.
    cautions.push(
      `Run all night at ${quantityToken('temperature', winter.atOutdoorC)} outside, the winter fan stage would need ${quantityToken('power', winter.heatCostW)} of heat on top of the house's own ${quantityToken('power', winter.houseHeatLossW)} loss. Vent humidity in short heat-and-vent cycles around sunset and sunrise instead, with the heaters sized for it.`,
    );
  }
  return cautions;
}
