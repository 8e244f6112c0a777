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
import {
  designFlowM3PerS,
  interiorLight,
  requiredCapacity,
  type CapacityResult,
  type InteriorLight,
} from './cooling/required-capacity';
import { thermostatStaging, type StagingResult } from './cooling/staging';
import { winterVentilation, type WinterVentilation } from './cooling/winter-ventilation';
import { computeHouseGeometry, opaqueEnvelopeShare } from './geometry/house-geometry';
import { designDayLamps, type DesignDayLamps } from './cooling/design-day-lamps';
import { lampElectricalCaution, lampPower, validateLamps } from './lamps/lamps';
import { maxOf } from './numbers';
import { solarNoonUtc } from './solar';
import { heatLossCoefficients } from './heating/heat-loss';
import type { HouseSpec, ShadeCloth } from './house.types';
import { dryAirDensityKgPerM3, standardAtmosphericPressurePa } from './psychrometrics';
import type { ReferenceData } from './reference-data.types';
import { shadeTransmittanceInMonth, validateShadeCloth } from './solar/shade-cloth';

export type { CoolingAssumption } from './cooling/cooling-assumptions';
export type { CoolingConditions, CoolingSite } from './cooling/cooling-inputs';
export type { InteriorLight } from './cooling/required-capacity';

/** The house's shade cloth as the cooling estimate used it. */
export interface CoolingShadeCloth extends ShadeCloth {
  /** whether the design date falls in one of the cloth's months (only then does it shade the day) */
  inPlaceOnDesignDate: boolean;
}

export interface CoolingInput {
  house: HouseSpec;
  site: CoolingSite;
  conditions: CoolingConditions;
}

export interface CoolingEstimate {
  airExchange: AirExchange;
  capacity: CapacityResult;
  /** the peak interior light the light factor read: the design day's own, or the entered one, times any shade */
  interiorLight: InteriorLight;
  /** the house's shade cloth, or null without one */
  shadeCloth: CoolingShadeCloth | null;
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
  /** the supplemental lamps on the design day; null without lamps or when they do not run that month */
  lamps: CoolingLamps | null;
  assumptions: CoolingAssumption[];
  /** may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  cautions: string[];
}

export interface CoolingLamps {
  /** electrical input while on, W */
  electricW: number;
  /** heat into the house while on, W */
  heatW: number;
  /** hours they run on the design day (the design month's value) */
  hoursOn: number;
  /** sunrise in solar hours, where the block ends */
  sunriseSolarHour: number;
  /** fan flow the lamps add to the requirement, m³/s (0 when the sunniest hour still governs) */
  addedFlowM3PerS: number;
  /** the solar hour that sets the requirement with the lamps, null when the floor-area method does */
  governingHour: number | null;
}

function coolingLamps(lamps: DesignDayLamps | null, capacity: CapacityResult): CoolingLamps | null {
  if (!lamps) return null;
  return {
    electricW: lamps.electricW,
    heatW: lamps.heatW,
    hoursOn: lamps.hoursOn,
    sunriseSolarHour: lamps.sunriseSolarHour,
    addedFlowM3PerS: capacity.lampFlowM3PerS,
    governingHour: capacity.lampGoverningHour,
  };
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
  const cloth = validateShadeCloth(house);
  const geometry = computeHouseGeometry(house);
  const { year, month } = validateDesignDate(conditions.designDate);
  validateCoolingConditions(conditions);
  // the cloth shades the design day only in the months it is in place
  const shadeTransmittance = shadeTransmittanceInMonth(house, month);

  const roofCovering = roofCoveringRow(house, ref);
  const padType = resolvePadType(conditions, ref);

  // --- inputs with reference defaults
  const inputs = coolingInputsWithDefaults(conditions, house, ref);
  const { allowedTemperatureRiseK, transpirationFraction, padToFanDistanceM, winterDesignC } = inputs;

  // --- air exchange
  const exchange = airExchange(house.exhaustFans, geometry);
  // --- supplemental lamps on the design day (never credited in winter, added in summer)
  validateLamps(house.lamps, 'house.lamps', ref);
  const [, , dayOfMonth] = conditions.designDate.split('-').map(Number);
  const lamps = designDayLamps(
    house.lamps,
    geometry.floorAreaM2,
    month,
    solarNoonUtc(year, month, dayOfMonth, site.latitudeDeg, site.longitudeDeg),
    site.latitudeDeg,
    site.longitudeDeg,
  );

  // --- design day
  const pressurePa = standardAtmosphericPressurePa(site.elevationM);
  const summerAirDensityKgPerM3 = dryAirDensityKgPerM3(conditions.summerDesignC, pressurePa);
  const conductanceWPerK = heatLossCoefficients(house, geometry, ref, {
    curtainClosed: false,
    airDensityKgPerM3: summerAirDensityKgPerM3,
  }).totalWPerK;
  // the opaque kneewall's share of the envelope passes no light
  const roofLightTransmittance = roofCovering.lightTransmittance * (1 - opaqueEnvelopeShare(geometry));
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
      roofLightTransmittance,
      shadeTransmittance,
      transpirationFraction,
      conductanceWPerK,
      installedFlowM3PerS: exchange.installedFlowM3PerS,
      coolingSetpointC: house.setpoints.coolingC,
      padSaturationEfficiency: padType ? padType.saturationEfficiency : null,
      lampHeatByHourW: lamps?.heatByHourW ?? null,
    },
    ref,
  );

  // --- required capacity, its light factor read from the design day's own light (and shade)
  const light = interiorLight(
    {
      enteredUnshadedLux: inputs.enteredPeakInteriorLightLux,
      peakGlobalHorizontalWPerM2: designDay.peakGlobalHorizontalWPerM2,
      roofLightTransmittance,
      shadeTransmittance,
    },
    ref,
  );
  // --- required capacity: the lamps' heat adds to the hours they run
  const cp = airSpecificHeat(ref);
  const brightestWPerM2 = maxOf(designDay.hours.map((hour) => hour.globalHorizontalWPerM2));
  const { elevationBeyondTable, ...capacity } = requiredCapacity(
    {
      floorAreaM2: geometry.floorAreaM2,
      elevationM: site.elevationM,
      peakInteriorLightLux: light.lux,
      allowedTemperatureRiseK,
      padToFanDistanceM,
      fans: house.exhaustFans,
      inletAreaM2: house.inletAreaM2,
      lamps: lamps
        ? {
            heatByHourW: lamps.heatByHourW,
            sunShareByHour: designDay.hours.map((hour) =>
              brightestWPerM2 > 0 ? hour.globalHorizontalWPerM2 / brightestWPerM2 : 0,
            ),
            airHeatCapacityJPerM3K: summerAirDensityKgPerM3 * cp.value,
          }
        : null,
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
      interiorLight: light,
      roofLightTransmittance,
      peakGlobalHorizontalWPerM2: designDay.peakGlobalHorizontalWPerM2,
      shadeCloth: cloth,
      airSpecificHeat: cp,
      padType,
      staging,
      winterFraction,
      lamps: house.lamps ? { spec: house.lamps, onDesignDay: lamps } : null,
    },
    ref,
  );
  const cautions = coolingCautions(
    {
      capacity,
      elevationBeyondTable,
      designDay,
      padType,
      pads,
      padToFanDistanceM,
      staging,
      winter,
      interiorLight: light,
      allowedTemperatureRiseK,
      coolingSetpointC: house.setpoints.coolingC,
      transpirationFraction,
    },
    ref,
  );
  if (house.lamps) cautions.push(lampElectricalCaution(lamps ?? lampPower(house.lamps, geometry.floorAreaM2)));

  return {
    airExchange: exchange,
    capacity,
    interiorLight: light,
    shadeCloth:
      cloth === null
        ? null
        : {
            solarTransmittance: cloth.solarTransmittance,
            months: [...cloth.months].sort((a, b) => a - b),
            inPlaceOnDesignDate: cloth.months.includes(month),
          },
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
    lamps: coolingLamps(lamps, capacity),
    assumptions,
    cautions,
  };
}
