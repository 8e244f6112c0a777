import { BOUNDS } from './vocabulary';
import { EngineInputError, requireInRange } from './errors';
import { computeHouseGeometry } from './geometry/house-geometry';
import { condensationRisk, type CondensationResult } from './heating/condensation';
import { designHeatLoss, heatLossCoefficients, CURTAIN_SURFACES, type HeatLossBreakdown } from './heating/heat-loss';
import { sizeHeaters, type HeaterSizingResult } from './heating/heater-sizing';
import { combustionSafety } from './heating/combustion-safety';
import type { WindCorrection } from './heating/wind';
import { SURFACE_GROUPS, type SurfaceGroup } from './vocabulary';
import { type HouseSpec } from './house.types';
import { insideAirDensityKgPerM3 } from './psychrometrics/psychrometrics';
import { quantityToken } from './vocabulary';
import type { ReferenceData, ReferenceRow } from './reference-data.types';

export interface HeatingConditions {
  /** winter design dry bulb (e.g. the 99 % or 99.6 % value), °C */
  designOutdoorC: number;
  /** site elevation, m (sets air density through the standard atmosphere) */
  elevationM: number;
  /** inside relative humidity on the design night, % */
  insideRelativeHumidityPct: number;
  /** inside temperature to hold, °C; defaults to house.setpoints.nightHeatingC */
  insideC?: number;
  /**
   * Credit a drawn curtain in the design loss. Default false: heaters are sized for a night with
   * the curtain open, since curtains are opened to shed snow and can fail to close.
   */
  curtainClosed?: boolean;
  /** design wind speed, m/s; default the wind the U tables assume (reference-data/wind.json) */
  designWindSpeedMPerS?: number;
}

export interface HeatingEstimateInput {
  house: HouseSpec;
  conditions: HeatingConditions;
}

export interface HeatingAssumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: string;
  overridden: boolean;
}

export interface HeatingEstimate {
  geometry: {
    floorAreaM2: number;
    roofAreaM2: number;
    sidewallAreaM2: number;
    endwallAreaM2: number;
    /** opaque kneewall on the sidewalls and endwalls, m² (0 without one) */
    kneewallAreaM2: number;
    coverAreaM2: number;
    perimeterM: number;
    volumeM3: number;
  };
  heatLoss: HeatLossBreakdown;
  heater: HeaterSizingResult;
  condensation: CondensationResult;
  assumptions: HeatingAssumption[];
  /** may hold {{kind:valueSI}} quantity tokens (see prose.ts), as may assumption labels */
  cautions: string[];
}

const USER_SOURCE = 'entered for this house';
const USER_CONFIDENCE = 'user-entered';
const PSYCHROLIB_SOURCE =
  'computed with psychrolib (ASHRAE 2017 Fundamentals ch. 1): standard-atmosphere pressure at the site elevation';

function fromRow(
  row: ReferenceRow,
  key: string,
  label: string,
  value: number | string,
  unit: string,
): HeatingAssumption {
  return { key, label, value, unit, source: row.source, confidence: row.confidence, overridden: false };
}

function validateConditions(conditions: HeatingConditions, house: HouseSpec): number {
  if (!conditions || typeof conditions !== 'object') {
    throw new EngineInputError('conditions', 'conditions are required');
  }
  requireInRange(
    'conditions.designOutdoorC',
    conditions.designOutdoorC,
    BOUNDS.designOutdoorC.min,
    BOUNDS.designOutdoorC.max,
  );
  requireInRange('conditions.elevationM', conditions.elevationM, BOUNDS.elevationM.min, BOUNDS.elevationM.max);
  requireInRange(
    'conditions.insideRelativeHumidityPct',
    conditions.insideRelativeHumidityPct,
    BOUNDS.relativeHumidityPct.min,
    BOUNDS.relativeHumidityPct.max,
  );
  if (conditions.curtainClosed !== undefined && typeof conditions.curtainClosed !== 'boolean') {
    throw new EngineInputError('conditions.curtainClosed', 'conditions.curtainClosed must be true or false');
  }
  if (conditions.insideC !== undefined && conditions.insideC !== null) {
    return requireInRange('conditions.insideC', conditions.insideC, BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  }
  if (!house.setpoints || typeof house.setpoints !== 'object') {
    throw new EngineInputError('house.setpoints', 'house.setpoints are required');
  }
  return requireInRange(
    'house.setpoints.nightHeatingC',
    house.setpoints.nightHeatingC,
    BOUNDS.setpointC.min,
    BOUNDS.setpointC.max,
  );
}

function windAssumptions(wind: WindCorrection, entered: boolean): HeatingAssumption[] {
  const list: HeatingAssumption[] = [
    entered
      ? {
          key: 'wind.designWindSpeedMPerS',
          label: `Design wind speed (the U tables assume ${quantityToken('velocity', wind.tableWindSpeedMPerS)})`,
          value: wind.windSpeedMPerS,
          unit: 'm/s',
          source: USER_SOURCE,
          confidence: USER_CONFIDENCE,
          overridden: true,
        }
      : fromRow(
          wind.rows.defaultWind,
          'wind.designWindSpeedMPerS',
          wind.rows.defaultWind.label,
          wind.windSpeedMPerS,
          'm/s',
        ),
  ];
  for (const row of wind.rows.relations) {
    const groups = SURFACE_GROUPS.filter((group) => wind.relation[group] === row.id);
    const factor = wind.uFactor[groups[0]];
    list.push(
      fromRow(
        row,
        `wind.${row.id}`,
        `U at the design wind ÷ tabulated U, ${groups.join(' and ')}: ${row.label}`,
        factor,
        '–',
      ),
    );
  }
  list.push(
    fromRow(
      wind.rows.infiltration,
      'wind.infiltrationFactor',
      wind.rows.infiltration.label,
      wind.infiltrationFactor,
      '–',
    ),
  );
  return list;
}

// Quantities in labels and cautions are tokens (see prose.ts): the reader's unit system shows them.
const kW = (watts: number) => quantityToken('power', watts);
const degC = (celsius: number) => quantityToken('temperature', celsius);
const metres = (lengthM: number) => quantityToken('length', lengthM);

/**
 * Design-night heating estimate for one house: heat loss with its breakdown, heater sizing,
 * condensation on the coverings, every assumption used and the cautions that go with it.
 */
export function estimateHeating(input: HeatingEstimateInput, ref: ReferenceData): HeatingEstimate {
  if (!input || typeof input !== 'object') throw new EngineInputError('house', 'house is required');
  const { house, conditions } = input;
  const geometry = computeHouseGeometry(house);
  const insideC = validateConditions(conditions, house);
  const outsideC = conditions.designOutdoorC;
  const curtainClosed = conditions.curtainClosed ?? false;

  const air = insideAirDensityKgPerM3(insideC, conditions.insideRelativeHumidityPct, conditions.elevationM);
  const coefficients = heatLossCoefficients(house, geometry, ref, {
    curtainClosed,
    airDensityKgPerM3: air.airDensityKgPerM3,
    windSpeedMPerS: conditions.designWindSpeedMPerS ?? undefined,
  });
  const heatLoss = designHeatLoss(coefficients, geometry, insideC, outsideC);
  const sizing = sizeHeaters(
    {
      designHeatLossW: heatLoss.totalW,
      totalConductanceWPerK: coefficients.totalWPerK,
      insideC,
      heaters: house.heaters,
    },
    ref,
  );
  const condensation = condensationRisk(
    { insideC, outsideC, insideRelativeHumidityPct: conditions.insideRelativeHumidityPct },
    SURFACE_GROUPS.map((group) => ({
      group,
      coveringId: coefficients.rows.coverings[group].id,
      // the covering's U at the design wind (the curtain is not credited for the cover's own surface)
      uWPerM2K: coefficients.coveringUWPerM2K[group] * coefficients.wind.uFactor[group],
    })),
    ref,
  );

  // ---- assumptions: every reference value used, and where the house replaced one
  const assumptions: HeatingAssumption[] = [];
  const groupLabel: Record<SurfaceGroup, string> = { roof: 'roof', sidewalls: 'sidewalls', endwalls: 'endwalls' };
  for (const group of SURFACE_GROUPS) {
    const row = coefficients.rows.coverings[group];
    const overridden = coefficients.overridesUsed.coveringU.includes(group);
    assumptions.push(
      overridden
        ? {
            key: `coverings.${group}.uWPerM2K`,
            label: `U-value, ${groupLabel[group]}: ${row.label} (replaces the reference ${quantityToken('uValue', row.uWPerM2K)})`,
            value: coefficients.coveringUWPerM2K[group],
            unit: 'W/(m²·K)',
            source: USER_SOURCE,
            confidence: USER_CONFIDENCE,
            overridden: true,
          }
        : fromRow(
            row,
            `coverings.${group}.uWPerM2K`,
            `U-value, ${groupLabel[group]}: ${row.label}`,
            row.uWPerM2K,
            'W/(m²·K)',
          ),
    );
  }
  const kneewallRow = coefficients.rows.kneewall;
  if (kneewallRow && geometry.kneewallAreaM2 > 0) {
    assumptions.push(
      fromRow(
        kneewallRow,
        'kneewall.uWPerM2K',
        `U-value, kneewall ${metres(geometry.kneewallHeightM)} high: ${kneewallRow.label}`,
        kneewallRow.uWPerM2K,
        'W/(m²·K)',
      ),
    );
  }
  const curtainRow = coefficients.rows.curtain;
  if (curtainRow) {
    assumptions.push(
      fromRow(
        curtainRow,
        'curtain.uReduction',
        `Curtain U reduction on ${CURTAIN_SURFACES.join(' and ')}: ${curtainRow.label}` +
          (coefficients.curtainApplied ? '' : ' (not credited: curtain taken as open)'),
        curtainRow.uReduction,
        'fraction',
      ),
    );
  }
  const leakage = coefficients.rows.airLeakage;
  assumptions.push(
    coefficients.overridesUsed.airChangesPerHour
      ? {
          key: 'airLeakage.airChangesPerHour',
          label: `Air changes per hour (replaces ${leakage.airChangesPerHour} for ${leakage.label.toLowerCase()})`,
          value: coefficients.airChangesPerHour,
          unit: '1/h',
          source: USER_SOURCE,
          confidence: USER_CONFIDENCE,
          overridden: true,
        }
      : fromRow(
          leakage,
          'airLeakage.airChangesPerHour',
          `Air changes per hour: ${leakage.label}`,
          leakage.airChangesPerHour,
          '1/h',
        ),
  );
  assumptions.push(...windAssumptions(coefficients.wind, conditions.designWindSpeedMPerS !== undefined));
  const perimeterRow = coefficients.rows.perimeter;
  assumptions.push(
    fromRow(
      perimeterRow,
      'perimeter.wPerMK',
      `Perimeter loss factor: ${perimeterRow.label}`,
      perimeterRow.wPerMK,
      'W/(m·K)',
    ),
  );
  assumptions.push(
    fromRow(
      coefficients.rows.specificHeat,
      'air.specificHeatJPerKgK',
      'Specific heat of air',
      coefficients.specificHeatJPerKgK,
      'J/(kg·K)',
    ),
  );
  assumptions.push({
    key: 'air.pressurePa',
    label: `Barometric pressure at ${metres(conditions.elevationM)} (standard atmosphere)`,
    value: air.pressurePa,
    unit: 'Pa',
    source: PSYCHROLIB_SOURCE,
    confidence: 'derived',
    overridden: false,
  });
  assumptions.push({
    key: 'air.densityKgPerM3',
    label: `Density of inside air at ${degC(insideC)} and ${conditions.insideRelativeHumidityPct} % RH`,
    value: air.airDensityKgPerM3,
    unit: 'kg/m³',
    source: `${PSYCHROLIB_SOURCE}, moist-air density at the inside temperature and humidity`,
    confidence: 'derived',
    overridden: false,
  });
  const filmRows = condensation.insideFilmRows;
  assumptions.push(
    fromRow(filmRows.roof, 'surface.insideRoof.hWPerM2K', filmRows.roof.label, filmRows.roof.hWPerM2K, 'W/(m²·K)'),
  );
  assumptions.push(
    fromRow(
      filmRows.sidewalls,
      'surface.insideWall.hWPerM2K',
      filmRows.sidewalls.label,
      filmRows.sidewalls.hWPerM2K,
      'W/(m²·K)',
    ),
  );
  assumptions.push(
    fromRow(
      sizing.safetyMarginRow,
      'heater.safetyMargin',
      sizing.safetyMarginRow.label,
      sizing.result.safetyMargin,
      'fraction',
    ),
  );
  assumptions.push(
    fromRow(
      sizing.minimumUnitCountRow,
      'heater.minimumUnitCount',
      sizing.minimumUnitCountRow.label,
      sizing.minimumUnitCountRow.count as number,
      'units',
    ),
  );
  assumptions.push(
    sizing.typicalHeaterType
      ? fromRow(
          sizing.typicalHeaterType,
          'heater.efficiency',
          `Heater efficiency for the required input: ${sizing.typicalHeaterType.label} (typical)`,
          sizing.efficiencyForRequiredInput,
          'fraction',
        )
      : {
          key: 'heater.efficiency',
          label: 'Heater efficiency for the required input (input-weighted mean of the installed heaters)',
          value: sizing.efficiencyForRequiredInput,
          unit: 'fraction',
          source: USER_SOURCE,
          confidence: USER_CONFIDENCE,
          overridden: false,
        },
  );

  // ---- cautions
  const cautions: string[] = [];
  if (heatLoss.deltaTK <= 0) {
    cautions.push(
      `The design outdoor temperature (${degC(outsideC)}) is not below the inside temperature (${degC(insideC)}): no heating is needed at these conditions.`,
    );
  }
  if (sizing.result.verdict === 'short') {
    cautions.push(
      `Installed output ${kW(sizing.result.installedOutputW)} is ${kW(sizing.result.shortfallW)} short of the ${kW(sizing.result.requiredOutputW)} required; ` +
        `it holds ${degC(insideC)} inside only down to ${degC(sizing.result.lowestHeldOutdoorC as number)} outside.`,
    );
  }
  if (sizing.result.unitCount === 1) {
    cautions.push('Only one heating unit: if it fails the crop has no heat. Split the output over at least two units.');
  }
  if (curtainRow && !coefficients.curtainApplied) {
    const closed = heatLossCoefficients(house, geometry, ref, {
      curtainClosed: true,
      airDensityKgPerM3: air.airDensityKgPerM3,
      windSpeedMPerS: conditions.designWindSpeedMPerS ?? undefined,
    });
    const closedLossW = designHeatLoss(closed, geometry, insideC, outsideC).totalW;
    cautions.push(
      `The curtain is not credited: heaters are sized for a night with it open (it is opened to shed snow and can fail to close). Drawn, the loss would be about ${kW(closedLossW)}.`,
    );
  }
  const condensing = condensation.result.surfaces.filter((surface) => surface.condenses);
  if (condensing.length > 0) {
    cautions.push(
      `Water condenses on the inside of the ${condensing.map((surface) => surface.group).join(', ')} at these conditions ` +
        `(dew point ${degC(condensation.result.dewPointC)}). Drip wets foliage and spreads disease: consider a second layer or anti-condensate film, air movement, or venting and heating to lower humidity.`,
    );
  }
  if (
    coefficients.overridesUsed.coveringU.length < SURFACE_GROUPS.length &&
    SURFACE_GROUPS.some((group) => coefficients.rows.coverings[group].confidence === 'memory')
  ) {
    cautions.push(
      "Covering U-values and air-change rates are handbook values not yet checked against the primary tables; treat the heat loss as a planning range and enter a maker's tested U-value where you have one.",
    );
  }
  if (sizing.result.fuelFired) {
    const safety = combustionSafety(sizing.fuelFiredInputW, sizing.unventedInputW, ref);
    cautions.push(...safety.cautions);
    for (const { row, value, unit } of safety.rows) {
      assumptions.push(fromRow(row, `safety.${row.id}`, row.label, value, unit));
    }
  }
  cautions.push(
    'Estimates are for planning. Heater selection and installation rest with licensed installers and local codes.',
  );

  return {
    geometry: {
      floorAreaM2: geometry.floorAreaM2,
      roofAreaM2: geometry.roofAreaM2,
      sidewallAreaM2: geometry.sidewallAreaM2,
      endwallAreaM2: geometry.endwallAreaM2,
      kneewallAreaM2: geometry.kneewallAreaM2,
      coverAreaM2: geometry.coverAreaM2,
      perimeterM: geometry.perimeterM,
      volumeM3: geometry.volumeM3,
    },
    heatLoss,
    heater: sizing.result,
    condensation: condensation.result,
    assumptions,
    cautions,
  };
}
