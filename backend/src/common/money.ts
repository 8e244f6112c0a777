import { DEFAULT_CURRENCY } from '@thermbay/engine/vocabulary';

/**
 * Money as the exports and reports write it: the farm's ISO 4217 currency through
 * Intl.NumberFormat (the frontend's units module does the same on screen).
 */

/** Decimals the currency is usually written with (2 for USD and EUR, 0 for JPY). */
export function currencyDecimals(currency: string): number {
  return new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** "$1,234.50", "€1,234.50", "¥1,235"; '—' for no amount. `decimals` defaults to the currency's own. */
export function formatMoney(amount: number | null | undefined, currency = DEFAULT_CURRENCY, decimals?: number): string {
  if (amount === null || amount === undefined || !Number.isFinite(amount)) return '—';
  const digits = decimals ?? currencyDecimals(currency);
  return new Intl.NumberFormat('en-US', {
    style: 'currency',
    currency,
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(amount);
}

/** A plain number for a spreadsheet cell, in the currency's own decimals: "1234.50". */
export function plainAmount(amount: number | null | undefined, currency = DEFAULT_CURRENCY): string | null {
  if (amount === null || amount === undefined || !Number.isFinite(amount)) return null;
  return amount.toFixed(currencyDecimals(currency));
}

/** A column heading that names the currency: "Cost (EUR)". */
export function moneyHeading(label: string, currency = DEFAULT_CURRENCY): string {
  return `${label} (${currency})`;
}
