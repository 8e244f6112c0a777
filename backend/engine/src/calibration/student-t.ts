/**
 * Student's t distribution for whole degrees of freedom, from the closed forms of Abramowitz and
 * Stegun, Handbook of Mathematical Functions (1964), 26.7.3 (odd ν) and 26.7.4 (even ν), which
 * give A(t|ν) = P(|T| ≤ t). Quantiles are found by bisection on that function.
 */

/** P(|T| ≤ t) for Student's t with ν whole degrees of freedom (A&S 26.7.3 / 26.7.4). */
export function studentTTwoSidedProbability(t: number, degreesOfFreedom: number): number {
  const nu = degreesOfFreedom;
  if (!Number.isInteger(nu) || nu < 1) throw new RangeError('degrees of freedom must be a whole number ≥ 1');
  const x = Math.abs(t);
  if (x === Infinity) return 1;
  const theta = Math.atan(x / Math.sqrt(nu));
  const s = Math.sin(theta);
  const c = Math.cos(theta);
  const c2 = c * c;
  if (nu % 2 === 0) {
    // sinθ · (1 + ½cos²θ + (1·3)/(2·4)cos⁴θ + … + (1·3…(ν−3))/(2·4…(ν−2))cos^(ν−2)θ)
    let term = 1;
    let sum = 1;
    for (let j = 2; j <= nu - 2; j += 2) {
      term *= ((j - 1) / j) * c2;
      sum += term;
    }
    return s * sum;
  }
  if (nu === 1) return (2 / Math.PI) * theta;
  // (2/π)·(θ + sinθ·(cosθ + (2/3)cos³θ + … + (2·4…(ν−3))/(1·3…(ν−2))cos^(ν−2)θ))
  let term = c;
  let sum = c;
  for (let j = 3; j <= nu - 2; j += 2) {
    term *= ((j - 1) / j) * c2;
    sum += term;
  }
  return (2 / Math.PI) * (theta + s * sum);
}

/** The t with P(T ≤ t) = p for 0.5 ≤ p < 1 (one-sided quantile), by bisection to 1e-10. */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  if (!(p >= 0.5 && p < 1)) throw new RangeError('p must lie in [0.5, 1)');
  const target = 2 * p - 1;
  let low = 0;
  let high = 1;
  while (studentTTwoSidedProbability(high, degreesOfFreedom) < target) high *= 2;
  while (high - low > 1e-10) {
    const mid = (low + high) / 2;
    if (studentTTwoSidedProbability(mid, degreesOfFreedom) < target) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}
