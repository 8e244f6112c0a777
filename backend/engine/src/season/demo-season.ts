import type { EstimateSeasonInput } from '../estimate-season';
import type { SiteClimate } from '../climate/site-climate';
import { exampleDoublePolyGableHouse } from '../heating/example-houses';

/**
 * A demo-like season input: the example double-poly gable house on a cold-winter inland farm
 * (about 42° N). The monthly normals are illustrative round numbers for such a climate, not
 * any station's published normals; specs and the benchmark use them as a realistic workload.
 */
export function demoClimate(): SiteClimate {
  const normals: Array<[number, number]> = [
    [-8, 2],
    [-7, 4],
    [-2, 9],
    [3, 16],
    [9, 22],
    [14, 27],
    [17, 29],
    [16, 28],
    [12, 24],
    [5, 17],
    [0, 10],
    [-5, 4],
  ];
  return {
    winterDesignC: -18,
    summerDesignC: 32,
    summerDesignWetBulbC: 23,
    monthly: normals.map(([meanDailyMinC, meanDailyMaxC], index) => ({
      month: index + 1,
      meanDailyMinC,
      meanDailyMaxC,
    })),
  };
}

export function demoSeasonInput(overrides: Partial<EstimateSeasonInput> = {}): EstimateSeasonInput {
  return {
    house: exampleDoublePolyGableHouse(),
    site: { latitudeDeg: 42, longitudeDeg: -72.5, elevationM: 60, utcOffsetHours: -5 },
    climate: demoClimate(),
    season: { startDate: '2026-01-01', endDate: '2026-12-31' },
    calendar: null,
    fuel: { fuelId: 'propane', pricePerUnit: 2.2, priceUnit: 'us' },
    heaterEfficiency: 0.8,
    ...overrides,
  };
}
