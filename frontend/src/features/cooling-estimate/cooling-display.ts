import type { CoolingConditionsSource } from '../../api/types';

/** Words and number formats for showing a cooling estimate (no components here). */

const SOURCE_WORDS: Record<CoolingConditionsSource[keyof CoolingConditionsSource], string> = {
  'farm climate': 'farm climate',
  request: 'typed here',
  'calendar default': 'mid-summer default',
  'reference data': 'default',
  'design day': "the design day's sun",
  'house length': 'house length',
  none: 'none',
};

/** How the API's source of a condition reads beside its value. */
export function coolingSourceWord(source: CoolingConditionsSource[keyof CoolingConditionsSource]): string {
  return SOURCE_WORDS[source];
}

/** A plain number with exactly `decimals` decimals, thousands grouped ("1,234.5"). */
export const formatFixed = (value: number, decimals: number) =>
  new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(value);
