import { estimateCooling } from '../estimate-cooling';
import { estimateHeating } from '../estimate-heating';
import { estimateSeason } from '../estimate-season';
import { exampleDoublePolyGableHouse } from '../heating/example-houses';
import { SunCache } from '../season/sun-hours';
import { loadReferenceData } from '../testing/reference-data';
import { demoSideBySideColumn, demoSideBySideInput } from './demo-side-by-side';
import { applyHousePatch } from './house-patch';
import { compareSideBySide, paybackOf } from './side-by-side';

const ref = loadReferenceData();
const singlePoly = exampleDoublePolyGableHouse({
  coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'polycarbonate-twin-8mm' },
});

describe('compareSideBySide', () => {
  const doublePoly = applyHousePatch(singlePoly, {
    coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated' },
  });
  const houseInput = demoSideBySideColumn(singlePoly);
  const altInput = demoSideBySideColumn(doublePoly, 4200);
  const result = compareSideBySide(houseInput, [altInput], ref, new SunCache());

  it('gives each column exactly the figures of the single estimates', () => {
    expect(result.house.heating).toEqual(estimateHeating(houseInput.heating, ref));
    expect(result.house.cooling).toEqual(estimateCooling(houseInput.cooling, ref));
    expect(result.house.season).toEqual(estimateSeason(houseInput.season, ref));
    const alt = result.alternatives[0];
    if (!alt.ok) throw new Error(alt.message);
    expect(alt.column.heating).toEqual(estimateHeating(altInput.heating, ref));
    expect(alt.column.season).toEqual(estimateSeason(altInput.season, ref));
  });

  it('saves fuel with double poly, loses light, and pays back as cost ÷ saving', () => {
    const alt = result.alternatives[0];
    if (!alt.ok) throw new Error(alt.message);
    const saving = result.house.season.total.cost! - alt.column.season.total.cost!;
    expect(saving).toBeGreaterThan(0);
    expect(alt.column.versusHouse?.yearlySaving).toBe(saving);
    expect(alt.column.versusHouse?.paybackStatus).toBe('years');
    expect(alt.column.versusHouse?.paybackYears).toBeCloseTo(4200 / saving, 10);
    expect(alt.column.versusHouse?.designHeatLossChangeW).toBeLessThan(0);
    // light: the reference transmittances of the two coverings (reference-data/coverings.json)
    const roofSingle = result.house.light[0].lightTransmittance;
    const roofDouble = alt.column.light[0].lightTransmittance;
    expect(roofDouble).toBeLessThan(roofSingle);
    expect(alt.column.light[0].changeFromHouse).toBeCloseTo(roofDouble / roofSingle - 1, 12);
    expect(alt.column.light[2].changeFromHouse).toBe(0);
    expect(result.house.versusHouse).toBeNull();
  });

  it('returns an alternative the engine cannot compute with in its place, naming the field', () => {
    const broken = demoSideBySideColumn(applyHousePatch(singlePoly, { ridgeHeightM: 1 }));
    const { alternatives } = compareSideBySide(houseInput, [broken, altInput], ref);
    expect(alternatives[0]).toMatchObject({ ok: false, field: expect.stringMatching(/ridgeHeightM/) });
    expect(alternatives[1].ok).toBe(true);
  });

  it('runs the four demo alternatives', () => {
    const demo = demoSideBySideInput(singlePoly);
    const out = compareSideBySide(demo.house, demo.alternatives, ref);
    expect(out.alternatives.every((a) => a.ok)).toBe(true);
  });
});

describe('paybackOf', () => {
  it('is cost ÷ saving, and says when it cannot be', () => {
    expect(paybackOf(1000, 250)).toEqual({ paybackYears: 4, paybackStatus: 'years' });
    expect(paybackOf(null, 250)).toEqual({ paybackYears: null, paybackStatus: 'enter-cost' });
    expect(paybackOf(1000, -5)).toEqual({ paybackYears: null, paybackStatus: 'never' });
    expect(paybackOf(0, 10)).toEqual({ paybackYears: null, paybackStatus: 'immediate' });
  });
});
