import { guideline14Statistics } from './fit-statistics';

describe('NMBE and CV(RMSE) as ASHRAE Guideline 14-2014 defines them', () => {
  // Hand-worked example of the guideline's definitions (the numbers are invented for the test):
  //   y = 100, 80, 60, 40; ŷ = 95, 85, 57, 42; one fitted parameter (p = 1), n = 4
  //   residuals y − ŷ = 5, −5, 3, −2      Σ = 1       Σ² = 25 + 25 + 9 + 4 = 63
  //   ȳ = 280 / 4 = 70;   n − p = 3
  //   NMBE     = 1 / (3 · 70) · 100 = 0.476190… %
  //   CV(RMSE) = √(63 / 3) / 70 · 100 = √21 / 70 · 100 = 4.582576 / 70 · 100 = 6.546537… %
  const stats = guideline14Statistics([100, 80, 60, 40], [95, 85, 57, 42], 1);

  it('NMBE = 0.4762 %', () => {
    expect(stats.nmbePercent).toBeCloseTo(0.47619, 5);
  });

  it('CV(RMSE) = 6.5465 %', () => {
    expect(stats.cvRmsePercent).toBeCloseTo(6.546537, 5);
  });

  it('meets the monthly limits (±5 %, 15 %)', () => {
    expect(stats.meanMeasured).toBe(70);
    expect(stats.meetsMonthlyLimits).toBe(true);
  });

  it('a model 10 % low everywhere fails on NMBE', () => {
    // y = 100, 100, 100; ŷ = 90 each; p = 1: NMBE = 30 / (2 · 100) · 100 = 15 %,
    // CV(RMSE) = √(300 / 2) / 100 · 100 = 12.247 %
    const low = guideline14Statistics([100, 100, 100], [90, 90, 90], 1);
    expect(low.nmbePercent).toBeCloseTo(15, 10);
    expect(low.cvRmsePercent).toBeCloseTo(Math.sqrt(150), 10);
    expect(low.meetsMonthlyLimits).toBe(false);
  });

  it('needs more values than parameters and a positive mean', () => {
    expect(() => guideline14Statistics([1], [1], 1)).toThrow(RangeError);
    expect(() => guideline14Statistics([0, 0], [1, 1], 1)).toThrow(RangeError);
  });
});
