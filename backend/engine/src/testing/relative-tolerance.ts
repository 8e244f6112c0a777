/**
 * For specs only (left out of the build): float comparison with a relative tolerance.
 * |actual − expected| ≤ relative × |expected|, with a message that shows both.
 */
export function expectRelativelyClose(actual: number, expected: number, relative: number): void {
  const allowed = relative * Math.abs(expected);
  if (!(Math.abs(actual - expected) <= allowed)) {
    throw new Error(
      `expected ${actual} to be within ${relative} (relative) of ${expected}, off by ${actual - expected}`,
    );
  }
}
