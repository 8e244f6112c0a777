import { goldenSectionMinimum } from './golden-section';

describe('golden-section search', () => {
  it('finds the minimum of a parabola (x − 1.3)² + 2 at 1.3', () => {
    expect(goldenSectionMinimum((x) => (x - 1.3) ** 2 + 2, 0.2, 5, 1e-6)).toBeCloseTo(1.3, 5);
  });

  it('returns the boundary when the minimum lies beyond it', () => {
    expect(goldenSectionMinimum((x) => (x - 9) ** 2, 0.2, 5, 1e-6)).toBe(5);
    expect(goldenSectionMinimum((x) => x, 0.2, 5, 1e-6)).toBe(0.2);
  });

  it('handles a flat region beside the minimum (a capped response)', () => {
    const capped = (x: number) => (Math.min(x, 2) - 1.5) ** 2;
    expect(goldenSectionMinimum(capped, 0.2, 5, 1e-7)).toBeCloseTo(1.5, 5);
  });

  it('refuses an empty bracket', () => {
    expect(() => goldenSectionMinimum((x) => x, 2, 1, 1e-6)).toThrow(RangeError);
  });
});
