/**
 * A plain 9 × 30 m freestanding gable house with two propane heaters, as the API takes it.
 * Shared by the e2e specs so that each one describes only what it changes.
 */
export const GABLE_HOUSE_SPEC = {
  shape: 'gable',
  spans: 1,
  widthM: 9,
  lengthM: 30,
  eaveHeightM: 2.5,
  ridgeHeightM: 4.5,
  coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated', endwalls: 'polycarbonate-twin-8mm' },
  airLeakageClassId: 'new-film-double',
  perimeterInsulated: false,
  curtainId: null,
  heaters: [{ count: 2, ratedInputW: 50_000, efficiency: 0.8, fuelId: 'propane' }],
  exhaustFans: { count: 2, capacityEachM3PerS: 5 },
  inletAreaM2: 3,
  setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 25 },
};

/** The same house as a body for POST /api/farms/:farmId/houses. */
export const houseBody = (name: string) => ({ name, ...GABLE_HOUSE_SPEC });
