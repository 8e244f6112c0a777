import fc from 'fast-check';
import { expectRelativelyClose } from '../testing/relative-tolerance';
import { BOUNDS } from '../vocabulary';
import { EngineInputError } from '../errors';
import type { HouseShape } from '../vocabulary';
import { exampleDoublePolyGableHouse } from '../heating/example-houses';
import {
  computeHouseGeometry,
  gableProfile,
  gothicArchMaxRiseM,
  gothicArchProfile,
  opaqueEnvelopeShare,
  quonsetProfile,
} from './house-geometry';

function expectEngineError(run: () => unknown, field: string): void {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    expect((error as EngineInputError).field).toBe(field);
    return;
  }
  throw new Error(`expected EngineInputError on ${field}`);
}

describe('roof profiles (closed forms)', () => {
  it('gable slopes follow Pythagoras: width 6 m, rise 4 m → two 5 m slopes, 12 m² gable triangle', () => {
    const profile = gableProfile(6, 4);
    expect(profile.arcLengthM).toBeCloseTo(10, 10);
    expect(profile.areaAboveEaveM2).toBeCloseTo(12, 10);
  });

  it('a semicircular quonset hoop (rise = w/2) has arch length π·w/2 and end area π·w²/8', () => {
    for (const widthM of [4, 6.4, 9, 12]) {
      const profile = quonsetProfile(widthM, widthM / 2);
      expect(profile.arcLengthM).toBeCloseTo((Math.PI * widthM) / 2, 9);
      expect(profile.areaAboveEaveM2).toBeCloseTo((Math.PI * widthM * widthM) / 8, 9);
    }
  });

  it('a shallow quonset arc matches sector-minus-triangle: chord 6 m, rise 1 m → R = 5 m, θ = asin(0.6)', () => {
    const radiusM = 5;
    const halfAngle = Math.asin(3 / 5);
    const profile = quonsetProfile(6, 1);
    expect(profile.arcLengthM).toBeCloseTo(2 * radiusM * halfAngle, 9);
    // sector 2θ of radius R minus the isosceles triangle under the chord (base 6, height R − rise = 4)
    expect(profile.areaAboveEaveM2).toBeCloseTo(radiusM * radiusM * halfAngle - 3 * 4, 9);
  });

  it('the equilateral pointed arch (rise w·√3/2) has radius w: arch length 2πw/3, area w²(π/3 − √3/4)', () => {
    const widthM = 6;
    const profile = gothicArchProfile(widthM, (widthM * Math.sqrt(3)) / 2);
    expect(profile.arcLengthM).toBeCloseTo((2 * Math.PI * widthM) / 3, 9);
    expect(profile.areaAboveEaveM2).toBeCloseTo(widthM * widthM * (Math.PI / 3 - Math.sqrt(3) / 4), 9);
  });

  it('a gothic arch bulges outside the gable with the same rise, and stays inside the rectangle w × rise', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 0.005, max: 1, noNaN: true }),
        (widthM, riseFraction) => {
          const riseM = riseFraction * gothicArchMaxRiseM(widthM);
          const gothic = gothicArchProfile(widthM, riseM);
          const gable = gableProfile(widthM, riseM);
          expect(gothic.arcLengthM).toBeGreaterThan(gable.arcLengthM);
          expect(gothic.areaAboveEaveM2).toBeGreaterThan(gable.areaAboveEaveM2);
          expect(gothic.areaAboveEaveM2).toBeLessThan(widthM * riseM);
          // arc length can never exceed going up the wall, across and down again
          expect(gothic.arcLengthM).toBeLessThan(widthM + 2 * riseM);
        },
      ),
    );
  });

  it('at a rise a quonset can have (up to w/2), the gothic arch lies between the gable and the quonset', () => {
    // The order a grower expects of three frames of the same width and ridge: the pointed arch holds
    // more air and film than straight rafters and less than a round hoop (geometry, no source needed).
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 0.01, max: 0.5, noNaN: true }),
        (widthM, riseOverWidth) => {
          const riseM = riseOverWidth * widthM;
          const gable = gableProfile(widthM, riseM);
          const gothic = gothicArchProfile(widthM, riseM);
          const quonset = quonsetProfile(widthM, riseM);
          expect(gothic.areaAboveEaveM2).toBeGreaterThan(gable.areaAboveEaveM2);
          expect(gothic.areaAboveEaveM2).toBeLessThan(quonset.areaAboveEaveM2);
          expect(gothic.arcLengthM).toBeGreaterThan(gable.arcLengthM);
          expect(gothic.arcLengthM).toBeLessThan(quonset.arcLengthM);
        },
      ),
    );
  });
});

describe('computeHouseGeometry', () => {
  it('a three-span gutter-connected gable range: only the two outer walls are sidewalls, endwalls at both ends of every span', () => {
    // 3 spans × 9.6 m, 40 m long, 4 m gutter, 6 m ridge (rise 2 m; slope √(4.8² + 2²) = 5.2 m)
    const geometry = computeHouseGeometry(
      exampleDoublePolyGableHouse({ spans: 3, widthM: 9.6, lengthM: 40, eaveHeightM: 4, ridgeHeightM: 6 }),
    );
    expect(geometry.floorAreaM2).toBeCloseTo(3 * 9.6 * 40, 9); // 1152
    expect(geometry.roofAreaM2).toBeCloseTo(3 * 2 * 5.2 * 40, 9); // 1248
    expect(geometry.sidewallAreaM2).toBeCloseTo(2 * 4 * 40, 9); // 320
    expect(geometry.endwallAreaM2).toBeCloseTo(2 * 3 * (9.6 * 4 + (9.6 * 2) / 2), 9); // 288
    expect(geometry.coverAreaM2).toBeCloseTo(1248 + 320 + 288, 9);
    expect(geometry.perimeterM).toBeCloseTo(2 * (3 * 9.6 + 40), 9); // 137.6
    expect(geometry.volumeM3).toBeCloseTo(3 * 48 * 40, 9); // 5760
    expect(geometry.roofArcLengthM).toBeCloseTo(10.4, 9);
  });

  it('a freestanding semicircular quonset 8 m wide: roof = π·4·L, ends = 2(w·e + π·w²/8)', () => {
    const geometry = computeHouseGeometry(
      exampleDoublePolyGableHouse({ shape: 'quonset', widthM: 8, lengthM: 30, eaveHeightM: 1.5, ridgeHeightM: 5.5 }),
    );
    expect(geometry.roofAreaM2).toBeCloseTo(Math.PI * 4 * 30, 9);
    expect(geometry.endwallAreaM2).toBeCloseTo(2 * (8 * 1.5 + (Math.PI * 64) / 8), 9);
    expect(geometry.volumeM3).toBeCloseTo((8 * 1.5 + (Math.PI * 64) / 8) * 30, 9);
  });

  it('refuses a ridge at or below the eave, naming house.ridgeHeightM', () => {
    expectEngineError(
      () => computeHouseGeometry(exampleDoublePolyGableHouse({ eaveHeightM: 3, ridgeHeightM: 3 })),
      'house.ridgeHeightM',
    );
  });

  it('refuses a quonset rising more than half its width', () => {
    expectEngineError(
      () =>
        computeHouseGeometry(
          exampleDoublePolyGableHouse({ shape: 'quonset', widthM: 6, eaveHeightM: 1, ridgeHeightM: 4.5 }),
        ),
      'house.ridgeHeightM',
    );
  });

  it('refuses a gothic arch taller than the equilateral arch (it would bulge outside the walls)', () => {
    expectEngineError(
      () =>
        computeHouseGeometry(
          exampleDoublePolyGableHouse({ shape: 'gothic-arch', widthM: 4, eaveHeightM: 1, ridgeHeightM: 4.6 }),
        ),
      'house.ridgeHeightM',
    );
    expect(() =>
      computeHouseGeometry(
        exampleDoublePolyGableHouse({ shape: 'gothic-arch', widthM: 4, eaveHeightM: 1, ridgeHeightM: 4.4 }),
      ),
    ).not.toThrow();
  });

  it.each([
    ['house.widthM', { widthM: BOUNDS.widthM.max + 1 }],
    ['house.lengthM', { lengthM: 0 }],
    ['house.eaveHeightM', { eaveHeightM: Number.NaN }],
    ['house.spans', { spans: 1.5 }],
    ['house.spans', { spans: 0 }],
    ['house.shape', { shape: 'dome' as HouseShape }],
  ])('refuses a bad %s', (field, overrides) => {
    expectEngineError(() => computeHouseGeometry(exampleDoublePolyGableHouse(overrides)), field);
  });

  it('any in-bounds house gives finite, positive, self-consistent geometry', () => {
    const shape = fc.constantFrom<HouseShape>('gable', 'gothic-arch', 'quonset');
    fc.assert(
      fc.property(
        shape,
        fc.integer({ min: BOUNDS.spans.min, max: BOUNDS.spans.max }),
        fc.double({ min: BOUNDS.widthM.min, max: BOUNDS.widthM.max, noNaN: true }),
        fc.double({ min: BOUNDS.lengthM.min, max: BOUNDS.lengthM.max, noNaN: true }),
        fc.double({ min: BOUNDS.eaveHeightM.min, max: BOUNDS.eaveHeightM.max, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (houseShape, spans, widthM, lengthM, eaveHeightM, riseFraction) => {
          const maxRiseM = Math.min(
            BOUNDS.ridgeHeightM.max - eaveHeightM,
            houseShape === 'quonset'
              ? widthM / 2
              : houseShape === 'gothic-arch'
                ? gothicArchMaxRiseM(widthM)
                : Number.POSITIVE_INFINITY,
          );
          const ridgeHeightM = Math.max(eaveHeightM + riseFraction * maxRiseM, BOUNDS.ridgeHeightM.min);
          fc.pre(ridgeHeightM > eaveHeightM && ridgeHeightM - eaveHeightM <= maxRiseM);
          const geometry = computeHouseGeometry(
            exampleDoublePolyGableHouse({ shape: houseShape, spans, widthM, lengthM, eaveHeightM, ridgeHeightM }),
          );
          for (const [key, value] of Object.entries(geometry)) {
            expect(Number.isFinite(value)).toBe(true);
            // no kneewall here, so its area and height are 0
            if (key === 'kneewallAreaM2' || key === 'kneewallHeightM') expect(value).toBe(0);
            else expect(value).toBeGreaterThan(0);
          }
          expectRelativelyClose(
            geometry.coverAreaM2,
            geometry.roofAreaM2 + geometry.sidewallAreaM2 + geometry.endwallAreaM2 + geometry.kneewallAreaM2,
            1e-12,
          );
          expect(geometry.volumeM3).toBeGreaterThanOrEqual(geometry.floorAreaM2 * eaveHeightM);
          expect(geometry.volumeM3).toBeLessThanOrEqual(geometry.floorAreaM2 * ridgeHeightM * (1 + 1e-12));
          expect(geometry.roofAreaM2).toBeGreaterThanOrEqual(geometry.floorAreaM2 * (1 - 1e-12));
        },
      ),
    );
  });
});

describe('opaque kneewall', () => {
  it('takes height × (2 L + 2 spans × W) from the glazed walls and keeps the envelope whole (hand arithmetic)', () => {
    // 9 m × 30 m, eave 2.4 m, kneewall 0.6 m:
    //   kneewall  = 0.6 × (2 × 30 + 2 × 9) = 46.8 m²
    //   sidewalls = 2 × 2.4 × 30 − 2 × 0.6 × 30 = 144 − 36 = 108 m²
    //   endwalls  = 61.2 − 2 × 9 × 0.6 = 61.2 − 10.8 = 50.4 m²
    const plain = computeHouseGeometry(exampleDoublePolyGableHouse());
    const walled = computeHouseGeometry(
      exampleDoublePolyGableHouse({ kneewallHeightM: 0.6, kneewallId: 'wood-plywood-19mm' }),
    );
    expect(walled.kneewallAreaM2).toBeCloseTo(46.8, 9);
    expect(walled.sidewallAreaM2).toBeCloseTo(108, 9);
    expect(walled.endwallAreaM2).toBeCloseTo(50.4, 9);
    expect(walled.coverAreaM2).toBeCloseTo(plain.coverAreaM2, 9);
    expect(opaqueEnvelopeShare(walled)).toBeCloseTo(46.8 / plain.coverAreaM2, 12);
  });

  it('a height without a construction is glazing to the ground: nothing opaque', () => {
    const glazed = computeHouseGeometry(exampleDoublePolyGableHouse({ kneewallHeightM: 0.6, kneewallId: null }));
    expect(glazed.kneewallAreaM2).toBe(0);
    expect(opaqueEnvelopeShare(glazed)).toBe(0);
  });

  it('refuses a kneewall above the eave, naming house.kneewallHeightM', () => {
    expectEngineError(
      () =>
        computeHouseGeometry(exampleDoublePolyGableHouse({ kneewallHeightM: 2.5, kneewallId: 'wood-plywood-19mm' })),
      'house.kneewallHeightM',
    );
  });

  it('property: a kneewall never adds light (the opaque share only grows with its height)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 2.4, noNaN: true }),
        fc.double({ min: 0, max: 2.4, noNaN: true }),
        (a, b) => {
          const [low, high] = a <= b ? [a, b] : [b, a];
          const share = (h: number) =>
            opaqueEnvelopeShare(
              computeHouseGeometry(
                exampleDoublePolyGableHouse({ kneewallHeightM: h, kneewallId: 'concrete-block-200mm' }),
              ),
            );
          expect(share(low)).toBeGreaterThanOrEqual(0);
          expect(share(high)).toBeGreaterThanOrEqual(share(low) - 1e-12);
          expect(1 - share(high)).toBeLessThanOrEqual(1);
        },
      ),
    );
  });
});
