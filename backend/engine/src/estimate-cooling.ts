import { airExchange, type AirExchange } from './cooling/air-exchange';
import { coolingAssumptions, type CoolingAssumption } from './cooling/cooling-assumptions';
import { coolingCautions } from './cooling/cooling-cautions';
import {
  coolingInputsWithDefaults,
  resolvePadType,
  roofCoveringRow,
  validateCoolingConditions,
  validateCoolingSite,
  validateDesignDate,
  validateHouseCoolingFields,
  type CoolingConditions,
  type CoolingSite,
} from './cooling/cooling-inputs';
import { airSpecificHeat, ventilationValue } from './cooling/cooling-reference';
import { designDayBalance, type DesignDayHour } from './cooling/design-day';
import { padSizing, type PadSizing } from './cooling/pads';
import { designFlowM3PerS, requiredCapacity, type CapacityResult } from './cooling/required-capacity';
import { thermostatStaging, type StagingResult } from './cooling/staging';
import { winterVentilation, type WinterVentilation } from './cooling/winter-ventilation';
import { computeHouseGeometry, opaqueEnvelopeShare } from './geometry/house-geometry';
import { heatLossCoefficients } from './heating/heat-loss';
import type { HouseSpec } from './house.types';
import { dryAirDensityKgPerM3, standardAtmosphericPressurePa } from './psychrometrics';
import type { ReferenceData } from './reference-data.types';

export type { CoolingAssumption } from './cooling/cooling-assumptions';
export type { CoolingConditions, CoolingSite } from './cooling/cooling-inputs';

export interface CoolingInput {
  house: HouseSpec;
  site: CoolingSite;
  conditions: CoolingConditions;
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

/**
 * Summer ventilation and cooling of one house: air exchange of the installed fans, required
 * capacity by the floor-area method, a clear-sky design day hour by hour (with and without
 * evaporative pads), thermostat staging and the winter humidity-ventilation cost.
 */
export function estimateCooling(input: CoolingInput, ref: ReferenceData): CoolingEstimate {
  const { house, site, conditions } = input;
  validateCoolingSite(site);
  validateHouseCoolingFields(house);
  const geometry = computeHouseGeometry(house);
  const { year, month } = validateDesignDate(conditions.designDate);
  validateCoolingConditions(conditions);

  const roofCovering = roofCoveringRow(house, ref);
  const padType = resolvePadType(conditions, ref);

  // --- inputs with reference defaults
  const inputs = coolingInputsWithDefaults(conditions, house, ref);
  const { peakInteriorLightLux, allowedTemperatureRiseK, transpirationFraction, padToFanDistanceM, winterDesignC } =
    inputs;

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

  // --- assumptions and cautions
  const assumptions = coolingAssumptions(
    {
      conditions,
      inputs,
      designMonth: { year, month },
      capacity,
      roofCovering,
      conductanceWPerK,
      designHumidityRatioKgPerKg: designDay.humidityRatioKgPerKg,
      airSpecificHeat: cp,
      padType,
      staging,
      winterFraction,
    },
    ref,
  );
  const cautions = coolingCautions(
    { capacity, elevationBeyondTable, designDay, padType, pads, padToFanDistanceM, staging, winter },
    ref,
  );

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
