/**
 * Golden-section search for the minimum of a function of one variable on [low, high]
 * (Kiefer 1953; as in Press et al., Numerical Recipes, 3rd ed., §10.2). For a unimodal function it
 * narrows the bracket by the golden ratio each step; the end points are compared at the close so
 * that a minimum on the boundary is found too.
 */
const INVERSE_PHI = (Math.sqrt(5) - 1) / 2;

export function goldenSectionMinimum(f: (x: number) => number, low: number, high: number, tolerance: number): number {
  if (!(low < high) || !(tolerance > 0)) throw new RangeError('need low < high and a positive tolerance');
  let a = low;
  let b = high;
  let c = b - INVERSE_PHI * (b - a);
  let d = a + INVERSE_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  while (b - a > tolerance) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INVERSE_PHI * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INVERSE_PHI * (b - a);
      fd = f(d);
    }
  }
  const middle = (a + b) / 2;
  let best = middle;
  let bestValue = f(middle);
  for (const edge of [low, high]) {
    const value = f(edge);
    if (value < bestValue) {
      best = edge;
      bestValue = value;
    }
  }
  return best;
}
