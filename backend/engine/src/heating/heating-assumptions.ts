import { SURFACE_GROUPS, quantityToken, type SurfaceGroup } from '../vocabulary';
import type { HouseGeometry } from '../geometry/house-geometry';
import type { ReferenceRow } from '../reference-data.types';
import type { CondensationDetails } from './condensation';
import { CURTAIN_SURFACES, type HeatLossCoefficients } from './heat-loss';
import type { HeaterSizingDetails } from './heater-sizing';
import type { HeatingConditions } from './heating-conditions';
import type { WindCorrection } from './wind';

export interface HeatingAssumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: string;
  overridden: boolean;
}

const USER_SOURCE = 'entered for this house';
const USER_CONFIDENCE = 'user-entered';
const PSYCHROLIB_SOURCE =
  'computed with psychrolib (ASHRAE 2017 Fundamentals ch. 1): standard-atmosphere pressure at the site elevation';

/** An assumption taken as it stands from a reference row. */
export function assumptionFromRow(
  row: ReferenceRow,
  key: string,
  label: string,
  value: number | string,
  unit: string,
): HeatingAssumption {
  return { key, label, value, unit, source: row.source, confidence: row.confidence, overridden: false };
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
      : assumptionFromRow(
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
      assumptionFromRow(
        row,
        `wind.${row.id}`,
        `U at the design wind ÷ tabulated U, ${groups.join(' and ')}: ${row.label}`,
        factor,
        '–',
      ),
    );
  }
  list.push(
    assumptionFromRow(
      wind.rows.infiltration,
      'wind.infiltrationFactor',
      wind.rows.infiltration.label,
      wind.infiltrationFactor,
      '–',
    ),
  );
  return list;
}

// Quantities in labels are tokens (see prose.ts): the reader's unit system shows them.
const degC = (celsius: number) => quantityToken('temperature', celsius);
const metres = (lengthM: number) => quantityToken('length', lengthM);

export interface HeatingAssumptionSources {
  conditions: HeatingConditions;
  insideC: number;
  geometry: HouseGeometry;
  coefficients: HeatLossCoefficients;
  /** the inside air the infiltration loss is computed with */
  air: { airDensityKgPerM3: number; pressurePa: number };
  condensation: CondensationDetails;
  sizing: HeaterSizingDetails;
}

/** Every reference value the design-night estimate used, and where the house replaced one. */
export function heatingAssumptions({
  conditions,
  insideC,
  geometry,
  coefficients,
  air,
  condensation,
  sizing,
}: HeatingAssumptionSources): HeatingAssumption[] {
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
        : assumptionFromRow(
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
      assumptionFromRow(
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
      assumptionFromRow(
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
      : assumptionFromRow(
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
    assumptionFromRow(
      perimeterRow,
      'perimeter.wPerMK',
      `Perimeter loss factor: ${perimeterRow.label}`,
      perimeterRow.wPerMK,
      'W/(m·K)',
    ),
  );
  assumptions.push(
    assumptionFromRow(
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
    assumptionFromRow(
      filmRows.roof,
      'surface.insideRoof.hWPerM2K',
      filmRows.roof.label,
      filmRows.roof.hWPerM2K,
      'W/(m²·K)',
    ),
  );
  assumptions.push(
    assumptionFromRow(
      filmRows.sidewalls,
      'surface.insideWall.hWPerM2K',
      filmRows.sidewalls.label,
      filmRows.sidewalls.hWPerM2K,
      'W/(m²·K)',
    ),
  );
  assumptions.push(
    assumptionFromRow(
      sizing.safetyMarginRow,
      'heater.safetyMargin',
      sizing.safetyMarginRow.label,
      sizing.result.safetyMargin,
      'fraction',
    ),
  );
  assumptions.push(
    assumptionFromRow(
      sizing.minimumUnitCountRow,
      'heater.minimumUnitCount',
      sizing.minimumUnitCountRow.label,
      sizing.minimumUnitCountRow.count as number,
      'units',
    ),
  );
  assumptions.push(
    sizing.typicalHeaterType
      ? assumptionFromRow(
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
  return assumptions;
}
