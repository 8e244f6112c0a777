import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS } from '../vocabulary';
import type { SurfaceGroup } from '../vocabulary';
import type { HouseSpec } from '../house.types';
import { quantityToken } from '../vocabulary';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { civilDate, dayNumber, isoDate, parseIsoDate } from '../climate/calendar-days';
import {
  baseVariant,
  fuelAmount,
  prepareSeason,
  runVariant,
  type EstimateSeasonInput,
  type FuelAmount,
  type PreparedSeason,
  type SeasonVariant,
  type VariantOptions,
} from '../estimate-season';
import { fuelCost, fuelForHeat, validateFuelPrice, validateHeaterEfficiency, type FuelPrice } from './fuel';
import { coveringLightRow, type CoveringLightRow } from './house-heat-loss';
import { delayFirstHeatedPeriod } from './production-calendar';
import { SunCache } from './sun-hours';

/**
 * Energy measures compared by re-running the season for each variant of the house.
 * Savings are per season; with one heating season a year they are yearly savings. Simple
 * payback = cost ÷ yearly money saved; a measure that saves nothing never pays back.
 */

interface MeasureBase {
  /**
   * what the measure costs, entered by the user (same currency as the fuel price); undefined or
   * null when no cost has been entered yet (the payback then asks for one)
   */
  costMoney?: number | null;
  /** the user's own name for it */
  label?: string;
}

export type Measure =
  | (MeasureBase & { kind: 'second-poly-layer'; surfaces?: Array<'roof' | 'sidewalls'>; coveringId?: string })
  | (MeasureBase & { kind: 'thermal-curtain'; curtainId?: string })
  | (MeasureBase & { kind: 'perimeter-insulation' })
  | (MeasureBase & { kind: 'sealing'; airLeakageClassId?: string; airChangesPerHour?: number })
  | (MeasureBase & { kind: 'night-setpoint-lower'; lowerByK?: number })
  | (MeasureBase & { kind: 'later-start'; delayDays?: number })
  | (MeasureBase & { kind: 'heater-efficiency'; efficiency?: number })
  | (MeasureBase & { kind: 'fuel-switch'; fuel?: FuelPrice; efficiency?: number });

export type MeasureKind = Measure['kind'];

export const MEASURE_KINDS: readonly MeasureKind[] = [
  'second-poly-layer',
  'thermal-curtain',
  'perimeter-insulation',
  'sealing',
  'night-setpoint-lower',
  'later-start',
  'heater-efficiency',
  'fuel-switch',
];

/**
 * How a measure's payback reads:
 * - 'years': cost ÷ yearly money saved (paybackYears > 0)
 * - 'immediate': a cost of 0 entered and money saved (paybackYears = 0)
 * - 'enter-cost': money saved but no cost entered yet (paybackYears null)
 * - 'never': it saves no money (paybackYears null)
 * - 'not-applicable': the measure changes nothing for this house (paybackYears null)
 */
export type PaybackStatus = 'years' | 'immediate' | 'enter-cost' | 'never' | 'not-applicable';
export const PAYBACK_STATUSES: readonly PaybackStatus[] = [
  'years',
  'immediate',
  'enter-cost',
  'never',
  'not-applicable',
];

export interface LightChange {
  /** which surface's light the figures describe */
  surface: 'roof' | 'sidewalls';
  before: number;
  after: number;
  /** relative change of light reaching the crop, e.g. −0.11 for 11 % less */
  relativeChange: number;
  source: string;
}

export interface MeasureResult {
  /** position in the input list */
  index: number;
  kind: MeasureKind;
  label: string;
  /** what changed, in words; may hold {{kind:valueSI}} quantity tokens (see ../prose.ts) */
  description: string;
  /** null when no cost was entered */
  costMoney: number | null;
  /** false when the measure would change nothing for this house (already done, or no better) */
  applicable: boolean;
  /** why it does not apply, in plain words (may hold quantity tokens); null when it applies */
  notApplicableReason: string | null;
  /** the variant's season (the house as it is for a measure that does not apply) */
  season: FuelAmount & { fuelId: string; unitSi: string; unitUs: string };
  /** heat the house no longer needs, kWh per season (0 for heater or fuel changes) */
  heatSavedKWh: number;
  /** fuel energy no longer bought, kWh per season */
  fuelInputSavedKWh: number;
  /** fuel saved in the baseline fuel's units; null when the variant burns another fuel */
  fuelSavedSi: number | null;
  fuelSavedUs: number | null;
  /** money saved per season (= per year with one season a year) */
  yearlyMoneySaved: number;
  paybackStatus: PaybackStatus;
  /** cost ÷ yearly money saved when the status is 'years' or 'immediate' (0), else null */
  paybackYears: number | null;
  /** '2.4 years', 'immediately', 'enter a cost', 'never' or 'not applicable' */
  paybackText: string;
  /** change in light for measures that add a layer or a screen, else null */
  lightChange: LightChange | null;
  notes: string[];
}

export interface MeasureComparison {
  baseline: FuelAmount & { fuelId: string; unitSi: string; unitUs: string };
  /**
   * paying measures by payback, shortest first; then those without a cost; then those that never
   * pay back; measures that do not apply last
   */
  measures: MeasureResult[];
  notes: string[];
}

interface MeasureDefaultsRow extends ReferenceRow {
  targetCoveringId?: string;
  surfaces?: Array<'roof' | 'sidewalls'>;
  defaultCurtainId?: string;
  defaultAirLeakageClassId?: string;
  defaultLowerByK?: number;
  defaultDelayDays?: number;
  defaultEfficiency?: number;
  shadeFraction?: number;
}

interface CoveringURow extends ReferenceRow {
  uWPerM2K: number;
}
interface CurtainRow extends ReferenceRow {
  uReduction: number;
}
interface AirLeakageRow extends ReferenceRow {
  airChangesPerHour: number;
}

function measureDefaults(ref: ReferenceData, id: string): MeasureDefaultsRow {
  const row = referenceRow<MeasureDefaultsRow>(ref, 'measures', id);
  if (!row) throw new Error(`reference-data/measures.json has no row ${id}`);
  return row;
}

const percent = (fraction: number) => `${Math.round(fraction * 100)} %`;

interface PreparedMeasure {
  variant: SeasonVariant;
  options: VariantOptions;
  description: string;
  lightChange: LightChange | null;
  notes: string[];
  /** set when the measure changes nothing for this house */
  notApplicableReason: string | null;
}

function notApplicable(base: SeasonVariant, description: string, reason: string): PreparedMeasure {
  return { variant: base, options: {}, description, lightChange: null, notes: [], notApplicableReason: reason };
}

/** U of a house's covering on a surface: its override where given, else the reference value. */
function presentCoveringU(house: HouseSpec, surface: SurfaceGroup, ref: ReferenceData): number {
  const override = house.coveringUOverridesWPerM2K?.[surface];
  if (typeof override === 'number') return override;
  const row = referenceRow<CoveringURow>(ref, 'coverings', house.coverings[surface]);
  if (!row) throw new EngineInputError(`house.coverings.${surface}`, `unknown covering '${house.coverings[surface]}'`);
  return row.uWPerM2K;
}

/** Air changes per hour of the house as it is: the measured override, else its leakage class. */
function presentAirChangesPerHour(house: HouseSpec, ref: ReferenceData): number {
  if (typeof house.airChangesPerHourOverride === 'number') return house.airChangesPerHourOverride;
  const row = referenceRow<AirLeakageRow>(ref, 'air-leakage', house.airLeakageClassId);
  if (!row)
    throw new EngineInputError('house.airLeakageClassId', `unknown air-leakage class '${house.airLeakageClassId}'`);
  return row.airChangesPerHour;
}

function prepareMeasure(
  measure: Measure,
  index: number,
  prepared: PreparedSeason,
  base: SeasonVariant,
  ref: ReferenceData,
): PreparedMeasure {
  const field = `measures[${index}]`;
  const house = base.house;
  const withHouse = (changed: Partial<HouseSpec>): SeasonVariant => ({ ...base, house: { ...house, ...changed } });
  switch (measure.kind) {
    case 'second-poly-layer': {
      const defaults = measureDefaults(ref, 'second-poly-layer');
      const coveringId = measure.coveringId ?? defaults.targetCoveringId!;
      const surfaces = measure.surfaces ?? defaults.surfaces ?? ['roof', 'sidewalls'];
      if (
        !Array.isArray(surfaces) ||
        surfaces.length === 0 ||
        surfaces.some((s) => s !== 'roof' && s !== 'sidewalls')
      ) {
        throw new EngineInputError(`${field}.surfaces`, "surfaces must list 'roof' and/or 'sidewalls'");
      }
      const after = coveringLightRow(ref, coveringId, `${field}.coveringId`) as CoveringLightRow &
        Partial<CoveringURow>;
      if (typeof after.uWPerM2K !== 'number')
        throw new Error(`reference-data/coverings.json row ${coveringId} has no uWPerM2K`);
      const targetU = after.uWPerM2K;
      const afterLabel = after.label ?? after.id;
      // Only where the new covering loses less heat than the surface as it is.
      const improved = surfaces.filter((surface) => targetU < presentCoveringU(house, surface, ref));
      const skipped = surfaces.filter((surface) => !improved.includes(surface));
      if (improved.length === 0) {
        const present = surfaces
          .map((surface) => `${surface} ${quantityToken('uValue', presentCoveringU(house, surface, ref))}`)
          .join(', ');
        return notApplicable(
          base,
          `${surfaces.join(' and ')} covered with ${afterLabel}`,
          `The ${surfaces.join(' and ')} already ${surfaces.length === 1 ? 'loses' : 'lose'} as little heat as ${afterLabel} or less (U now: ${present}; ${afterLabel}: ${quantityToken('uValue', targetU)}).`,
        );
      }
      const coverings = { ...house.coverings };
      const overrides = { ...(house.coveringUOverridesWPerM2K ?? {}) };
      for (const surface of improved) {
        coverings[surface] = coveringId;
        delete overrides[surface];
      }
      const lightSurface = improved.includes('roof') ? 'roof' : 'sidewalls';
      const before = coveringLightRow(ref, house.coverings[lightSurface], `house.coverings.${lightSurface}`);
      const notes: string[] = [];
      if (improved.includes('roof'))
        notes.push(
          'Less light through the roof also means less free solar heat; the saving shown already accounts for it.',
        );
      if (skipped.length > 0)
        notes.push(`The ${skipped.join(' and ')} already loses as little heat or less, so it is left as it is.`);
      return {
        variant: withHouse({ coverings, coveringUOverridesWPerM2K: overrides }),
        options: {},
        description: `${improved.join(' and ')} covered with ${afterLabel}`,
        lightChange: {
          surface: lightSurface,
          before: before.lightTransmittance,
          after: after.lightTransmittance,
          relativeChange: after.lightTransmittance / before.lightTransmittance - 1,
          source: after.lightSource ?? after.source,
        },
        notes,
        notApplicableReason: null,
      };
    }
    case 'thermal-curtain': {
      const defaults = measureDefaults(ref, 'thermal-curtain');
      const curtainId = measure.curtainId ?? defaults.defaultCurtainId!;
      const curtain = referenceRow<CurtainRow>(ref, 'curtains', curtainId);
      if (!curtain) throw new EngineInputError(`${field}.curtainId`, `unknown curtain '${curtainId}'`);
      const description = `${curtain.label ?? curtainId} drawn from sunset to sunrise`;
      const present = house.curtainId ? referenceRow<CurtainRow>(ref, 'curtains', house.curtainId) : null;
      if (present && present.uReduction >= curtain.uReduction) {
        return notApplicable(
          base,
          description,
          present.id === curtain.id
            ? `The house already has this curtain (${present.label ?? present.id}).`
            : `The house already has a curtain (${present.label ?? present.id}) that saves as much as ${curtain.label ?? curtainId} or more (${percent(present.uReduction)} against ${percent(curtain.uReduction)} less loss through roof and sidewalls).`,
        );
      }
      const shade = measureDefaults(ref, 'curtain-stowed-shade');
      const roof = coveringLightRow(ref, house.coverings.roof, 'house.coverings.roof');
      // A curtain already there already shades by day; a replacement adds no daytime shade.
      const shadeFraction = present ? 0 : (shade.shadeFraction ?? 0);
      return {
        variant: withHouse({ curtainId }),
        options: {},
        description,
        lightChange: {
          surface: 'roof',
          before: roof.lightTransmittance,
          after: roof.lightTransmittance * (1 - shadeFraction),
          relativeChange: -shadeFraction,
          source: shade.source,
        },
        notes: present ? [`Replaces the existing curtain (${present.label ?? present.id}).`] : [],
        notApplicableReason: null,
      };
    }
    case 'perimeter-insulation':
      if (house.perimeterInsulated) {
        return notApplicable(base, 'perimeter and kneewall insulated', 'The perimeter is already insulated.');
      }
      return {
        variant: withHouse({ perimeterInsulated: true }),
        options: {},
        description: 'perimeter and kneewall insulated',
        lightChange: null,
        notes: [],
        notApplicableReason: null,
      };
    case 'sealing': {
      const defaults = measureDefaults(ref, 'sealing');
      const presentAch = presentAirChangesPerHour(house, ref);
      let targetAch: number;
      let description: string;
      let changed: Partial<HouseSpec>;
      if (measure.airChangesPerHour !== undefined && measure.airChangesPerHour !== null) {
        targetAch = requireInRange(
          `${field}.airChangesPerHour`,
          measure.airChangesPerHour,
          BOUNDS.airChangesPerHour.min,
          BOUNDS.airChangesPerHour.max,
        );
        description = `air leakage cut to ${targetAch} air changes per hour`;
        changed = { airChangesPerHourOverride: targetAch };
      } else {
        const classId = measure.airLeakageClassId ?? defaults.defaultAirLeakageClassId!;
        const row = referenceRow<AirLeakageRow>(ref, 'air-leakage', classId);
        if (!row) throw new EngineInputError(`${field}.airLeakageClassId`, `unknown air-leakage class '${classId}'`);
        targetAch = row.airChangesPerHour;
        description = `air leakage brought to '${row.label ?? classId}' (${targetAch} air changes per hour)`;
        changed = { airLeakageClassId: classId, airChangesPerHourOverride: null };
      }
      if (!(targetAch < presentAch)) {
        return notApplicable(
          base,
          description,
          `The house already leaks no more than that: ${presentAch} air changes per hour now${typeof house.airChangesPerHourOverride === 'number' ? ' (measured)' : ''}, ${targetAch} after sealing.`,
        );
      }
      return {
        variant: withHouse(changed),
        options: {},
        description,
        lightChange: null,
        notes: [],
        notApplicableReason: null,
      };
    }
    case 'night-setpoint-lower': {
      const defaults = measureDefaults(ref, 'night-setpoint-lower');
      const lowerByK = requireInRange(`${field}.lowerByK`, measure.lowerByK ?? defaults.defaultLowerByK, 0, 15);
      const description = `night setpoint lowered by ${quantityToken('temperatureDifference', lowerByK)}`;
      if (lowerByK === 0) return notApplicable(base, description, 'Lowering the setpoint by nothing changes nothing.');
      return {
        variant: base,
        options: { nightSetpointLowerK: lowerByK },
        description,
        lightChange: null,
        notes: ['Check that the crop tolerates the cooler nights; growth may slow.'],
        notApplicableReason: null,
      };
    }
    case 'later-start': {
      const defaults = measureDefaults(ref, 'later-start');
      const delayDays = requireInRange(`${field}.delayDays`, measure.delayDays ?? defaults.defaultDelayDays, 1, 180);
      if (!Number.isInteger(delayDays)) throw new EngineInputError(`${field}.delayDays`, 'delay must be whole days');
      const start = parseIsoDate(base.season.startDate)!;
      if (base.calendar && base.calendar.length > 0) {
        const description = `first heated period starts ${delayDays} days later`;
        if (!base.calendar.some((period) => period.mode === 'heated')) {
          return notApplicable(base, description, 'The production calendar has no heated period to start later.');
        }
        return {
          variant: { ...base, calendar: delayFirstHeatedPeriod(base.calendar, start, delayDays) },
          options: {},
          description,
          lightChange: null,
          notes: [],
          notApplicableReason: null,
        };
      }
      const end = parseIsoDate(base.season.endDate)!;
      const shifted = dayNumber(start.year, start.month, start.day) + delayDays;
      const description = `heating starts ${delayDays} days later`;
      if (shifted > dayNumber(end.year, end.month, end.day)) {
        return notApplicable(base, description, 'The delay is longer than the season, so nothing would be heated.');
      }
      return {
        variant: { ...base, season: { ...base.season, startDate: isoDate(civilDate(shifted)) } },
        options: {},
        description,
        lightChange: null,
        notes: [],
        notApplicableReason: null,
      };
    }
    case 'heater-efficiency': {
      const defaults = measureDefaults(ref, 'heater-efficiency');
      const efficiency = validateHeaterEfficiency(
        measure.efficiency ?? defaults.defaultEfficiency!,
        `${field}.efficiency`,
      );
      const description = `heater efficiency ${percent(base.heaterEfficiency)} → ${percent(efficiency)}`;
      if (!(efficiency > base.heaterEfficiency)) {
        return notApplicable(
          base,
          description,
          `The heaters are already ${percent(base.heaterEfficiency)} efficient; ${percent(efficiency)} is no better.`,
        );
      }
      return {
        // Replacement units are taken to give the same output, so the heater limit stays.
        variant: { ...base, heaterEfficiency: efficiency },
        options: {},
        description,
        lightChange: null,
        notes: [],
        notApplicableReason: null,
      };
    }
    case 'fuel-switch': {
      const fuel = measure.fuel;
      if (!fuel || typeof fuel !== 'object' || fuel.pricePerUnit === undefined || fuel.pricePerUnit === null) {
        return notApplicable(base, 'another fuel', 'Give the other fuel and its price to compare it.');
      }
      const row = validateFuelPrice(fuel, ref, `${field}.fuel`);
      const efficiency =
        measure.efficiency === undefined || measure.efficiency === null
          ? base.heaterEfficiency
          : validateHeaterEfficiency(measure.efficiency, `${field}.efficiency`);
      const description = `${base.fuelRow.label} → ${row.label} at ${fuel.pricePerUnit} per ${fuel.priceUnit === 'si' ? row.unitSi : row.unitUs}`;
      const basePrice = pricePerFuelKWh(base.fuel, base.fuelRow);
      const samePrice =
        row.id === base.fuelRow.id &&
        Math.abs(pricePerFuelKWh(fuel, row) - basePrice) <= 1e-9 * Math.max(1, basePrice) &&
        efficiency <= base.heaterEfficiency;
      if (samePrice)
        return notApplicable(base, description, 'That is the fuel, price and efficiency the house already has.');
      return {
        variant: { ...base, fuel, fuelRow: row, heaterEfficiency: efficiency },
        options: {},
        description,
        lightChange: null,
        notes: [],
        notApplicableReason: null,
      };
    }
    default:
      throw new EngineInputError(`${field}.kind`, `unknown measure; known: ${MEASURE_KINDS.join(', ')}`);
  }
}

/** Money per kWh of fuel burnt, to tell whether two prices of one fuel are the same. */
function pricePerFuelKWh(price: FuelPrice, row: SeasonVariant['fuelRow']): number {
  return fuelCost(fuelForHeat(1, row, 1), price);
}

export function paybackText(
  paybackYears: number | null,
  status: PaybackStatus = paybackYears === null ? 'never' : 'years',
): string {
  switch (status) {
    case 'immediate':
      return 'immediately';
    case 'enter-cost':
      return 'enter a cost';
    case 'never':
      return 'never';
    case 'not-applicable':
      return 'not applicable';
    default:
      return paybackYears === null
        ? 'never'
        : `${paybackYears < 10 ? paybackYears.toFixed(1) : Math.round(paybackYears)} years`;
  }
}

/** Status and years of a simple payback: cost ÷ yearly money saved. */
export function payback(
  costMoney: number | null,
  yearlyMoneySaved: number,
  applicable: boolean,
): { status: PaybackStatus; years: number | null } {
  if (!applicable) return { status: 'not-applicable', years: null };
  if (!(yearlyMoneySaved > 0)) return { status: 'never', years: null };
  if (costMoney === null) return { status: 'enter-cost', years: null };
  if (costMoney === 0) return { status: 'immediate', years: 0 };
  return { status: 'years', years: costMoney / yearlyMoneySaved };
}

const STATUS_ORDER: Record<PaybackStatus, number> = {
  immediate: 0,
  years: 0,
  'enter-cost': 1,
  never: 2,
  'not-applicable': 3,
};

/** Years ascending (immediate first), then without a cost, then never, then not applicable; ties by larger saving. */
export function compareMeasureResults(a: MeasureResult, b: MeasureResult): number {
  const byStatus = STATUS_ORDER[a.paybackStatus] - STATUS_ORDER[b.paybackStatus];
  if (byStatus !== 0) return byStatus;
  if (a.paybackStatus === 'not-applicable') return a.index - b.index;
  const byYears = (a.paybackYears ?? 0) - (b.paybackYears ?? 0);
  return byYears || b.yearlyMoneySaved - a.yearlyMoneySaved || a.index - b.index;
}

/**
 * The measures compared when the user lists none: every kind with a default in
 * reference-data/measures.json, without a cost, kept only where it applies to this house.
 * A fuel switch needs another fuel's price, so it is never a default.
 */
export function defaultMeasures(
  input: EstimateSeasonInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): Measure[] {
  const candidates: Measure[] = [];
  const kinds: Array<Exclude<MeasureKind, 'fuel-switch'>> = [
    'second-poly-layer',
    'thermal-curtain',
    'perimeter-insulation',
    'sealing',
    'night-setpoint-lower',
    'later-start',
    'heater-efficiency',
  ];
  for (const kind of kinds) if (referenceRow(ref, 'measures', kind)) candidates.push({ kind } as Measure);
  const prepared = prepareSeason(input, ref, sunCache);
  const base = baseVariant(prepared);
  return candidates.filter(
    (measure, index) => prepareMeasure(measure, index, prepared, base, ref).notApplicableReason === null,
  );
}

/** Re-runs the season for each measure alone and ranks them by simple payback. */
export function compareMeasures(
  input: EstimateSeasonInput,
  measures: Measure[],
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): MeasureComparison {
  if (!Array.isArray(measures)) throw new EngineInputError('measures', 'measures must be a list');
  if (measures.length > 30) throw new EngineInputError('measures', 'compare at most 30 measures at once');
  const prepared = prepareSeason(input, ref, sunCache);
  const base = baseVariant(prepared);
  const baseRun = runVariant(prepared, base, ref);
  const baseline = { ...fuelAmount(baseRun.result.totalHeatWh / 1000, base), ...fuelUnits(base) };

  const results = measures.map((measure, index): MeasureResult => {
    if (!measure || typeof measure !== 'object')
      throw new EngineInputError(`measures[${index}]`, 'a measure is required');
    const costMoney =
      measure.costMoney === undefined || measure.costMoney === null
        ? null
        : requireInRange(`measures[${index}].costMoney`, measure.costMoney, 0, 1e9);
    const plan = prepareMeasure(measure, index, prepared, base, ref);
    const applicable = plan.notApplicableReason === null;
    const label = measure.label ?? measureDefaults(ref, measure.kind).label ?? measure.kind;
    if (!applicable) {
      return {
        index,
        kind: measure.kind,
        label,
        description: plan.description,
        costMoney,
        applicable,
        notApplicableReason: plan.notApplicableReason,
        season: baseline,
        heatSavedKWh: 0,
        fuelInputSavedKWh: 0,
        fuelSavedSi: 0,
        fuelSavedUs: 0,
        yearlyMoneySaved: 0,
        paybackStatus: 'not-applicable',
        paybackYears: null,
        paybackText: paybackText(null, 'not-applicable'),
        lightChange: null,
        notes: [],
      };
    }
    const sameHouse = plan.variant.house === base.house;
    const run = runVariant(prepared, plan.variant, ref, {
      ...plan.options,
      thermal: sameHouse ? baseRun.thermal : undefined,
    });
    const season = { ...fuelAmount(run.result.totalHeatWh / 1000, plan.variant), ...fuelUnits(plan.variant) };
    const sameFuel = plan.variant.fuelRow.id === base.fuelRow.id;
    const yearlyMoneySaved = baseline.cost - season.cost;
    const { status, years } = payback(costMoney, yearlyMoneySaved, true);
    return {
      index,
      kind: measure.kind,
      label,
      description: plan.description,
      costMoney,
      applicable,
      notApplicableReason: null,
      season,
      heatSavedKWh: baseline.energyKWh - season.energyKWh,
      fuelInputSavedKWh: baseline.fuelInputKWh - season.fuelInputKWh,
      fuelSavedSi: sameFuel ? baseline.fuelQuantitySi - season.fuelQuantitySi : null,
      fuelSavedUs: sameFuel ? baseline.fuelQuantityUs - season.fuelQuantityUs : null,
      yearlyMoneySaved,
      paybackStatus: status,
      paybackYears: years,
      paybackText: paybackText(years, status),
      lightChange: plan.lightChange,
      notes: plan.notes,
    };
  });

  results.sort(compareMeasureResults);

  const notes = [
    'Each measure is compared alone against the house as it is; savings of several measures together are less than the sum.',
    'Savings are per season; with one heating season a year they are yearly savings.',
    'Simple payback = cost ÷ yearly money saved, ignoring interest, maintenance and price changes.',
  ];
  if (baseRun.result.unmetHeatWh > 0) {
    notes.push(
      'The heaters cannot hold the setpoint in the coldest hours; savings count only heat the heaters actually deliver, and more efficient heaters are taken to give the same output.',
    );
  }
  return { baseline, measures: results, notes };
}

function fuelUnits(variant: SeasonVariant): { fuelId: string; unitSi: string; unitUs: string } {
  return { fuelId: variant.fuelRow.id, unitSi: variant.fuelRow.unitSi, unitUs: variant.fuelRow.unitUs };
}
