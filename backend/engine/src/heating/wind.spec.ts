import fc from 'fast-check';
import { computeHouseGeometry } from '../geometry/house-geometry';
import { loadReferenceData } from '../testing/reference-data';
import { BOUNDS } from '../vocabulary';
import { estimateHeating } from '../estimate-heating';
import { exampleDoublePolyGableHouse } from './example-houses';
import { designHeatLoss, heatLossCoefficients } from './heat-loss';
import { windCorrection } from './wind';

const ref = loadReferenceData();

function lossW(windSpeedMPerS: number | undefined, coverings = exampleDoublePolyGableHouse().coverings): number {
  const house = exampleDoublePolyGableHouse({ coverings });
  const geometry = computeHouseGeometry(house);
  const coefficients = heatLossCoefficients(house, geometry, ref, {
    curtainClosed: false,
    airDensityKgPerM3: 1.2,
    windSpeedMPerS,
  });
  return designHeatLoss(coefficients, geometry, 15, -10).totalW;
}

describe('wind on the design night', () => {
  it('scales U by the measured slope (Mihara & Hayashi 1979) relative to the tables’ 6.7 m/s (hand arithmetic)', () => {
    // single film k = 4.87 + 0.54 w: at 12 m/s (4.87 + 6.48) / (4.87 + 3.618) = 11.35 / 8.488 = 1.337182
    // double       k = 3.15 + 0.17 w: at 12 m/s (3.15 + 2.04) / (3.15 + 1.139) = 5.19 / 4.289 = 1.210072
    // air leakage (common practice): 0.5 + 0.5 × 12 / 6.7 = 1.395522
    const single = windCorrection(
      exampleDoublePolyGableHouse({
        coverings: { roof: 'poly-single', sidewalls: 'glass-single', endwalls: 'foam-board-50mm' },
      }),
      ref,
      12,
    );
    expect(single.uFactor.roof).toBeCloseTo(11.35 / 8.488, 6);
    expect(single.uFactor.sidewalls).toBeCloseTo((4.41 + 4.8) / (4.41 + 2.68), 6); // glass 4.41 + 0.40 w
    expect(single.uFactor.endwalls).toBe(1); // opaque board: no correction
    expect(single.infiltrationFactor).toBeCloseTo(0.5 + (0.5 * 12) / 6.7, 9);
    const double = windCorrection(exampleDoublePolyGableHouse(), ref, 12);
    expect(double.uFactor.roof).toBeCloseTo(5.19 / 4.289, 6);
  });

  it('at the tables’ own wind (the default) nothing changes', () => {
    expect(lossW(undefined)).toBeCloseTo(lossW(6.7), 6);
    const atTable = windCorrection(exampleDoublePolyGableHouse(), ref);
    expect(atTable.uFactor.roof).toBe(1);
    expect(atTable.infiltrationFactor).toBeCloseTo(1, 12);
  });

  it('shows the wind in the breakdown and its rows in the assumptions', () => {
    const estimate = estimateHeating(
      {
        house: exampleDoublePolyGableHouse(),
        conditions: { designOutdoorC: -10, elevationM: 0, insideRelativeHumidityPct: 80, designWindSpeedMPerS: 12 },
      },
      ref,
    );
    expect(estimate.heatLoss.wind.windSpeedMPerS).toBe(12);
    expect(estimate.heatLoss.wind.infiltrationFactor).toBeGreaterThan(1);
    const keys = estimate.assumptions.map((a) => a.key);
    expect(keys).toEqual(
      expect.arrayContaining(['wind.designWindSpeedMPerS', 'wind.wind-u-double', 'wind.infiltrationFactor']),
    );
    expect(() =>
      estimateHeating(
        {
          house: exampleDoublePolyGableHouse(),
          conditions: { designOutdoorC: -10, elevationM: 0, insideRelativeHumidityPct: 80, designWindSpeedMPerS: 40 },
        },
        ref,
      ),
    ).toThrow(expect.objectContaining({ field: 'conditions.designWindSpeedMPerS' }));
  });

  it('property: more wind never lowers the loss', () => {
    const coverings = [
      'poly-single',
      'poly-double-inflated',
      'glass-single',
      'polycarbonate-twin-8mm',
      'foam-board-25mm',
    ];
    fc.assert(
      fc.property(
        fc.double({ min: BOUNDS.designWindSpeedMPerS.min, max: BOUNDS.designWindSpeedMPerS.max, noNaN: true }),
        fc.double({ min: BOUNDS.designWindSpeedMPerS.min, max: BOUNDS.designWindSpeedMPerS.max, noNaN: true }),
        fc.constantFrom(...coverings),
        fc.constantFrom(...coverings),
        (a, b, roof, walls) => {
          const [calm, windy] = a <= b ? [a, b] : [b, a];
          const set = { roof, sidewalls: walls, endwalls: walls };
          expect(lossW(windy, set)).toBeGreaterThanOrEqual(lossW(calm, set) * (1 - 1e-12));
        },
      ),
    );
  });
});
