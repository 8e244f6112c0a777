import { BOUNDS } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { HouseGeometry } from '../geometry/house-geometry';
import { SURFACE_GROUPS, type SurfaceGroup } from '../vocabulary';
import { type HouseSpec } from '../house.types';
import type { ReferenceData } from '../reference-data.types';
import {
  chosenRow,
  requiredRow,
  specificHeatOfAirRow,
  type AirLeakageRow,
  type AirPropertyRow,
  type CoveringRow,
  type CurtainRow,
  type KneewallRow,
  type PerimeterRow,
} from './heating-reference';
import { windCorrection, type WindCorrection } from './wind';

/** The wind part of a breakdown: speed and the factors it applied. */
export type WindSummary = Pick<
  WindCorrection,
  'windSpeedMPerS' | 'tableWindSpeedMPerS' | 'uFactor' | 'infiltrationFactor'
>;

/**
 * Steady-state heat loss of a closed house:
 *   UA = Σ U_group · A_group  +  U_kneewall · A_kneewall  +  F · perimeter  +  ρ · cp · V · ACH / 3600   (W/K)
 *   Q  = UA · (T_inside − T_outside)                                            (W)
 * A drawn curtain lowers the U of the surfaces it shields by its fractional reduction s:
 * U_closed = U · (1 − s). It is credited on the roof (the curtain runs under it at gutter height)
 * and the sidewalls (side curtains are drawn with it); endwalls keep their U because endwall
 * curtains are often absent and the gable area above the curtain still loses heat to the
 * curtain-to-roof space.
 */
export const CURTAIN_SURFACES: readonly SurfaceGroup[] = ['roof', 'sidewalls'];

export interface HeatLossOptions {
  /** whether the house's curtain (if it has one) is drawn */
  curtainClosed: boolean;
  /**
   * design wind speed, m/s; absent: the wind the tables assume (no correction). Corrects the U of
   * each covering and the air-change rate (see ./wind.ts).
   */
  windSpeedMPerS?: number;
  /** density of the air that leaks out, kg/m³ (see psychrometrics/insideAirDensityKgPerM3) */
  airDensityKgPerM3: number;
}

export interface HeatLossCoefficients {
  /** U · A per surface group, W/K, after any curtain */
  coveringWPerK: Record<SurfaceGroup, number>;
  coveringTotalWPerK: number;
  /** U · A of the opaque kneewall, W/K (0 without one) */
  kneewallWPerK: number;
  perimeterWPerK: number;
  infiltrationWPerK: number;
  totalWPerK: number;
  /** U used per group, after override and curtain, W/(m²·K) */
  effectiveUWPerM2K: Record<SurfaceGroup, number>;
  /** U of the covering itself (reference value or the house's override), before any curtain */
  coveringUWPerM2K: Record<SurfaceGroup, number>;
  areasM2: Record<SurfaceGroup, number>;
  /** air changes per hour used (leakage class or override) */
  airChangesPerHour: number;
  perimeterFactorWPerMK: number;
  airDensityKgPerM3: number;
  specificHeatJPerKgK: number;
  /** wind the coefficients are for, m/s, and the factors it applied (1 at the tables' wind) */
  wind: WindCorrection;
  /** fractional U reduction applied to CURTAIN_SURFACES; 0 when there is no curtain or it is open */
  curtainReduction: number;
  curtainApplied: boolean;
  overridesUsed: { coveringU: SurfaceGroup[]; airChangesPerHour: boolean };
  /** the reference rows behind the numbers, for the assumptions list */
  rows: {
    coverings: Record<SurfaceGroup, CoveringRow>;
    airLeakage: AirLeakageRow;
    perimeter: PerimeterRow;
    curtain: CurtainRow | null;
    kneewall: KneewallRow | null;
    specificHeat: AirPropertyRow;
  };
}

function groupAreasM2(geometry: HouseGeometry): Record<SurfaceGroup, number> {
  return { roof: geometry.roofAreaM2, sidewalls: geometry.sidewallAreaM2, endwalls: geometry.endwallAreaM2 };
}

/** U of each covering group: the house's override where given (validated), else the reference value. */
function coveringUValues(
  house: HouseSpec,
  ref: ReferenceData,
): { uWPerM2K: Record<SurfaceGroup, number>; rows: Record<SurfaceGroup, CoveringRow>; overridden: SurfaceGroup[] } {
  if (!house.coverings || typeof house.coverings !== 'object') {
    throw new EngineInputError(
      'house.coverings',
      'house.coverings must name a covering for roof, sidewalls and endwalls',
    );
  }
  const rows = {} as Record<SurfaceGroup, CoveringRow>;
  const uWPerM2K = {} as Record<SurfaceGroup, number>;
  const overridden: SurfaceGroup[] = [];
  for (const group of SURFACE_GROUPS) {
    rows[group] = chosenRow<CoveringRow>(ref, 'coverings', house.coverings[group], `house.coverings.${group}`);
    const override = house.coveringUOverridesWPerM2K?.[group];
    if (override === undefined || override === null) {
      uWPerM2K[group] = rows[group].uWPerM2K;
    } else {
      uWPerM2K[group] = requireInRange(
        `house.coveringUOverridesWPerM2K.${group}`,
        override,
        BOUNDS.uValueWPerM2K.min,
        BOUNDS.uValueWPerM2K.max,
      );
      overridden.push(group);
    }
  }
  return { uWPerM2K, rows, overridden };
}

export function heatLossCoefficients(
  house: HouseSpec,
  geometry: HouseGeometry,
  ref: ReferenceData,
  options: HeatLossOptions,
): HeatLossCoefficients {
  if (!Number.isFinite(options.airDensityKgPerM3) || options.airDensityKgPerM3 <= 0) {
    throw new Error(`airDensityKgPerM3 must be a positive number, got ${options.airDensityKgPerM3}`);
  }
  const coverings = coveringUValues(house, ref);

  const curtain =
    house.curtainId === undefined || house.curtainId === null || house.curtainId === ''
      ? null
      : chosenRow<CurtainRow>(ref, 'curtains', house.curtainId, 'house.curtainId');
  const curtainApplied = options.curtainClosed && curtain !== null;
  const curtainReduction = curtainApplied ? curtain.uReduction : 0;

  const wind = windCorrection(house, ref, options.windSpeedMPerS);
  const areasM2 = groupAreasM2(geometry);
  const effectiveUWPerM2K = {} as Record<SurfaceGroup, number>;
  const coveringWPerK = {} as Record<SurfaceGroup, number>;
  for (const group of SURFACE_GROUPS) {
    const shielded = CURTAIN_SURFACES.includes(group);
    effectiveUWPerM2K[group] = coverings.uWPerM2K[group] * wind.uFactor[group] * (shielded ? 1 - curtainReduction : 1);
    coveringWPerK[group] = effectiveUWPerM2K[group] * areasM2[group];
  }
  const coveringTotalWPerK = SURFACE_GROUPS.reduce((sum, group) => sum + coveringWPerK[group], 0);

  const kneewall =
    house.kneewallId === undefined || house.kneewallId === null || house.kneewallId === ''
      ? null
      : chosenRow<KneewallRow>(ref, 'kneewalls', house.kneewallId, 'house.kneewallId');
  // the kneewall runs below the curtain and keeps its U when the curtain is drawn
  const kneewallWPerK = kneewall ? kneewall.uWPerM2K * geometry.kneewallAreaM2 : 0;

  if (typeof house.perimeterInsulated !== 'boolean') {
    throw new EngineInputError('house.perimeterInsulated', 'house.perimeterInsulated must be true or false');
  }
  const perimeter = requiredRow<PerimeterRow>(
    ref,
    'perimeter',
    house.perimeterInsulated ? 'perimeter-insulated' : 'perimeter-uninsulated',
  );
  const perimeterWPerK = perimeter.wPerMK * geometry.perimeterM;

  const airLeakage = chosenRow<AirLeakageRow>(ref, 'air-leakage', house.airLeakageClassId, 'house.airLeakageClassId');
  const achOverride = house.airChangesPerHourOverride;
  const airChangesPerHourOverridden = achOverride !== undefined && achOverride !== null;
  const tableAirChangesPerHour = airChangesPerHourOverridden
    ? requireInRange(
        'house.airChangesPerHourOverride',
        achOverride,
        BOUNDS.airChangesPerHour.min,
        BOUNDS.airChangesPerHour.max,
      )
    : airLeakage.airChangesPerHour;
  const airChangesPerHour = tableAirChangesPerHour * wind.infiltrationFactor;
  const specificHeat = specificHeatOfAirRow(ref);
  const infiltrationWPerK =
    (options.airDensityKgPerM3 * specificHeat.valueJPerKgK * geometry.volumeM3 * airChangesPerHour) / 3600;

  return {
    coveringWPerK,
    coveringTotalWPerK,
    kneewallWPerK,
    perimeterWPerK,
    infiltrationWPerK,
    totalWPerK: coveringTotalWPerK + kneewallWPerK + perimeterWPerK + infiltrationWPerK,
    effectiveUWPerM2K,
    coveringUWPerM2K: coverings.uWPerM2K,
    areasM2,
    airChangesPerHour,
    perimeterFactorWPerMK: perimeter.wPerMK,
    airDensityKgPerM3: options.airDensityKgPerM3,
    specificHeatJPerKgK: specificHeat.valueJPerKgK,
    wind,
    curtainReduction,
    curtainApplied,
    overridesUsed: { coveringU: coverings.overridden, airChangesPerHour: airChangesPerHourOverridden },
    rows: { coverings: coverings.rows, airLeakage, perimeter, curtain, kneewall, specificHeat },
  };
}

export type HeatLossComponentKey =
  'roof' | 'sidewalls' | 'endwalls' | 'kneewall' | 'perimeter' | 'infiltration' | 'sky';

export interface HeatLossComponent {
  key: HeatLossComponentKey;
  label: string;
  quantity: number;
  quantityUnit: 'm2' | 'm' | 'm3';
  /** U in W/(m²·K), F in W/(m·K), air changes per hour, or (sky) W per m² of floor */
  coefficient: number;
  conductanceWPerK: number;
  watts: number;
  /** share of the total, 0–1 */
  share: number;
}

export interface HeatLossBreakdown {
  insideC: number;
  outsideC: number;
  deltaTK: number;
  totalW: number;
  coveringW: number;
  kneewallW: number;
  perimeterW: number;
  infiltrationW: number;
  /** long-wave loss to a clear night sky through the roof, W (0 unless a clear night is asked for) */
  skyW: number;
  curtainApplied: boolean;
  /** design wind speed, m/s, and the factors applied to each covering's U and to the air changes */
  wind: WindSummary;
  components: HeatLossComponent[];
}

const GROUP_LABELS: Record<SurfaceGroup, string> = { roof: 'Roof', sidewalls: 'Sidewalls', endwalls: 'Endwalls' };

/** The label of each part of the house's heat loss (the kneewall's only where it has one). */
export function heatLossComponentLabels(
  coefficients: HeatLossCoefficients,
): Partial<Record<Exclude<HeatLossComponentKey, 'sky'>, string>> & Record<SurfaceGroup, string> {
  const { coverings, kneewall, perimeter } = coefficients.rows;
  return {
    roof: `${GROUP_LABELS.roof} (${coverings.roof.label})`,
    sidewalls: `${GROUP_LABELS.sidewalls} (${coverings.sidewalls.label})`,
    endwalls: `${GROUP_LABELS.endwalls} (${coverings.endwalls.label})`,
    ...(kneewall ? { kneewall: `Kneewall (${kneewall.label})` } : {}),
    perimeter: perimeter.label ?? 'Perimeter',
    infiltration: 'Air leakage (infiltration)',
  };
}

/**
 * Heat the house loses at the given inside and outside temperatures. When it is as warm outside
 * as inside, nothing is lost (the result is 0 W, not negative: this is a heating figure). Shares
 * are shares of conductance, which equal shares of watts whenever any heat is lost.
 */
export function designHeatLoss(
  coefficients: HeatLossCoefficients,
  geometry: HouseGeometry,
  insideC: number,
  outsideC: number,
): HeatLossBreakdown {
  const deltaTK = insideC - outsideC;
  const heatingDeltaTK = Math.max(deltaTK, 0);
  const share = (conductanceWPerK: number) => conductanceWPerK / coefficients.totalWPerK;
  const component = (
    key: HeatLossComponentKey,
    label: string,
    quantity: number,
    quantityUnit: HeatLossComponent['quantityUnit'],
    coefficient: number,
    conductanceWPerK: number,
  ): HeatLossComponent => ({
    key,
    label,
    quantity,
    quantityUnit,
    coefficient,
    conductanceWPerK,
    watts: conductanceWPerK * heatingDeltaTK,
    share: share(conductanceWPerK),
  });

  const labels = heatLossComponentLabels(coefficients);
  const components: HeatLossComponent[] = [
    ...SURFACE_GROUPS.map((group) =>
      component(
        group,
        labels[group],
        coefficients.areasM2[group],
        'm2',
        coefficients.effectiveUWPerM2K[group],
        coefficients.coveringWPerK[group],
      ),
    ),
    ...(coefficients.rows.kneewall && geometry.kneewallAreaM2 > 0
      ? [
          component(
            'kneewall',
            labels.kneewall ?? 'Kneewall',
            geometry.kneewallAreaM2,
            'm2',
            coefficients.rows.kneewall.uWPerM2K,
            coefficients.kneewallWPerK,
          ),
        ]
      : []),
    component(
      'perimeter',
      labels.perimeter ?? 'Perimeter',
      geometry.perimeterM,
      'm',
      coefficients.perimeterFactorWPerMK,
      coefficients.perimeterWPerK,
    ),
    component(
      'infiltration',
      labels.infiltration ?? 'Air leakage (infiltration)',
      geometry.volumeM3,
      'm3',
      coefficients.airChangesPerHour,
      coefficients.infiltrationWPerK,
    ),
  ];

  return {
    insideC,
    outsideC,
    deltaTK,
    totalW: coefficients.totalWPerK * heatingDeltaTK,
    coveringW: coefficients.coveringTotalWPerK * heatingDeltaTK,
    kneewallW: coefficients.kneewallWPerK * heatingDeltaTK,
    perimeterW: coefficients.perimeterWPerK * heatingDeltaTK,
    infiltrationW: coefficients.infiltrationWPerK * heatingDeltaTK,
    skyW: 0,
    curtainApplied: coefficients.curtainApplied,
    wind: {
      windSpeedMPerS: coefficients.wind.windSpeedMPerS,
      tableWindSpeedMPerS: coefficients.wind.tableWindSpeedMPerS,
      uFactor: coefficients.wind.uFactor,
      infiltrationFactor: coefficients.wind.infiltrationFactor,
    },
    components,
  };
}

/**
 * The design loss with a clear night's radiation to the sky added as its own component (quantity:
 * floor area; coefficient: W per m² of floor). Shares become shares of watts, since the sky part
 * does not follow the inside–outside difference.
 */
export function withSkyLoss(breakdown: HeatLossBreakdown, floorAreaM2: number, skyW: number): HeatLossBreakdown {
  const totalW = breakdown.totalW + skyW;
  const sky: HeatLossComponent = {
    key: 'sky',
    label: 'Radiation to a clear night sky',
    quantity: floorAreaM2,
    quantityUnit: 'm2',
    coefficient: floorAreaM2 > 0 ? skyW / floorAreaM2 : 0,
    conductanceWPerK: breakdown.deltaTK > 0 ? skyW / breakdown.deltaTK : 0,
    watts: skyW,
    share: 0,
  };
  const components = [...breakdown.components, sky].map((component) => ({
    ...component,
    share: totalW > 0 ? component.watts / totalW : component.share,
  }));
  return { ...breakdown, totalW, skyW, components };
}
