/**
 * A farm's currency: an ISO 4217 code. Amounts are plain numbers in that currency; the code only
 * says how to write them (Intl.NumberFormat with style 'currency').
 */
export const DEFAULT_CURRENCY = 'USD';

/** The ISO 4217 codes this JavaScript runtime can format (Intl.supportedValuesOf, ES2022). */
export function supportedCurrencies(): string[] {
  return Intl.supportedValuesOf('currency');
}

/** True for a three-letter upper-case ISO 4217 code the runtime knows, e.g. 'EUR'. */
export function isCurrencyCode(value: unknown): value is string {
  return typeof value === 'string' && /^[A-Z]{3}$/.test(value) && supportedCurrencies().includes(value);
}
