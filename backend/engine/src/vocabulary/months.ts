/** Calendar months in words, shared by the engine's prose and the UI (1 = January). */
export const MONTH_NAMES = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
] as const;

/** "May–September", "June, August", "no month": the months in calendar order, runs joined by a dash. */
export function monthsInWords(months: readonly number[]): string {
  const sorted = [...new Set(months)].filter((m) => m >= 1 && m <= 12).sort((a, b) => a - b);
  if (sorted.length === 0) return 'no month';
  if (sorted.length === 12) return 'all year';
  const runs: Array<[number, number]> = [];
  for (const month of sorted) {
    const last = runs[runs.length - 1];
    if (last && month === last[1] + 1) last[1] = month;
    else runs.push([month, month]);
  }
  // a run through December that January continues reads as one, first (November–February)
  const first = runs[0];
  const last = runs[runs.length - 1];
  if (runs.length > 1 && first && last && first[0] === 1 && last[1] === 12) {
    runs.shift();
    runs.pop();
    runs.unshift([last[0], first[1]]);
  }
  return runs
    .map(([from, to]) => {
      if (from === to) return MONTH_NAMES[from - 1];
      const next = from === 12 ? 1 : from + 1;
      return `${MONTH_NAMES[from - 1]}${to === next ? ', ' : '–'}${MONTH_NAMES[to - 1]}`;
    })
    .join(', ');
}
