import { winterVentilation } from './winter-ventilation';

describe('winterVentilation', () => {
  const base = {
    fractionOfSummerRate: 0.25,
    summerBaseFlowM3PerS: 10,
    volumeM3: 1000,
    indoorC: 15,
    outdoorC: -5,
    airDensityKgPerM3: 1.2,
    cpJPerKgK: 1006,
    houseConductanceWPerK: 2000,
  };

  it('takes the stated share of the summer rate and its air changes', () => {
    const result = winterVentilation(base);
    expect(result.flowM3PerS).toBeCloseTo(2.5, 12);
    expect(result.airChangesPerHour).toBeCloseTo((2.5 * 3600) / 1000, 12);
  });

  it('costs ρ·cp·V̇·ΔT and sets the house loss U·A·ΔT beside it (sensible-heat definitions)', () => {
    const result = winterVentilation(base);
    expect(result.heatCostW).toBeCloseTo(1.2 * 1006 * 2.5 * 20, 6);
    expect(result.houseHeatLossW).toBeCloseTo(2000 * 20, 9);
  });

  it('costs nothing when it is as warm outside as in', () => {
    const result = winterVentilation({ ...base, outdoorC: 20 });
    expect(result.heatCostW).toBe(0);
    expect(result.houseHeatLossW).toBe(0);
  });
});
