import fc from 'fast-check';
import { referenceRow } from '../reference-data.types';
import { loadReferenceData } from '../testing/reference-data';
import { condensationRisk, insideSurfaceTemperatureC } from './condensation';

const ref = loadReferenceData();
const uOf = (id: string) => referenceRow(ref, 'coverings', id)!.uWPerM2K as number;

describe('condensation on the covering', () => {
  it('inside film coefficients come from R = 0.68 (vertical) and 0.61 (heat flow up) h·ft²·°F/Btu (WAC 51-11-0526, ASHRAE values): ≈ 8.35 and 9.31 W/(m²·K)', () => {
    expect(referenceRow(ref, 'surface-coefficients', 'inside-vertical')!.hWPerM2K).toBeCloseTo(8.35, 2);
    expect(referenceRow(ref, 'surface-coefficients', 'inside-heat-flow-up')!.hWPerM2K).toBeCloseTo(9.31, 2);
  });

  it('inside surface temperature by hand: T_i 20, T_o −10, U 4, h_i 8 → 20 − 0.5 × 30 = 5 °C', () => {
    expect(insideSurfaceTemperatureC(20, -10, 4, 8)).toBeCloseTo(5, 12);
  });

  it('single poly sweats where inflated double poly stays dry: 18 °C, 65 % RH inside, 8 °C outside', () => {
    const { result } = condensationRisk(
      { insideC: 18, outsideC: 8, insideRelativeHumidityPct: 65 },
      [
        { group: 'sidewalls', coveringId: 'poly-single', uWPerM2K: uOf('poly-single') },
        { group: 'endwalls', coveringId: 'poly-double-inflated', uWPerM2K: uOf('poly-double-inflated') },
      ],
      ref,
    );
    const [single, double] = result.surfaces;
    // dew point of 18 °C / 65 % ≈ 11.4 °C; single poly surface ≈ 18 − (6.67/8.35)·10 ≈ 10.0 °C,
    // double ≈ 18 − (3.97/8.35)·10 ≈ 13.2 °C (recalled table U-values)
    expect(result.dewPointC).toBeCloseTo(11.4, 0);
    expect(single.condenses).toBe(true);
    expect(double.condenses).toBe(false);
    expect(double.insideSurfaceC - single.insideSurfaceC).toBeGreaterThan(3);
    expect(double.condensationBelowOutdoorC).toBeLessThan(single.condensationBelowOutdoorC - 3);
    expect(result.anyCondenses).toBe(true);
  });

  it('70 °F / 70 % air: the bulletin prints its dew point as 60 °F; a surface at or below the computed dew point condenses (rule ≤), so 59.5 °F drips and 60.5 °F stays dry (UF/IFAS, Buffington et al., condensation control bulletin)', () => {
    const fToC = (f: number) => ((f - 32) * 5) / 9;
    const insideC = fToC(70);
    // a film ratio of 1 (U equal to the inside film coefficient) puts the surface at the outdoor temperature
    const hVertical = referenceRow(ref, 'surface-coefficients', 'inside-vertical')!.hWPerM2K as number;
    const surfaceAt = (surfaceF: number) =>
      condensationRisk(
        { insideC, outsideC: fToC(surfaceF), insideRelativeHumidityPct: 70 },
        [{ group: 'sidewalls', coveringId: 'probe', uWPerM2K: hVertical }],
        ref,
      ).result;
    const cold = surfaceAt(59.5);
    const warm = surfaceAt(60.5);
    expect(cold.surfaces[0].insideSurfaceC).toBeCloseTo(fToC(59.5), 10);
    expect(cold.surfaces[0].condenses).toBe(true);
    expect(warm.surfaces[0].condenses).toBe(false);
    // the bulletin's figure as printed: 60 °F, a whole degree, so agreement within ±0.5 °F
    const dewF = (cold.dewPointC * 9) / 5 + 32;
    expect(Math.abs(dewF - 60)).toBeLessThanOrEqual(0.5);
  });

  it('at the reported threshold outdoor temperature the surface sits exactly at the dew point, and colder outside it condenses', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 30, noNaN: true }),
        fc.double({ min: 30, max: 95, noNaN: true }),
        fc.constantFrom(...ref['coverings'].rows.map((row) => row.id)),
        fc.constantFrom<'roof' | 'sidewalls' | 'endwalls'>('roof', 'sidewalls', 'endwalls'),
        (insideC, rh, coveringId, group) => {
          const surface = { group, coveringId, uWPerM2K: uOf(coveringId) };
          const probe = condensationRisk(
            { insideC, outsideC: 0, insideRelativeHumidityPct: rh },
            [surface],
            ref,
          ).result;
          const thresholdC = probe.surfaces[0].condensationBelowOutdoorC;
          expect(Number.isFinite(thresholdC)).toBe(true);
          const atThreshold = condensationRisk(
            { insideC, outsideC: thresholdC, insideRelativeHumidityPct: rh },
            [surface],
            ref,
          ).result;
          // temperatures near 0 °C: an absolute tolerance in kelvin, not a relative one
          expect(Math.abs(atThreshold.surfaces[0].insideSurfaceC - probe.dewPointC)).toBeLessThan(1e-9);
          const colder = condensationRisk(
            { insideC, outsideC: thresholdC - 1, insideRelativeHumidityPct: rh },
            [surface],
            ref,
          ).result;
          expect(colder.surfaces[0].condenses).toBe(true);
        },
      ),
    );
  });

  it('an override U above the inside film coefficient never puts the surface below the outdoor temperature', () => {
    expect(insideSurfaceTemperatureC(20, -10, 12, 8.35)).toBe(-10);
  });
});
