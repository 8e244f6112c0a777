/**
 * Largest and smallest of a list without spreading it into arguments: `Math.max(...values)`
 * overflows the call stack once a list runs to about a hundred thousand entries (a year of
 * logged readings), so every list goes through these loops instead.
 */
export function maxOf(values: Iterable<number>): number {
  let highest = -Infinity;
  for (const value of values) {
    if (Number.isNaN(value)) return NaN;
    if (value > highest) highest = value;
  }
  return highest;
}

export function minOf(values: Iterable<number>): number {
  let lowest = Infinity;
  for (const value of values) {
    if (Number.isNaN(value)) return NaN;
    if (value < lowest) lowest = value;
  }
  return lowest;
}
