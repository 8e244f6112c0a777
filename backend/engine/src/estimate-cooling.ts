import { BOUNDS } from './vocabulary';
import { airExchange, type AirExchange } from './cooling/air-exchange';
import { COOLING_BOUNDS } from './vocabulary';
import {
  airSpecificHeat,
  dailyRangeProfileRow,
  padTypeIds,
  padTypeRow,
  ventilationValue,
  type PadTypeRow,
} from './cooling/cooling-reference';
import { designDayBalance, type DesignDayHour } from './cooling/design-day';
import { padSizing, type PadSizing } from './cooling/pads';
import { designFlowM3PerS, METRES_PER_FOOT, requiredCapacity, type CapacityResult } from './cooling/required-capacity';
import { thermostatStaging, type StagingResult } from './cooling/staging';
import { winterVentilation, type WinterVentilation } from './cooling/winter-ventilation';
import { EngineInputError, requireInRange } from './errors';
import { computeHouseGeometry, opaqueEnvelopeShare } from './geometry/house-geometry';
import { heatLossCoefficients } from './heating/heat-loss';
import type { HouseSpec } from './house.types';
import { dryAirDensityKgPerM3, standardAtmosphericPressurePa } from './psychrometrics';
import { quantityToken } from './vocabulary';
import { type Confidence } from './vocabulary';
import { referenceRow, type ReferenceData, type ReferenceRow } from './reference-data.types';
import { clearSkyMonthRow } from './solar/clear-sky';

export interface CoolingSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
}

export interface CoolingConditions {
  /** 'YYYY-MM-DD'; hours of the day are local apparent solar time */
  designDate: string;
  /** summer design dry bulb (the day's maximum), °C */
  summerDesignC: number;
  /** difference between the day's maximum and minimum, K */
  dailyRangeK: number;
  /** wet bulb coincident with the design dry bulb, °C */
  summerDesignWetBulbC: number;
  /** allowed inlet-to-fan temperature rise, K */
  allowedTemperatureRiseK?: number;
  /** peak light at plant height inside the house, lux */
  peakInteriorLightLux?: number;
  /** distance from inlet (pad) wall to the exhaust fans, m; defaults to the house length */
  padToFanDistanceM?: number;
  /** share of transmitted solar heat taken up by crop transpiration, 0–0.9 */
  transpirationFraction?: number;
  evaporativePad?: { padTypeId: string; areaM2: number } | null;
  /** winter design outdoor temperature for the humidity-ventilation heat cost, °C */
  winterDesignC?: number;
}

export interface CoolingInput {
  house: HouseSpec;
  site: CoolingSite;
  conditions: CoolingConditions;
}

export interface CoolingAssumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: Confidence;
  overridden: boolean;
}

export interface CoolingEstimate {
  airExchange: AirExchange;
  capacity: CapacityResult;
  designDay: {
    date: string;
    hours: DesignDayHour[];
    peakIndoorWithFansC: number;
    peakIndoorWithPadsC: number | null;
    hoursNotHeld: number[];
  };
  pads: PadSizing | null;
  staging: StagingResult;
  winterVentilation: WinterVentilation;
  assumptions: CoolingAssumption[];
  /** may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  cautions: string[];
}

const STANDARD_CAUTIONS = [
  'Fans, motors, pad pumps and their controls sit in wet locations: wiring must be done by a qualified electrician with ground-fault protection, following local electrical codes.',
  'Exhaust fans lower the house pressure; with too little inlet area they can pull flue gases back down the chimneys of vented heaters (backdrafting), bringing carbon monoxide and ethylene into the house. Keep inlets open whenever fans run and have the venting checked by a licensed installer.',
  'These figures are planning estimates from handbook methods and a clear-sky design day; final fan, inlet and pad selection rests with the equipment supplier, a licensed installer and local codes.',
];

/**
 * Summer ventilation and cooling of one house: air exchange of the installed fans, required
 * capacity by the floor-area method, a clear-sky design day hour by hour (with and without
 * evaporative pads), thermostat staging and the winter humidity-ventilation cost.
 */
export function estimateCooling(input: CoolingInput, ref: ReferenceData): CoolingEstimate {
  const { house, site, conditions } = input;
  validateSite(site);
  validateHouseCoolingFields(house);
  const geometry = computeHouseGeometry(house);
  const { year, month } = validateDesignDate(conditions.designDate);
  validateConditions(conditions);

  const roofCovering = roofCoveringRow(house, ref);
  const padType = resolvePadType(conditions, ref);

  const assumptions: CoolingAssumption[] = [];
  const sourced = (
    key: string,
    label: string,
    value: number | string,
    unit: string,
    row: ReferenceRow,
    overridden = false,
  ) => assumptions.push({ key, label, value, unit, source: row.source, confidence: row.confidence, overridden });

  // --- inputs with reference defaults
  const lightDefault = ventilationValue(ref, 'light-factor', 'defaultPeakInteriorLux');
  const peakInteriorLightLux = conditions.peakInteriorLightLux ?? lightDefault.value;
  const riseDefault = ventilationValue(ref, 'temperature-rise-factor', 'defaultAllowedRiseK');
  const allowedTemperatureRiseK = conditions.allowedTemperatureRiseK ?? riseDefault.value;
  const transpirationDefault = ventilationValue(ref, 'transpiration-share', 'fraction');
  const transpirationFraction = conditions.transpirationFraction ?? transpirationDefault.value;
  const padToFanDistanceM = conditions.padToFanDistanceM ?? house.lengthM;
  const winterDefault = ventilationValue(ref, 'winter-ventilation-default-outdoor', 'outdoorC');
  const winterDesignC = conditions.winterDesignC ?? winterDefault.value;

  // --- air exchange and required capacity
  const exchange = airExchange(house.exhaustFans, geometry);
  const { elevationBeyondTable, ...capacity } = requiredCapacity(
    {
      floorAreaM2: geometry.floorAreaM2,
      elevationM: site.elevationM,
      peakInteriorLightLux,
      allowedTemperatureRiseK,
      padToFanDistanceM,
      fans: house.exhaustFans,
      inletAreaM2: house.inletAreaM2,
    },
    ref,
  );

  // --- design day
  const pressurePa = standardAtmosphericPressurePa(site.elevationM);
  const conductanceWPerK = heatLossCoefficients(house, geometry, ref, {
    curtainClosed: false,
    airDensityKgPerM3: dryAirDensityKgPerM3(conditions.summerDesignC, pressurePa),
  }).totalWPerK;
  const designDay = designDayBalance(
    {
      date: conditions.designDate,
      latitudeDeg: site.latitudeDeg,
      longitudeDeg: site.longitudeDeg,
      elevationM: site.elevationM,
      summerDesignC: conditions.summerDesignC,
      dailyRangeK: conditions.dailyRangeK,
      summerDesignWetBulbC: conditions.summerDesignWetBulbC,
      floorAreaM2: geometry.floorAreaM2,
      // the opaque kneewall's share of the envelope passes no light
      roofLightTransmittance: roofCovering.lightTransmittance * (1 - opaqueEnvelopeShare(geometry)),
      transpirationFraction,
      conductanceWPerK,
      installedFlowM3PerS: exchange.installedFlowM3PerS,
      coolingSetpointC: house.setpoints.coolingC,
      padSaturationEfficiency: padType ? padType.saturationEfficiency : null,
    },
    ref,
  );

  // --- pads
  const pads =
    padType && conditions.evaporativePad
      ? padSizing(
          padType,
          conditions.evaporativePad.areaM2,
          designFlowM3PerS(capacity),
          designDay.padLeavingAirAtPeakC as number,
        )
      : null;

  // --- staging
  const staging = thermostatStaging(house.setpoints, house.exhaustFans.count, {
    requiredDeadbandK: ventilationValue(ref, 'heat-cool-deadband', 'requiredDeadbandK').value,
    firstStageFraction: ventilationValue(ref, 'fan-staging', 'firstStageFraction').value,
    stageStepK: ventilationValue(ref, 'fan-staging', 'stageStepK').value,
    maxStages: ventilationValue(ref, 'fan-staging', 'maxStages').value,
  });

  // --- winter humidity ventilation
  const cp = airSpecificHeat(ref);
  const winterFraction = ventilationValue(ref, 'winter-ventilation', 'fraction');
  const winter = winterVentilation({
    fractionOfSummerRate: winterFraction.value,
    // base rate × elevation only: the light and temperature-rise factors are summer corrections
    summerBaseFlowM3PerS: capacity.baseRateM3PerSM2 * capacity.factors.elevation * geometry.floorAreaM2,
    volumeM3: geometry.volumeM3,
    indoorC: house.setpoints.nightHeatingC,
    outdoorC: winterDesignC,
    // the fans move house air, so its density is taken at the night setpoint
    airDensityKgPerM3: dryAirDensityKgPerM3(house.setpoints.nightHeatingC, pressurePa),
    cpJPerKgK: cp.value,
    houseConductanceWPerK: conductanceWPerK,
  });

  // --- assumptions
  const baseRate = ventilationValue(ref, 'summer-base-rate', 'rateM3PerSM2');
  sourced('summerBaseRate', 'Summer exhaust rate per floor area (base)', baseRate.value, 'm³/(s·m²)', baseRate.row);
  sourced(
    'elevationFactor',
    'Elevation factor F_elev',
    capacity.factors.elevation,
    '–',
    referenceRowOrThrow(ref, 'ventilation', 'elevation-factor'),
  );
  sourced(
    'peakInteriorLightLux',
    'Peak interior light at plant height',
    peakInteriorLightLux,
    'lx',
    lightDefault.row,
    conditions.peakInteriorLightLux !== undefined,
  );
  sourced(
    'allowedTemperatureRiseK',
    'Allowed inlet-to-fan temperature rise',
    allowedTemperatureRiseK,
    'K',
    riseDefault.row,
    conditions.allowedTemperatureRiseK !== undefined,
  );
  assumptions.push({
    key: 'padToFanDistanceM',
    label: 'Inlet (pad) to fan distance',
    value: padToFanDistanceM,
    unit: 'm',
    source: 'House length: fans on one endwall, inlets or pads on the opposite one',
    confidence: 'common-practice',
    overridden: conditions.padToFanDistanceM !== undefined,
  });
  const velocityRef = ventilationValue(ref, 'velocity-factor', 'referenceDistanceM');
  sourced(
    'velocityReferenceDistanceM',
    'Reference distance of the velocity factor',
    velocityRef.value,
    'm',
    velocityRef.row,
  );
  const inletVelocity = ventilationValue(ref, 'inlet-velocity', 'maxVelocityMPerS');
  sourced(
    'maxInletVelocityMPerS',
    'Maximum velocity through the free inlet area',
    inletVelocity.value,
    'm/s',
    inletVelocity.row,
  );
  sourced(
    'transpirationFraction',
    'Share of transmitted solar heat taken up by crop transpiration',
    transpirationFraction,
    '–',
    transpirationDefault.row,
    conditions.transpirationFraction !== undefined,
  );
  sourced(
    'roofLightTransmittance',
    `Light transmittance of the roof covering (${roofCovering.label ?? roofCovering.id})`,
    roofCovering.lightTransmittance,
    '–',
    roofCovering,
  );
  assumptions.push({
    key: 'conductanceWPerK',
    label: 'Heat-loss coefficient UA of cover, perimeter and air leakage (curtain open)',
    value: conductanceWPerK,
    unit: 'W/K',
    source: 'Thermbay heat-loss calculation from the house, its coverings and leakage class (see the heating estimate)',
    confidence: 'derived',
    overridden: false,
  });
  const monthRow = clearSkyMonthRow(month, ref);
  sourced(
    'clearSkyModel',
    'Clear-sky irradiance: DNI = A/exp(B/sin β), diffuse = C·DNI',
    `A ${monthRow.aWPerM2} W/m², B ${monthRow.b}, C ${monthRow.c} (month ${month} of ${year})`,
    '',
    monthRow,
  );
  const profileRow = dailyRangeProfileRow(ref);
  sourced(
    'dailyRangeProfile',
    'Outdoor temperature through the day: T = T_max − range × fraction(solar hour)',
    'fraction-of-daily-range profile, minimum 05:00, maximum 15:00 solar time',
    '',
    profileRow,
  );
  assumptions.push({
    key: 'designHumidityRatio',
    label: 'Outdoor humidity ratio held through the design day (from design dry bulb and wet bulb)',
    value: designDay.humidityRatioKgPerKg,
    unit: 'kg/kg',
    source: 'psychrolib (ASHRAE 2017 Fundamentals ch. 1) at the standard-atmosphere pressure of the site',
    confidence: 'derived',
    overridden: false,
  });
  sourced('airSpecificHeat', 'Specific heat of air', cp.value, 'J/(kg·K)', cp.row);
  assumptions.push({
    key: 'designDayModel',
    label: 'Design-day method',
    value:
      'hours are local apparent solar time (hour 12 = solar noon); clear sky; steady state each hour with no heat storage in floor, benches or crop; no shade cloth; heaters not modelled (night temperatures free-floating); fans staged continuously; fan fraction and "setpoint held" describe the house with its pads when pads are entered',
    unit: '',
    source: 'Thermbay method; sun positions from suncalc 2.0.2, irradiance and temperature profile as listed',
    confidence: 'derived',
    overridden: false,
  });
  if (padType) {
    sourced(
      'padFaceVelocityMPerS',
      `Pad design face velocity (${padType.label ?? padType.id})`,
      padType.faceVelocityMPerS,
      'm/s',
      padType,
    );
    sourced(
      'padSaturationEfficiency',
      `Pad saturation efficiency (${padType.label ?? padType.id})`,
      padType.saturationEfficiency,
      '–',
      padType,
    );
  }
  const deadbandRow = referenceRowOrThrow(ref, 'ventilation', 'heat-cool-deadband');
  sourced(
    'requiredDeadbandK',
    'Minimum gap between heating and first cooling stage',
    staging.requiredDeadbandK,
    'K',
    deadbandRow,
  );
  const stagingRow = referenceRowOrThrow(ref, 'ventilation', 'fan-staging');
  sourced(
    'firstStageFraction',
    'Share of fans in the first stage',
    stagingRow.firstStageFraction as number,
    '–',
    stagingRow,
  );
  sourced('stageStepK', 'Temperature step between fan stages', stagingRow.stageStepK as number, 'K', stagingRow);
  sourced(
    'winterVentilationFraction',
    'Winter humidity ventilation as a share of the summer base rate (base rate × elevation factor; no light or temperature-rise factor)',
    winterFraction.value,
    '–',
    winterFraction.row,
  );
  sourced(
    'winterDesignC',
    'Outdoor temperature for the winter ventilation heat cost (house air at the night heating setpoint)',
    winterDesignC,
    '°C',
    winterDefault.row,
    conditions.winterDesignC !== undefined,
  );

  // --- cautions
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
  if (pads && pads.verdict === 'short') {
    cautions.push(
      `Pad area ${quantityToken('area', pads.areaM2)} is below the ${quantityToken('area', pads.areaNeededM2)} needed at the design face velocity: air will pass faster, cool less than the stated efficiency and may carry water droplets.`,
    );
  }
  if (elevationBeyondTable) {
    // the table's last elevation (feet in the source) is where extrapolation starts
    const tableElevationsFt = referenceRowOrThrow(ref, 'ventilation', 'elevation-factor').elevationsFt as number[];
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

  return {
    airExchange: exchange,
    capacity,
    designDay: {
      date: designDay.date,
      hours: designDay.hours,
      peakIndoorWithFansC: designDay.peakIndoorWithFansC,
      peakIndoorWithPadsC: designDay.peakIndoorWithPadsC,
      hoursNotHeld: designDay.hoursNotHeld,
    },
    pads,
    staging,
    winterVentilation: winter,
    assumptions,
    cautions,
  };
}

// ---------------------------------------------------------------------------------------------
// validation

function validateSite(site: CoolingSite): void {
  if (!site || typeof site !== 'object') throw new EngineInputError('site', 'site is required');
  requireInRange('site.latitudeDeg', site.latitudeDeg, BOUNDS.latitudeDeg.min, BOUNDS.latitudeDeg.max);
  requireInRange('site.longitudeDeg', site.longitudeDeg, BOUNDS.longitudeDeg.min, BOUNDS.longitudeDeg.max);
  requireInRange('site.elevationM', site.elevationM, BOUNDS.elevationM.min, BOUNDS.elevationM.max);
}

function validateHouseCoolingFields(house: HouseSpec): void {
  if (!house || typeof house !== 'object') throw new EngineInputError('house', 'house is required');
  const fans = house.exhaustFans;
  if (!fans || typeof fans !== 'object')
    throw new EngineInputError('house.exhaustFans', 'house.exhaustFans is required');
  const count = requireInRange('house.exhaustFans.count', fans.count, BOUNDS.fanCount.min, BOUNDS.fanCount.max);
  if (!Number.isInteger(count)) {
    throw new EngineInputError('house.exhaustFans.count', 'house.exhaustFans.count must be a whole number');
  }
  // a house without fans may leave the fan size at 0
  requireInRange(
    'house.exhaustFans.capacityEachM3PerS',
    fans.capacityEachM3PerS,
    count === 0 ? 0 : BOUNDS.fanCapacityM3PerS.min,
    BOUNDS.fanCapacityM3PerS.max,
  );
  requireInRange('house.inletAreaM2', house.inletAreaM2, BOUNDS.inletAreaM2.min, BOUNDS.inletAreaM2.max);
  if (!house.setpoints || typeof house.setpoints !== 'object') {
    throw new EngineInputError('house.setpoints', 'house.setpoints is required');
  }
  for (const key of ['dayHeatingC', 'nightHeatingC', 'coolingC'] as const) {
    requireInRange(`house.setpoints.${key}`, house.setpoints[key], BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  }
}

function validateDesignDate(designDate: unknown): { year: number; month: number; day: number } {
  const field = 'conditions.designDate';
  if (typeof designDate !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(designDate)) {
    throw new EngineInputError(field, `${field} must be a date written YYYY-MM-DD`);
  }
  const [year, month, day] = designDate.split('-').map(Number);
  const probe = new Date(Date.UTC(year, month - 1, day));
  if (probe.getUTCFullYear() !== year || probe.getUTCMonth() !== month - 1 || probe.getUTCDate() !== day) {
    throw new EngineInputError(field, `${field} is not a calendar date`);
  }
  if (year < 1900 || year > 2200) throw new EngineInputError(field, `${field} must fall between 1900 and 2200`);
  return { year, month, day };
}

function validateConditions(conditions: CoolingConditions): void {
  if (!conditions || typeof conditions !== 'object')
    throw new EngineInputError('conditions', 'conditions are required');
  const b = COOLING_BOUNDS;
  const summerDesignC = requireInRange(
    'conditions.summerDesignC',
    conditions.summerDesignC,
    BOUNDS.summerDesignC.min,
    BOUNDS.summerDesignC.max,
  );
  requireInRange('conditions.dailyRangeK', conditions.dailyRangeK, b.dailyRangeK.min, b.dailyRangeK.max);
  requireInRange(
    'conditions.summerDesignWetBulbC',
    conditions.summerDesignWetBulbC,
    b.summerDesignWetBulbC.min,
    Math.min(b.summerDesignWetBulbC.max, summerDesignC),
  );
  const optional: Array<[keyof CoolingConditions, { min: number; max: number }]> = [
    ['allowedTemperatureRiseK', b.allowedTemperatureRiseK],
    ['peakInteriorLightLux', b.peakInteriorLightLux],
    ['padToFanDistanceM', b.padToFanDistanceM],
    ['transpirationFraction', b.transpirationFraction],
    ['winterDesignC', BOUNDS.designOutdoorC],
  ];
  for (const [key, range] of optional) {
    if (conditions[key] !== undefined) requireInRange(`conditions.${key}`, conditions[key], range.min, range.max);
  }
  const pad = conditions.evaporativePad;
  if (pad !== undefined && pad !== null) {
    if (typeof pad !== 'object')
      throw new EngineInputError('conditions.evaporativePad', 'evaporativePad must be an object or null');
    requireInRange('conditions.evaporativePad.areaM2', pad.areaM2, b.padAreaM2.min, b.padAreaM2.max);
  }
}

function resolvePadType(conditions: CoolingConditions, ref: ReferenceData): PadTypeRow | null {
  const pad = conditions.evaporativePad;
  if (pad === undefined || pad === null) return null;
  const row = typeof pad.padTypeId === 'string' ? padTypeRow(ref, pad.padTypeId) : undefined;
  if (!row) {
    throw new EngineInputError(
      'conditions.evaporativePad.padTypeId',
      `unknown pad type; choose one of ${padTypeIds(ref).join(', ')}`,
    );
  }
  return row;
}

interface CoveringRow extends ReferenceRow {
  lightTransmittance: number;
}

function roofCoveringRow(house: HouseSpec, ref: ReferenceData): CoveringRow {
  const id = house.coverings?.roof;
  const row = typeof id === 'string' ? referenceRow<CoveringRow>(ref, 'coverings', id) : undefined;
  if (!row) throw new EngineInputError('house.coverings.roof', 'unknown roof covering');
  if (typeof row.lightTransmittance !== 'number' || !(row.lightTransmittance > 0)) {
    throw new EngineInputError(
      'house.coverings.roof',
      `${row.label ?? row.id} does not transmit light and cannot be a roof covering here`,
    );
  }
  return row;
}

function referenceRowOrThrow(ref: ReferenceData, table: string, id: string): ReferenceRow {
  const row = referenceRow(ref, table, id);
  if (!row) throw new Error(`reference-data/${table}.json needs a row ${id}`);
  return row;
}
