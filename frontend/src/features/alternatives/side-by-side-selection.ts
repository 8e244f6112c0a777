/** At most this many alternatives sit beside the house (the API's limit). */
export const MAX_SIDE_BY_SIDE = 4;

/** `?alternatives=3,7` → [3, 7]: whole positive ids, no repeats, at most four. */
export function parseAlternativeIds(param: string | null): number[] {
  if (!param) return [];
  const ids = param
    .split(',')
    .map((part) => Number(part.trim()))
    .filter((id) => Number.isInteger(id) && id > 0);
  return [...new Set(ids)].slice(0, MAX_SIDE_BY_SIDE);
}
