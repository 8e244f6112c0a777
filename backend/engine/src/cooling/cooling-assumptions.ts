import type { ReferenceData, ReferenceRow } from '../reference-data.types';
import { clearSkyMonthRow } from '../solar/clear-sky';
import type { AssumptionConfidence } from '../vocabulary';
import {
  dailyRangeProfileRow,
  requireRow,
  ventilationValue,
  type PadTypeRow,
  type SourcedValue,
} from './cooling-reference';
import type { CoolingConditions, CoolingInputsWithDefaults, RoofCoveringRow } from './cooling-inputs';
import type { ShadeCloth } from '../house.types';
import { MONTH_NAMES, shadeClothInWords } from '../solar/shade-cloth';
import type { CapacityResult, InteriorLight } from './required-capacity';
import type { StagingResult } from './staging';
import type { Lamps } from '../house.types';
import { LAMP_SCHEDULE_ROW_ID, LAMP_SUMMER_ROW_ID, lampMethodRow } from '../lamps/lamps';
import type { DesignDayLamps } from './design-day-lamps';

export interface CoolingAssumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  /** 'user-entered' for values the house states (its lamps) */
  confidence: AssumptionConfidence;
  overridden: boolean;
}

export interface CoolingAssumptionSources {
  conditions: CoolingConditions;
  inputs: CoolingInputsWithDefaults;
  /** month and year of the design date */
  designMonth: { year: number; month: number };
  capacity: CapacityResult;
  roofCovering: RoofCoveringRow;
  /** UA of the house with the curtain open, W/K */
  conductanceWPerK: number;
  /** outdoor humidity ratio held through the design day, kg/kg */
  designHumidityRatioKgPerKg: number;
  /** the peak interior light the light factor read */
  interiorLight: InteriorLight;
  /** the roof covering's light transmittance less the opaque kneewall's share */
  roofLightTransmittance: number;
  /** the design day's highest clear-sky global horizontal irradiance, W/m² */
  peakGlobalHorizontalWPerM2: number;
  shadeCloth: ShadeCloth | null;
  airSpecificHeat: SourcedValue;
  padType: PadTypeRow | null;
  staging: StagingResult;
  winterFraction: SourcedValue;
  /** the house's lamps and what they do on the design day (null there when they do not run that month) */
  lamps?: { spec: Lamps; onDesignDay: DesignDayLamps | null } | null;
}

/** Every reference value the cooling estimate used, with its source, and where the user replaced one. */
export function coolingAssumptions(
  {
    conditions,
    inputs,
    designMonth: { year, month },
    capacity,
    roofCovering,
    conductanceWPerK,
    designHumidityRatioKgPerKg,
    interiorLight: light,
    roofLightTransmittance,
    peakGlobalHorizontalWPerM2,
    shadeCloth,
    airSpecificHeat: cp,
    padType,
    staging,
    winterFraction,
    lamps,
  }: CoolingAssumptionSources,
  ref: ReferenceData,
): CoolingAssumption[] {
  const assumptions: CoolingAssumption[] = [];
  const sourced = (
    key: string,
    label: string,
    value: number | string,
    unit: string,
    row: ReferenceRow,
    overridden = false,
  ) => assumptions.push({ key, label, value, unit, source: row.source, confidence: row.confidence, overridden });

  const baseRate = ventilationValue(ref, 'summer-base-rate', 'rateM3PerSM2');
  sourced('summerBaseRate', 'Summer exhaust rate per floor area (base)', baseRate.value, 'm³/(s·m²)', baseRate.row);
  sourced(
    'elevationFactor',
    'Elevation factor F_elev',
    capacity.factors.elevation,
    '–',
    requireRow(ref, 'ventilation', 'elevation-factor'),
  );
  const shadeWords =
    shadeCloth === null
      ? 'none'
      : shadeCloth.months.includes(month)
        ? `${shadeClothInWords(shadeCloth)}: in place on the design date`
        : `${shadeClothInWords(shadeCloth)}: not in place in ${MONTH_NAMES[month - 1]}, so it shades nothing on the design date`;
  assumptions.push({
    key: 'shadeCloth',
    label:
      'Shade cloth: multiplies the sun through the roof on the design day, both its solar heat and the interior light of the light factor',
    value: shadeWords,
    unit: '',
    source:
      shadeCloth === null
        ? 'The house has no shade cloth'
        : 'The house as entered (typical cloths in reference-data/shade-cloths.json); the cloth counts only what it passes, not heat it absorbs itself',
    confidence: shadeCloth === null ? 'derived' : 'common-practice',
    overridden: false,
  });
  assumptions.push({
    key: 'shadeTransmittance',
    label: 'Share of the sun the shade cloth passes on the design date (1 = no shade)',
    value: light.shadeTransmittance,
    unit: '–',
    source: shadeCloth === null ? 'No shade cloth' : 'The house as entered',
    confidence: 'derived',
    overridden: false,
  });
  if (light.from === 'entered') {
    assumptions.push({
      key: 'peakInteriorLightLux',
      label:
        'Peak interior light at plant height for the light factor: the entered light under the roof × the shade cloth. The design day itself still uses the clear-sky sun through the roof, so the two can differ',
      value: light.lux,
      unit: 'lx',
      source: `Entered in the request (${Math.round(light.unshadedLux)} lx before shade) × shade ${light.shadeTransmittance}`,
      confidence: 'derived',
      overridden: true,
    });
  } else {
    assumptions.push({
      key: 'peakInteriorLightLux',
      label:
        "Peak interior light at plant height for the light factor: the design day's own light (peak clear-sky global irradiance × roof light transmittance × shade cloth × luminous efficacy), the same sun as the hour-by-hour balance",
      value: light.lux,
      unit: 'lx',
      source: `${Math.round(peakGlobalHorizontalWPerM2)} W/m² × ${roofLightTransmittance.toFixed(3)} × ${light.shadeTransmittance} × ${inputs.luminousEfficacy.value} lm/W (design-day clear-sky model, roof covering, shade cloth and luminous efficacy as listed)`,
      confidence: 'derived',
      overridden: false,
    });
  }
  sourced(
    'luminousEfficacy',
    'Luminous efficacy of clear-sky daylight (turns W/m² into lux)',
    inputs.luminousEfficacy.value,
    'lm/W',
    inputs.luminousEfficacy.row,
  );
  const lightRef = ventilationValue(ref, 'light-factor', 'referenceLux');
  sourced(
    'lightFactorReferenceLux',
    'Reference light of the base rate (F_light = peak interior light ÷ reference)',
    lightRef.value,
    'lx',
    lightRef.row,
  );
  sourced(
    'allowedTemperatureRiseK',
    'Allowed inlet-to-fan temperature rise',
    inputs.allowedTemperatureRiseK,
    'K',
    inputs.riseDefault.row,
    conditions.allowedTemperatureRiseK !== undefined,
  );
  assumptions.push({
    key: 'padToFanDistanceM',
    label: 'Inlet (pad) to fan distance',
    value: inputs.padToFanDistanceM,
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
    inputs.transpirationFraction,
    '–',
    inputs.transpirationDefault.row,
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
    value: designHumidityRatioKgPerKg,
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
      'hours are local apparent solar time (hour 12 = solar noon); clear sky; steady state each hour with no heat storage in floor, benches or crop; a shade cloth only when it is in place in the design month; heaters not modelled (night temperatures free-floating); fans staged continuously; fan fraction and "setpoint held" describe the house with its pads when pads are entered',
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
  const deadbandRow = requireRow(ref, 'ventilation', 'heat-cool-deadband');
  sourced(
    'requiredDeadbandK',
    'Minimum gap between heating and first cooling stage',
    staging.requiredDeadbandK,
    'K',
    deadbandRow,
  );
  const stagingRow = requireRow(ref, 'ventilation', 'fan-staging');
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
  if (lamps) {
    assumptions.push({
      key: 'lamps.powerDensityWPerM2',
      label: 'Supplemental lamps: electrical input per floor area',
      value: lamps.spec.powerDensityWPerM2,
      unit: 'W/m²',
      source: 'entered for this house',
      confidence: 'user-entered',
      overridden: true,
    });
    assumptions.push({
      key: 'lamps.hoursOnDesignDay',
      label: `Hours the lamps run on the design day (month ${month})`,
      value: lamps.onDesignDay?.hoursOn ?? 0,
      unit: 'h',
      source: 'entered for this house',
      confidence: 'user-entered',
      overridden: true,
    });
    assumptions.push({
      key: 'lamps.heatToHouseFraction',
      label: "Share of the lamps' input that heats the house",
      value: lamps.spec.heatToHouseFraction,
      unit: '–',
      source: 'entered for this house (reference-data/lamps.json offers the default)',
      confidence: 'user-entered',
      overridden: true,
    });
    const schedule = lampMethodRow(ref, LAMP_SCHEDULE_ROW_ID);
    sourced('lamps.schedule', schedule.label ?? LAMP_SCHEDULE_ROW_ID, 'ends at sunrise', '', schedule);
    const summer = lampMethodRow(ref, LAMP_SUMMER_ROW_ID);
    sourced('lamps.summerFlow', summer.label ?? LAMP_SUMMER_ROW_ID, 'V̇ = Q ÷ (ρ·c_p·ΔT)', '', summer);
  }
  sourced(
    'winterDesignC',
    'Outdoor temperature for the winter ventilation heat cost (house air at the night heating setpoint)',
    inputs.winterDesignC,
    '°C',
    inputs.winterDefault.row,
    conditions.winterDesignC !== undefined,
  );
  return assumptions;
}
