import fc from 'fast-check';
import { EngineInputError } from '../errors';
import { exampleDoublePolyGableHouse } from '../heating/example-houses';
import type { HouseSpec } from '../house.types';
import {
  applyHousePatch,
  assertPatchFields,
  housePatchBetween,
  patchedPaths,
  reverseHousePatch,
  type HousePatch,
} from './house-patch';

const COVERING_IDS = ['poly-single', 'poly-double-inflated', 'poly-double-ir-inner', 'glass-single'];
const lampHoursArb = fc.array(fc.integer({ min: 0, max: 24 }), { minLength: 12, maxLength: 12 });

/** Random stored-like houses: every field present, no null inside object-valued fields. */
const houseArb: fc.Arbitrary<HouseSpec & { id: number; name: string }> = fc.record({
  id: fc.integer({ min: 1, max: 1000 }),
  name: fc.string({ minLength: 1, maxLength: 20 }),
  shape: fc.constantFrom('gable' as const, 'gothic-arch' as const, 'quonset' as const),
  spans: fc.integer({ min: 1, max: 10 }),
  widthM: fc.double({ min: 3, max: 15, noNaN: true }),
  lengthM: fc.double({ min: 5, max: 100, noNaN: true }),
  eaveHeightM: fc.double({ min: 1.5, max: 5, noNaN: true }),
  ridgeHeightM: fc.double({ min: 5.1, max: 8, noNaN: true }),
  coverings: fc.record({
    roof: fc.constantFrom(...COVERING_IDS),
    sidewalls: fc.constantFrom(...COVERING_IDS),
    endwalls: fc.constantFrom(...COVERING_IDS),
  }),
  coveringUOverridesWPerM2K: fc.record(
    { roof: fc.double({ min: 1, max: 7, noNaN: true }), sidewalls: fc.double({ min: 1, max: 7, noNaN: true }) },
    { requiredKeys: [] },
  ),
  airLeakageClassId: fc.constantFrom('new-film-double', 'old-glass-poor'),
  airChangesPerHourOverride: fc.option(fc.double({ min: 0.2, max: 4, noNaN: true }), { nil: null }),
  perimeterInsulated: fc.boolean(),
  curtainId: fc.option(fc.constantFrom('energy-curtain-50', 'blackout'), { nil: null }),
  shadeCloth: fc.option(
    fc.record({
      solarTransmittance: fc.double({ min: 0, max: 1, noNaN: true }),
      months: fc.uniqueArray(fc.integer({ min: 1, max: 12 }), { maxLength: 12 }),
    }),
    { nil: null },
  ),
  heaters: fc.array(
    fc.record({
      count: fc.integer({ min: 1, max: 6 }),
      ratedInputW: fc.integer({ min: 5_000, max: 100_000 }),
      efficiency: fc.double({ min: 0.5, max: 0.95, noNaN: true }),
      fuelId: fc.constantFrom('propane', 'natural-gas'),
    }),
    { maxLength: 3 },
  ),
  exhaustFans: fc.record({
    count: fc.integer({ min: 0, max: 10 }),
    capacityEachM3PerS: fc.double({ min: 0, max: 10, noNaN: true }),
  }),
  inletAreaM2: fc.double({ min: 0, max: 10, noNaN: true }),
  setpoints: fc.record({
    dayHeatingC: fc.double({ min: 5, max: 30, noNaN: true }),
    nightHeatingC: fc.double({ min: 5, max: 30, noNaN: true }),
    coolingC: fc.double({ min: 15, max: 35, noNaN: true }),
  }),
  lamps: fc.option(
    fc.record(
      {
        lampTypeId: fc.constantFrom('hps-double-ended', 'led-horticultural'),
        powerDensityWPerM2: fc.double({ min: 1, max: 200, noNaN: true }),
        hoursPerDayByMonth: lampHoursArb,
        heatToHouseFraction: fc.double({ min: 0.5, max: 1, noNaN: true }),
      },
      { requiredKeys: ['powerDensityWPerM2', 'hoursPerDayByMonth', 'heatToHouseFraction'] },
    ),
    { nil: null },
  ),
});

/** A random patch over the fields the issue lists (and a few others), each a plausible change. */
const patchArb: fc.Arbitrary<HousePatch> = fc.record(
  {
    coverings: fc.record(
      {
        roof: fc.constantFrom(...COVERING_IDS),
        sidewalls: fc.constantFrom(...COVERING_IDS),
        endwalls: fc.constantFrom(...COVERING_IDS),
      },
      { requiredKeys: [] },
    ),
    coveringUOverridesWPerM2K: fc.record(
      {
        roof: fc.option(fc.double({ min: 1, max: 7, noNaN: true }), { nil: null }),
        endwalls: fc.option(fc.double({ min: 1, max: 7, noNaN: true }), { nil: null }),
      },
      { requiredKeys: [] },
    ),
    curtainId: fc.option(fc.constantFrom('energy-curtain-50', 'blackout'), { nil: null }),
    // add, change or remove the shade cloth: its share, its months, or both
    shadeCloth: fc.option(
      fc.record(
        {
          solarTransmittance: fc.double({ min: 0, max: 1, noNaN: true }),
          months: fc.uniqueArray(fc.integer({ min: 1, max: 12 }), { maxLength: 12 }),
        },
        { requiredKeys: [] },
      ),
      { nil: null },
    ),
    airLeakageClassId: fc.constantFrom('new-film-double', 'old-glass-poor'),
    airChangesPerHourOverride: fc.option(fc.double({ min: 0.2, max: 4, noNaN: true }), { nil: null }),
    perimeterInsulated: fc.boolean(),
    heaters: fc.array(
      fc.record({
        count: fc.integer({ min: 1, max: 6 }),
        ratedInputW: fc.integer({ min: 5_000, max: 100_000 }),
        efficiency: fc.double({ min: 0.5, max: 0.95, noNaN: true }),
        fuelId: fc.constantFrom('propane', 'natural-gas'),
      }),
      { maxLength: 3 },
    ),
    exhaustFans: fc.record(
      { count: fc.integer({ min: 0, max: 10 }), capacityEachM3PerS: fc.double({ min: 0, max: 10, noNaN: true }) },
      { requiredKeys: [] },
    ),
    inletAreaM2: fc.double({ min: 0, max: 10, noNaN: true }),
    setpoints: fc.record(
      {
        dayHeatingC: fc.double({ min: 5, max: 30, noNaN: true }),
        nightHeatingC: fc.double({ min: 5, max: 30, noNaN: true }),
      },
      { requiredKeys: [] },
    ),
    ridgeHeightM: fc.double({ min: 5.1, max: 8, noNaN: true }),
    lamps: fc.option(
      fc.record(
        {
          lampTypeId: fc.constantFrom('hps-double-ended', 'led-horticultural'),
          powerDensityWPerM2: fc.double({ min: 1, max: 200, noNaN: true }),
          hoursPerDayByMonth: lampHoursArb,
          heatToHouseFraction: fc.double({ min: 0.5, max: 1, noNaN: true }),
        },
        { requiredKeys: [] },
      ),
      { nil: null },
    ),
  },
  { requiredKeys: [] },
) as fc.Arbitrary<HousePatch>;

describe('house patches (fast-check)', () => {
  it('apply then revert gives back the house exactly', () => {
    fc.assert(
      fc.property(houseArb, patchArb, (house, patch) => {
        const patched = applyHousePatch(house, patch);
        const restored = applyHousePatch(patched, reverseHousePatch(house, patch));
        expect(restored).toEqual(house);
      }),
      { numRuns: 300 },
    );
  });

  it('never modifies the house or the patch it is given', () => {
    fc.assert(
      fc.property(houseArb, patchArb, (house, patch) => {
        const houseBefore = structuredClone(house);
        const patchBefore = structuredClone(patch);
        reverseHousePatch(house, patch);
        applyHousePatch(house, patch);
        expect(house).toEqual(houseBefore);
        expect(patch).toEqual(patchBefore);
      }),
    );
  });

  it('a later edit of the house flows into an alternative that does not change that field', () => {
    fc.assert(
      fc.property(houseArb, patchArb, (edited, patch) => {
        // the house is edited (every field may change); the alternative's patch stays as stored
        const alternative = applyHousePatch(edited, patch);
        for (const key of Object.keys(edited) as Array<keyof typeof edited>) {
          if (!(key in patch)) expect(alternative[key]).toEqual(edited[key]);
        }
        // fields of the covering groups the patch leaves out follow the house too
        const coverings = patch.coverings as Record<string, string> | undefined;
        for (const group of ['roof', 'sidewalls', 'endwalls'] as const) {
          const expected = coverings?.[group] ?? edited.coverings[group];
          expect(alternative.coverings[group]).toBe(expected);
        }
        // and what the patch does set wins over the edit
        if (patch.perimeterInsulated !== undefined)
          expect(alternative.perimeterInsulated).toBe(patch.perimeterInsulated);
      }),
      { numRuns: 200 },
    );
  });

  it('the patch between two houses turns the first into the second', () => {
    fc.assert(
      fc.property(houseArb, houseArb, (house, target) => {
        const { id: _id, name: _name, ...targetFields } = target;
        const patch = housePatchBetween(house, targetFields);
        expect(applyHousePatch(house, patch)).toEqual({ ...house, ...targetFields });
        expect(patch).not.toHaveProperty('id');
      }),
      { numRuns: 200 },
    );
  });
});

describe('house patches (examples)', () => {
  const house = exampleDoublePolyGableHouse({
    coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'poly-single' },
  });

  it('changes only the covering groups it names', () => {
    const patched = applyHousePatch(house, {
      coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated' },
    });
    expect(patched.coverings).toEqual({
      roof: 'poly-double-inflated',
      sidewalls: 'poly-double-inflated',
      endwalls: 'poly-single',
    });
    expect(house.coverings.roof).toBe('poly-single');
  });

  it('replaces the heater groups as a whole and removes an override with null', () => {
    const withOverride = { ...house, coveringUOverridesWPerM2K: { roof: 4.2 } };
    const patched = applyHousePatch(withOverride, {
      heaters: [{ count: 3, ratedInputW: 60_000, efficiency: 0.8, fuelId: 'propane' }],
      coveringUOverridesWPerM2K: { roof: null },
    });
    expect(patched.heaters).toHaveLength(1);
    expect(patched.heaters[0].count).toBe(3);
    expect(patched.coveringUOverridesWPerM2K).toEqual({});
    expect(reverseHousePatch(withOverride, { coveringUOverridesWPerM2K: { roof: null } })).toEqual({
      coveringUOverridesWPerM2K: { roof: 4.2 },
    });
  });

  it('refuses a field the house does not have, and the fields that name the house', () => {
    const stored = { ...house, id: 1, name: 'House B' };
    expect(() => assertPatchFields(stored, { roofColour: 'red' })).toThrow(EngineInputError);
    expect(() => assertPatchFields(stored, { name: 'x' })).toThrow(/belongs to the house/);
    expect(() => assertPatchFields(stored, [])).toThrow(EngineInputError);
    expect(() => assertPatchFields(stored, { curtainId: null })).not.toThrow();
  });

  it('adds, changes and removes a shade cloth, and reverts each', () => {
    const bare = { ...house, shadeCloth: null };
    const cloth = { solarTransmittance: 0.5, months: [5, 6, 7, 8, 9] };
    // add
    const added = applyHousePatch(bare, { shadeCloth: cloth });
    expect(added.shadeCloth).toEqual(cloth);
    expect(applyHousePatch(added, reverseHousePatch(bare, { shadeCloth: cloth }))).toEqual(bare);
    expect(housePatchBetween(bare, added)).toEqual({ shadeCloth: cloth });
    // change: a denser cloth over the same months; the months alone replace the list
    const denser = applyHousePatch(added, { shadeCloth: { solarTransmittance: 0.3 } });
    expect(denser.shadeCloth).toEqual({ solarTransmittance: 0.3, months: [5, 6, 7, 8, 9] });
    const longer = applyHousePatch(added, { shadeCloth: { months: [4, 5, 6, 7, 8, 9, 10] } });
    expect(longer.shadeCloth).toEqual({ solarTransmittance: 0.5, months: [4, 5, 6, 7, 8, 9, 10] });
    expect(housePatchBetween(added, denser)).toEqual({ shadeCloth: { solarTransmittance: 0.3 } });
    expect(reverseHousePatch(added, { shadeCloth: { solarTransmittance: 0.3 } })).toEqual({
      shadeCloth: { solarTransmittance: 0.5 },
    });
    // remove
    const removed = applyHousePatch(added, { shadeCloth: null });
    expect(removed.shadeCloth).toBeNull();
    expect(reverseHousePatch(added, { shadeCloth: null })).toEqual({ shadeCloth: cloth });
    expect(housePatchBetween(added, removed)).toEqual({ shadeCloth: null });
    // a stored house always carries the field (null without a cloth), so a patch may name it
    expect(() => assertPatchFields({ ...bare, id: 1 }, { shadeCloth: cloth })).not.toThrow();
  });

  it('adds lamps to a house without them, changes one lamp value, and takes them away', () => {
    const stored: HouseSpec = { ...house, lamps: null };
    const lamps = {
      lampTypeId: 'led-horticultural',
      powerDensityWPerM2: 45,
      hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 12],
      heatToHouseFraction: 0.95,
    };
    const added = applyHousePatch(stored, { lamps });
    expect(added.lamps).toEqual(lamps);
    expect(stored.lamps).toBeNull();
    // an alternative of a lit house that only doubles the power keeps the house's hours
    const brighter = applyHousePatch(added, { lamps: { powerDensityWPerM2: 90 } });
    expect(brighter.lamps).toEqual({ ...lamps, powerDensityWPerM2: 90 });
    expect(housePatchBetween(added, brighter)).toEqual({ lamps: { powerDensityWPerM2: 90 } });
    expect(applyHousePatch(added, { lamps: null }).lamps).toBeNull();
    expect(housePatchBetween(stored, added)).toEqual({ lamps });
    expect(reverseHousePatch(stored, { lamps })).toEqual({ lamps: null });
    expect(() => assertPatchFields({ ...stored, id: 1 }, { lamps })).not.toThrow();
    expect(patchedPaths({ lamps: { hoursPerDayByMonth: Array(12).fill(6) } })).toEqual(['lamps.hoursPerDayByMonth']);
  });

  it('lists the paths it changes', () => {
    expect(patchedPaths({ shadeCloth: { solarTransmittance: 0.3 } })).toEqual(['shadeCloth.solarTransmittance']);
    expect(patchedPaths({ shadeCloth: null })).toEqual(['shadeCloth']);
    expect(patchedPaths({ coverings: { roof: 'glass-single' }, heaters: [], curtainId: null })).toEqual([
      'coverings.roof',
      'heaters',
      'curtainId',
    ]);
  });
});
