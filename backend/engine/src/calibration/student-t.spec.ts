import { studentTQuantile, studentTTwoSidedProbability } from './student-t';

describe("Student's t quantiles", () => {
  // Published one-sided t table values (upper 5 % points), e.g. NIST/SEMATECH e-Handbook of
  // Statistical Methods, section 1.3.6.7.2 "Critical values of the Student's t distribution".
  it.each([
    [1, 6.314],
    [2, 2.92],
    [3, 2.353],
    [4, 2.132],
    [5, 2.015],
    [10, 1.812],
    [30, 1.697],
  ])('t(0.95, %i) = %f (published table, 3 decimals)', (nu, published) => {
    expect(studentTQuantile(0.95, nu)).toBeCloseTo(published, 3);
  });

  it('t(0.975, 4) = 2.776 (same table)', () => {
    expect(studentTQuantile(0.975, 4)).toBeCloseTo(2.776, 3);
  });

  it('one degree of freedom is the Cauchy distribution: P(|T| ≤ 1) = 1/2', () => {
    expect(studentTTwoSidedProbability(1, 1)).toBeCloseTo(0.5, 12);
  });

  it('two degrees of freedom: P(|T| ≤ t) = t / √(t² + 2) (closed form)', () => {
    expect(studentTTwoSidedProbability(3, 2)).toBeCloseTo(3 / Math.sqrt(11), 12);
  });

  it('refuses fractional degrees of freedom and p outside [0.5, 1)', () => {
    expect(() => studentTTwoSidedProbability(1, 2.5)).toThrow(RangeError);
    expect(() => studentTQuantile(1, 3)).toThrow(RangeError);
  });
});
