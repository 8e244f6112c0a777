import { loadReferenceData } from '../../reference-data/load-reference-data';
import { demoSeasonInput } from './demo-season';
import { compareMeasures, paybackText, type Measure } from './measures';
import { SunCache } from './sun-hours';
import { proseToPlainSi } from '../prose';

const ref = loadReferenceData();
const sunCache = new SunCache();

const singlePolyHouse = {
  ...demoSeasonInput().house,
  coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'polycarbonate-twin-8mm' },
  airLeakageClassId: 'new-film-single',
};
const input = demoSeasonInput({ house: singlePolyHouse, season: { startDate: '2026-10-01', endDate: '2027-04-30' } });

describe('measure comparison', () => {
  const measures: Measure[] = [
    { kind: 'second-poly-layer', costMoney: 3000 },
    { kind: 'thermal-curtain', costMoney: 12_000 },
    { kind: 'perimeter-insulation', costMoney: 800 },
    { kind: 'night-setpoint-lower', costMoney: 0, lowerByK: 2 },
    { kind: 'later-start', costMoney: 0, delayDays: 14 },
    { kind: 'heater-efficiency', costMoney: 5000, efficiency: 0.92 },
    { kind: 'fuel-switch', costMoney: 2000, fuel: { fuelId: 'natural-gas', pricePerUnit: 1.2, priceUnit: 'us' } },
    { kind: 'sealing', costMoney: 300 },
  ];
  const comparison = compareMeasures(input, measures, ref, sunCache);
  const byKind = new Map(comparison.measures.map((result) => [result.kind, result]));

  it('saves heat with every envelope and setpoint measure', () => {
    for (const kind of ['second-poly-layer', 'thermal-curtain', 'perimeter-insulation', 'night-setpoint-lower', 'later-start'] as const) {
      expect(byKind.get(kind)!.heatSavedKWh).toBeGreaterThan(0);
      expect(byKind.get(kind)!.fuelSavedUs).toBeGreaterThan(0);
    }
  });

  it('describes each measure with its quantities as tokens (the reader picks the units)', () => {
    const lower = byKind.get('night-setpoint-lower')!;
    expect(lower.description).toBe('night setpoint lowered by {{temperatureDifference:2}}');
    expect(proseToPlainSi(lower.description)).toBe('night setpoint lowered by 2.0 K');
    for (const result of comparison.measures) {
      expect(result.description).not.toMatch(/\d\s*(K|°C|kW|m²)\b/);
    }
  });

  it('computes simple payback as cost ÷ yearly money saved and sorts by it', () => {
    for (const result of comparison.measures) {
      if (result.paybackYears !== null) expect(result.paybackYears).toBeCloseTo(result.costMoney / result.yearlyMoneySaved, 9);
    }
    const paybacks = comparison.measures.map((result) => result.paybackYears).filter((value): value is number => value !== null);
    expect(paybacks).toEqual([...paybacks].sort((a, b) => a - b));
    expect(byKind.get('night-setpoint-lower')!.paybackYears).toBe(0);
  });

  it('a more efficient heater saves fuel, not heat: saving = baseline × (1 − η_old / η_new)', () => {
    const heater = byKind.get('heater-efficiency')!;
    expect(heater.heatSavedKWh).toBeCloseTo(0, 6);
    expect(heater.yearlyMoneySaved).toBeCloseTo(comparison.baseline.cost * (1 - 0.8 / 0.92), 6);
  });

  it('reports another fuel’s quantity in its own units and no fuel saving in the old units', () => {
    const gas = byKind.get('fuel-switch')!;
    expect(gas.season.fuelId).toBe('natural-gas');
    expect(gas.season.unitUs).toBe('therm');
    expect(gas.fuelSavedUs).toBeNull();
    expect(gas.season.cost).toBeCloseTo(gas.season.fuelQuantityUs * 1.2, 6);
  });

  it('shows the light lost to a second layer and to a stowed curtain', () => {
    const layer = byKind.get('second-poly-layer')!.lightChange!;
    expect(layer.before).toBe(0.88);
    expect(layer.after).toBe(0.78);
    expect(layer.relativeChange).toBeCloseTo(0.78 / 0.88 - 1, 9);
    expect(byKind.get('thermal-curtain')!.lightChange!.relativeChange).toBeLessThan(0);
    expect(byKind.get('perimeter-insulation')!.lightChange).toBeNull();
  });

  it('says "never" for a measure that saves nothing and puts it last', () => {
    const already = compareMeasures(
      { ...input, house: { ...singlePolyHouse, perimeterInsulated: true } },
      [{ kind: 'perimeter-insulation', costMoney: 800 }, { kind: 'night-setpoint-lower', costMoney: 100 }],
      ref,
      sunCache,
    );
    expect(already.measures[0].kind).toBe('night-setpoint-lower');
    expect(already.measures[1]).toMatchObject({ kind: 'perimeter-insulation', paybackYears: null, paybackText: 'never' });
    expect(paybackText(2.345)).toBe('2.3 years');
  });

  it('a later start without a calendar shortens the season', () => {
    const later = byKind.get('later-start')!;
    expect(later.description).toMatch(/14 days later/);
    expect(later.season.energyKWh).toBeLessThan(comparison.baseline.energyKWh);
  });
});
