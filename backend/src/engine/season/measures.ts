import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS } from '../bounds';
import type { HouseSpec } from '../house.types';
import { quantityToken } from '../prose';
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
import { validateFuelPrice, validateHeaterEfficiency, type FuelPrice } from './fuel';
import { coveringLightRow } from './house-heat-loss';
import { delayFirstHeatedPeriod } from './production-calendar';
import { SunCache } from './sun-hours';

/**
 * Energy measures compared by re-running the season for each variant of the house.
 * Savings are per season; with one heating season a year they are yearly savings. Simple
 * payback = cost ÷ yearly money saved; a measure that saves nothing never pays back.
 */

interface MeasureBase {
  /** what the measure costs, entered by the user (same currency as the fuel price) */
  costMoney: number;
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
  | (MeasureBase & { kind: 'fuel-switch'; fuel: FuelPrice; efficiency?: number });

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
  costMoney: number;
  /** the variant's season */
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
  /** cost ÷ yearly money saved; null when the measure saves nothing (never pays back) */
  paybackYears: number | null;
  /** '2.4 years' or 'never' */
  paybackText: string;
  /** change in light for measures that add a layer or a screen, else null */
  lightChange: LightChange | null;
  notes: string[];
}

export interface MeasureComparison {
  baseline: FuelAmount & { fuelId: string; unitSi: string; unitUs: string };
  /** sorted by payback, shortest first; measures that never pay back last */
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

function measureDefaults(ref: ReferenceData, id: string): MeasureDefaultsRow {
  const row = referenceRow<MeasureDefaultsRow>(ref, 'measures', id);
  if (!row) throw new Error(`reference-data/measures.json has no row ${id}`);
  return row;
}

interface PreparedMeasure {
  variant: SeasonVariant;
  options: VariantOptions;
  description: string;
  lightChange: LightChange | null;
  notes: string[];
}

function prepareMeasure(measure: Measure, index: number, prepared: PreparedSeason, base: SeasonVariant, ref: ReferenceData): PreparedMeasure {
  const field = `measures[${index}]`;
  const house = base.house;
  const withHouse = (changed: Partial<HouseSpec>): SeasonVariant => ({ ...base, house: { ...house, ...changed } });
  switch (measure.kind) {
    case 'second-poly-layer': {
      const defaults = measureDefaults(ref, 'second-poly-layer');
      const coveringId = measure.coveringId ?? defaults.targetCoveringId!;
      const surfaces = measure.surfaces ?? defaults.surfaces ?? ['roof', 'sidewalls'];
      if (!Array.isArray(surfaces) || surfaces.length === 0 || surfaces.some((s) => s !== 'roof' && s !== 'sidewalls')) {
        throw new EngineInputError(`${field}.surfaces`, "surfaces must list 'roof' and/or 'sidewalls'");
      }
      const after = coveringLightRow(ref, coveringId, `${field}.coveringId`);
      const coverings = { ...house.coverings };
      const overrides = { ...(house.coveringUOverridesWPerM2K ?? {}) };
      for (const surface of surfaces) {
        coverings[surface] = coveringId;
        delete overrides[surface];
      }
      const lightSurface = surfaces.includes('roof') ? 'roof' : 'sidewalls';
      const before = coveringLightRow(ref, house.coverings[lightSurface], `house.coverings.${lightSurface}`);
      return {
        variant: withHouse({ coverings, coveringUOverridesWPerM2K: overrides }),
        options: {},
        description: `${surfaces.join(' and ')} covered with ${after.label ?? after.id}`,
        lightChange: {
          surface: lightSurface,
          before: before.lightTransmittance,
          after: after.lightTransmittance,
          relativeChange: after.lightTransmittance / before.lightTransmittance - 1,
          source: after.lightSource ?? after.source,
        },
        notes: surfaces.includes('roof')
          ? ['Less light through the roof also means less free solar heat; the saving shown already accounts for it.']
          : [],
      };
    }
    case 'thermal-curtain': {
      const defaults = measureDefaults(ref, 'thermal-curtain');
      const curtainId = measure.curtainId ?? defaults.defaultCurtainId!;
      const curtain = referenceRow(ref, 'curtains', curtainId);
      if (!curtain) throw new EngineInputError(`${field}.curtainId`, `unknown curtain '${curtainId}'`);
      const shade = measureDefaults(ref, 'curtain-stowed-shade');
      const roof = coveringLightRow(ref, house.coverings.roof, 'house.coverings.roof');
      const shadeFraction = shade.shadeFraction ?? 0;
      return {
        variant: withHouse({ curtainId }),
        options: {},
        description: `${curtain.label ?? curtainId} drawn from sunset to sunrise`,
        lightChange: {
          surface: 'roof',
          before: roof.lightTransmittance,
          after: roof.lightTransmittance * (1 - shadeFraction),
          relativeChange: -shadeFraction,
          source: shade.source,
        },
        notes: house.curtainId ? [`Replaces the existing curtain (${house.curtainId}).`] : [],
      };
    }
    case 'perimeter-insulation':
      return {
        variant: withHouse({ perimeterInsulated: true }),
        options: {},
        description: 'perimeter and kneewall insulated',
        lightChange: null,
        notes: house.perimeterInsulated ? ['The perimeter is already insulated, so nothing changes.'] : [],
      };
    case 'sealing': {
      const defaults = measureDefaults(ref, 'sealing');
      if (measure.airChangesPerHour !== undefined) {
        const ach = requireInRange(
          `${field}.airChangesPerHour`,
          measure.airChangesPerHour,
          BOUNDS.airChangesPerHour.min,
          BOUNDS.airChangesPerHour.max,
        );
        return {
          variant: withHouse({ airChangesPerHourOverride: ach }),
          options: {},
          description: `air leakage cut to ${ach} air changes per hour`,
          lightChange: null,
          notes: [],
        };
      }
      const classId = measure.airLeakageClassId ?? defaults.defaultAirLeakageClassId!;
      const row = referenceRow(ref, 'air-leakage', classId);
      if (!row) throw new EngineInputError(`${field}.airLeakageClassId`, `unknown air-leakage class '${classId}'`);
      return {
        variant: withHouse({ airLeakageClassId: classId, airChangesPerHourOverride: null }),
        options: {},
        description: `air leakage brought to '${row.label ?? classId}'`,
        lightChange: null,
        notes: [],
      };
    }
    case 'night-setpoint-lower': {
      const defaults = measureDefaults(ref, 'night-setpoint-lower');
      const lowerByK = requireInRange(`${field}.lowerByK`, measure.lowerByK ?? defaults.defaultLowerByK, 0.1, 15);
      return {
        variant: base,
        options: { nightSetpointLowerK: lowerByK },
        description: `night setpoint lowered by ${quantityToken('temperatureDifference', lowerByK)}`,
        lightChange: null,
        notes: ['Check that the crop tolerates the cooler nights; growth may slow.'],
      };
    }
    case 'later-start': {
      const defaults = measureDefaults(ref, 'later-start');
      const delayDays = requireInRange(`${field}.delayDays`, measure.delayDays ?? defaults.defaultDelayDays, 1, 180);
      if (!Number.isInteger(delayDays)) throw new EngineInputError(`${field}.delayDays`, 'delay must be whole days');
      if (base.calendar && base.calendar.length > 0) {
        const start = parseIsoDate(base.season.startDate)!;
        return {
          variant: { ...base, calendar: delayFirstHeatedPeriod(base.calendar, start, delayDays) },
          options: {},
          description: `first heated period starts ${delayDays} days later`,
          lightChange: null,
          notes: [],
        };
      }
      const start = parseIsoDate(base.season.startDate)!;
      const end = parseIsoDate(base.season.endDate)!;
      const shifted = dayNumber(start.year, start.month, start.day) + delayDays;
      if (shifted > dayNumber(end.year, end.month, end.day)) {
        throw new EngineInputError(`${field}.delayDays`, 'the delay is longer than the season');
      }
      return {
        variant: { ...base, season: { ...base.season, startDate: isoDate(civilDate(shifted)) } },
        options: {},
        description: `heating starts ${delayDays} days later`,
        lightChange: null,
        notes: [],
      };
    }
    case 'heater-efficiency': {
      const defaults = measureDefaults(ref, 'heater-efficiency');
      const efficiency = validateHeaterEfficiency(measure.efficiency ?? defaults.defaultEfficiency!, `${field}.efficiency`);
      return {
        variant: { ...base, heaterEfficiency: efficiency },
        options: {},
        description: `heater efficiency ${Math.round(base.heaterEfficiency * 100)} % → ${Math.round(efficiency * 100)} %`,
        lightChange: null,
        notes: [],
      };
    }
    case 'fuel-switch': {
      const row = validateFuelPrice(measure.fuel, ref, `${field}.fuel`);
      const efficiency =
        measure.efficiency === undefined
          ? base.heaterEfficiency
          : validateHeaterEfficiency(measure.efficiency, `${field}.efficiency`);
      return {
        variant: { ...base, fuel: measure.fuel, fuelRow: row, heaterEfficiency: efficiency },
        options: {},
        description: `${base.fuelRow.label} → ${row.label} at ${measure.fuel.pricePerUnit} per ${measure.fuel.priceUnit === 'si' ? row.unitSi : row.unitUs}`,
        lightChange: null,
        notes: [],
      };
    }
    default:
      throw new EngineInputError(`${field}.kind`, `unknown measure; known: ${MEASURE_KINDS.join(', ')}`);
  }
}

export function paybackText(paybackYears: number | null): string {
  if (paybackYears === null) return 'never';
  return `${paybackYears < 10 ? paybackYears.toFixed(1) : Math.round(paybackYears)} years`;
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
    if (!measure || typeof measure !== 'object') throw new EngineInputError(`measures[${index}]`, 'a measure is required');
    const costMoney = requireInRange(`measures[${index}].costMoney`, measure.costMoney, 0, 1e9);
    const plan = prepareMeasure(measure, index, prepared, base, ref);
    const sameHouse = plan.variant.house === base.house;
    const run = runVariant(prepared, plan.variant, ref, { ...plan.options, thermal: sameHouse ? baseRun.thermal : undefined });
    const season = { ...fuelAmount(run.result.totalHeatWh / 1000, plan.variant), ...fuelUnits(plan.variant) };
    const sameFuel = plan.variant.fuelRow.id === base.fuelRow.id;
    const yearlyMoneySaved = baseline.cost - season.cost;
    const paybackYears = yearlyMoneySaved > 0 ? costMoney / yearlyMoneySaved : null;
    return {
      index,
      kind: measure.kind,
      label: measure.label ?? measureDefaults(ref, measure.kind).label ?? measure.kind,
      description: plan.description,
      costMoney,
      season,
      heatSavedKWh: baseline.energyKWh - season.energyKWh,
      fuelInputSavedKWh: baseline.fuelInputKWh - season.fuelInputKWh,
      fuelSavedSi: sameFuel ? baseline.fuelQuantitySi - season.fuelQuantitySi : null,
      fuelSavedUs: sameFuel ? baseline.fuelQuantityUs - season.fuelQuantityUs : null,
      yearlyMoneySaved,
      paybackYears,
      paybackText: paybackText(paybackYears),
      lightChange: plan.lightChange,
      notes: plan.notes,
    };
  });

  results.sort((a, b) => {
    if (a.paybackYears === null && b.paybackYears === null) return b.yearlyMoneySaved - a.yearlyMoneySaved;
    if (a.paybackYears === null) return 1;
    if (b.paybackYears === null) return -1;
    return a.paybackYears - b.paybackYears;
  });

  return {
    baseline,
    measures: results,
    notes: [
      'Each measure is compared alone against the house as it is; savings of several measures together are less than the sum.',
      'Savings are per season; with one heating season a year they are yearly savings.',
      'Simple payback = cost ÷ yearly money saved, ignoring interest, maintenance and price changes.',
    ],
  };
}

function fuelUnits(variant: SeasonVariant): { fuelId: string; unitSi: string; unitUs: string } {
  return { fuelId: variant.fuelRow.id, unitSi: variant.fuelRow.unitSi, unitUs: variant.fuelRow.unitUs };
}
