import { EngineInputError, requireInRange } from '../errors';
import { referenceRow, type ReferenceData } from '../reference-data.types';
import {
  baseVariant,
  fuelAmount,
  prepareSeason,
  runVariant,
  type EstimateSeasonInput,
  type SeasonVariant,
} from '../estimate-season';
import { planCurtain, planPerimeterInsulation, planSealing, planSecondLayer } from './envelope-measures';
import { measureContext, measureDefaults, type PreparedMeasure } from './measure-plan';
import {
  MEASURE_KINDS,
  type Measure,
  type MeasureComparison,
  type MeasureKind,
  type MeasureResult,
} from './measure-types';
import { planFuelSwitch, planHeaterEfficiency, planLaterStart, planNightSetpointLower } from './operation-measures';
import { costDifference } from './fuel';
import { compareMeasureResults, payback, paybackText } from './payback';
import { SunCache } from './sun-hours';

// The measures' parts: their types (measure-types.ts), what each one changes in the house
// (envelope-measures.ts, operation-measures.ts) and the payback (payback.ts).
export * from './measure-types';
export * from './payback';

function prepareMeasure(measure: Measure, index: number, base: SeasonVariant, ref: ReferenceData): PreparedMeasure {
  const context = measureContext(index, base, ref);
  switch (measure.kind) {
    case 'second-poly-layer':
      return planSecondLayer(measure, context);
    case 'thermal-curtain':
      return planCurtain(measure, context);
    case 'perimeter-insulation':
      return planPerimeterInsulation(measure, context);
    case 'sealing':
      return planSealing(measure, context);
    case 'night-setpoint-lower':
      return planNightSetpointLower(measure, context);
    case 'later-start':
      return planLaterStart(measure, context);
    case 'heater-efficiency':
      return planHeaterEfficiency(measure, context);
    case 'fuel-switch':
      return planFuelSwitch(measure, context);
    default:
      throw new EngineInputError(`${context.field}.kind`, `unknown measure; known: ${MEASURE_KINDS.join(', ')}`);
  }
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
  return candidates.filter((measure, index) => prepareMeasure(measure, index, base, ref).notApplicableReason === null);
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
    const plan = prepareMeasure(measure, index, base, ref);
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
    const yearlyMoneySaved = costDifference(baseline.cost, season.cost);
    const fuelInputSavedKWh = baseline.fuelInputKWh - season.fuelInputKWh;
    const { status, years } = payback(costMoney, yearlyMoneySaved, true, fuelInputSavedKWh);
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
      fuelInputSavedKWh,
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
