import type { HouseSpec } from '../house.types';

/**
 * A typical freestanding double-poly gable house (about 30 × 96 ft), used by specs and as a
 * starting point in demos. Numbers are trade-typical, not from any one publication.
 */
export function exampleDoublePolyGableHouse(overrides: Partial<HouseSpec> = {}): HouseSpec {
  return {
    shape: 'gable',
    spans: 1,
    widthM: 9,
    lengthM: 30,
    eaveHeightM: 2.4,
    ridgeHeightM: 4.4,
    coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated', endwalls: 'polycarbonate-twin-8mm' },
    airLeakageClassId: 'new-film-double',
    airChangesPerHourOverride: null,
    perimeterInsulated: false,
    curtainId: null,
    heaters: [{ count: 2, ratedInputW: 45_000, efficiency: 0.8, fuelId: 'propane' }],
    exhaustFans: { count: 2, capacityEachM3PerS: 5 },
    inletAreaM2: 4,
    setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 24 },
    ...overrides,
  };
}
