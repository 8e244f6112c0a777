import { loadReferenceData } from '../testing/reference-data';
import { clearSkyIrradiance } from './clear-sky';

const ref = loadReferenceData();

describe('clearSkyIrradiance (handbook "original" clear-sky model)', () => {
  // Derived checks from the monthly A and B (handbook-values §8, [D]); A, B as published in
  // ASHRAE HOF 2005 ch. 31 and reproduced by the EnergyPlus Engineering Reference and ladybug.
  it.each([
    [1, 30, 906.6],
    [1, 60, 1021.4],
    [7, 30, 753.5],
    [7, 60, 881.7],
  ])('month %i, altitude %i° → direct normal %f W/m² (derived)', (month, altitudeDeg, expected) => {
    expect(clearSkyIrradiance(altitudeDeg, month, ref).directNormalWPerM2).toBeCloseTo(expected, 0);
  });

  it('diffuse horizontal = C × DNI with the handbook C (July 0.138)', () => {
    const july = clearSkyIrradiance(60, 7, ref);
    expect(july.diffuseHorizontalWPerM2).toBeCloseTo(0.138 * 881.7, 0);
    // global = DNI sin β + diffuse: 881.7 × (0.8660 + 0.138) = 885.3 W/m² (derived)
    expect(july.globalHorizontalWPerM2).toBeCloseTo(885.3, 0);
  });

  it('is zero with the sun at or below the horizon', () => {
    for (const altitude of [0, -0.01, -30]) {
      const result = clearSkyIrradiance(altitude, 6, ref);
      expect(result.directNormalWPerM2).toBe(0);
      expect(result.diffuseHorizontalWPerM2).toBe(0);
      expect(result.globalHorizontalWPerM2).toBe(0);
    }
  });

  it('rises with altitude and stays finite just above the horizon', () => {
    let previous = -1;
    for (const altitude of [0.001, 0.5, 5, 15, 30, 45, 60, 75, 90]) {
      const global = clearSkyIrradiance(altitude, 3, ref).globalHorizontalWPerM2;
      expect(Number.isFinite(global)).toBe(true);
      expect(global).toBeGreaterThan(previous);
      previous = global;
    }
    expect(previous).toBeLessThan(1367);
  });

  it('refuses a month outside 1–12', () => {
    expect(() => clearSkyIrradiance(30, 13, ref)).toThrow(/month/);
  });
});
