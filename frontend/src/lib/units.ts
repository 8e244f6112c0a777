import { createContext, createElement, useContext, useMemo, type ReactNode } from 'react';
import {
  DISPLAY_UNITS,
  JOULES_PER_KWH,
  JOULES_PER_THERM,
  isDisplayQuantity,
  shownToSi,
  siToShown,
  type DisplayQuantity,
  type UnitSystem,
} from '@thermbay/engine/vocabulary';

/**
 * The one place in the UI where SI values (as stored and computed) become what the user reads, and
 * where typed values become SI again. The labels, factors and decimals are the shared table
 * `DISPLAY_UNITS` of the vocabulary (the server-built report reads the same one).
 */

export type { UnitSystem };
export { JOULES_PER_KWH, JOULES_PER_THERM };

export type Quantity = DisplayQuantity;

export { quantityOfSiUnit } from '@thermbay/engine/vocabulary';

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return DISPLAY_UNITS[quantity][system].label;
}

export function unitDecimals(quantity: Quantity, system: UnitSystem): number {
  return DISPLAY_UNITS[quantity][system].decimals;
}

/** SI value → number in the user's unit (unrounded). */
export function toDisplay(quantity: Quantity, siValue: number, system: UnitSystem): number {
  return siToShown(quantity, siValue, system);
}

/** Number typed in the user's unit → SI value (unrounded). */
export function fromDisplay(quantity: Quantity, displayValue: number, system: UnitSystem): number {
  return shownToSi(quantity, displayValue, system);
}

/** Rounds to the given decimals without the 1.005 → 1.00 surprise of toFixed on binary floats. */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round((value + Number.EPSILON * Math.sign(value)) * factor) / factor;
}

/** The value an input shows for an SI number: rounded to the unit's decimals, trailing zeros dropped. */
export function toInputString(
  quantity: Quantity,
  siValue: number | null | undefined,
  system: UnitSystem,
  extraDecimals = 0,
): string {
  if (siValue === null || siValue === undefined || !Number.isFinite(siValue)) return '';
  return String(roundTo(toDisplay(quantity, siValue, system), unitDecimals(quantity, system) + extraDecimals));
}

export interface FormatOptions {
  /** override the unit's decimals */
  decimals?: number;
  /** leave the unit symbol off */
  withoutUnit?: boolean;
}

/** "9.14 m", "30.0 ft", "1,234,567 Btu/h" — grouping by the browser's locale. */
export function formatQuantity(
  quantity: Quantity,
  siValue: number | null | undefined,
  system: UnitSystem,
  options: FormatOptions = {},
): string {
  if (siValue === null || siValue === undefined || !Number.isFinite(siValue)) return '—';
  const decimals = options.decimals ?? unitDecimals(quantity, system);
  const number = new Intl.NumberFormat('en-US', {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  }).format(roundTo(toDisplay(quantity, siValue, system), decimals) || 0); // `|| 0`: no "-0.0" for −0.04
  return options.withoutUnit ? number : `${number} ${unitLabel(quantity, system)}`;
}

/**
 * An SI range [min, max] as the user's unit, narrowed inward to the shown decimals so that any
 * value the user may type converts back inside the SI range.
 */
export function rangeInDisplay(
  quantity: Quantity,
  siRange: { min: number; max: number },
  system: UnitSystem,
  decimals = unitDecimals(quantity, system),
): { min: number; max: number } {
  const factor = 10 ** decimals;
  const a = toDisplay(quantity, siRange.min, system);
  const b = toDisplay(quantity, siRange.max, system);
  // Strip float noise (23.000000000000004) before rounding inward.
  const clean = (value: number) => Number(value.toPrecision(12));
  return {
    min: Math.ceil(clean(Math.min(a, b)) * factor) / factor,
    max: Math.floor(clean(Math.max(a, b)) * factor) / factor,
  };
}

/** Energy also shown as therms where fuel is billed that way (US natural gas). */
export function joulesToTherms(joules: number): number {
  return joules / JOULES_PER_THERM;
}

export function thermsToJoules(therms: number): number {
  return therms * JOULES_PER_THERM;
}

/** kWh of heat as therms (US gas bills); 1 kWh = 3.6 MJ, 1 therm = 10^5 Btu_IT. */
export function kWhToTherms(kWh: number): number {
  return (kWh * JOULES_PER_KWH) / JOULES_PER_THERM;
}

/** The ISO 4217 codes this browser can format, for the farm's currency list. */
export function currencyCodes(): string[] {
  try {
    return Intl.supportedValuesOf('currency');
  } catch {
    return ['USD', 'EUR', 'CAD', 'GBP', 'MXN', 'AUD'];
  }
}

/** Decimals a currency is usually written with (2 for USD, EUR; 0 for JPY). */
export function currencyDecimals(currency: string): number {
  try {
    return new Intl.NumberFormat('en-US', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

/**
 * Money has no unit conversion: it is written in the farm's currency (an ISO 4217 code) with
 * Intl.NumberFormat, e.g. "$1,234.50", "€1,234.50", "CA$1,234.50". `decimals` defaults to the
 * currency's own; '—' for no amount.
 */
export function formatMoney(amount: number | null | undefined, currency: string, decimals?: number): string {
  if (amount === null || amount === undefined || !Number.isFinite(amount)) return '—';
  let digits = decimals ?? currencyDecimals(currency);
  try {
    return new Intl.NumberFormat('en-US', {
      style: 'currency',
      currency,
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    }).format(roundTo(amount, digits) || 0);
  } catch {
    // an unknown code (never stored by the API): the number with the code beside it
    digits = decimals ?? 2;
    const number = new Intl.NumberFormat('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
    return `${number.format(roundTo(amount, digits))} ${currency}`;
  }
}

/** The currency's sign alone, e.g. '$', '€', 'CA$' (for a column heading or beside a box). */
export function currencySymbol(currency: string): string {
  try {
    const part = new Intl.NumberFormat('en-US', { style: 'currency', currency })
      .formatToParts(0)
      .find((item) => item.type === 'currency');
    return part?.value ?? currency;
  } catch {
    return currency;
  }
}

/** A fuel amount the API gives in both of the fuel's purchase units (e.g. m³ and therm). */
export interface FuelAmount {
  fuelQuantitySi: number;
  fuelQuantityUs: number;
}

/** The fuel's purchase units as the reference data names them (e.g. 'L' and 'US gal'). */
export interface FuelUnits {
  unitSi: string;
  unitUs: string;
}

/**
 * Fuel quantities are not converted here: natural gas by the m³ and by the therm differ by a
 * heat content, so the API gives both and this picks the one for the user's system.
 */
export function fuelQuantityIn(amount: FuelAmount, system: UnitSystem): number {
  return system === 'us' ? amount.fuelQuantityUs : amount.fuelQuantitySi;
}

export function fuelUnitIn(units: FuelUnits, system: UnitSystem): string {
  return system === 'us' ? units.unitUs : units.unitSi;
}

/** Decimals for a fuel amount: whole units for large amounts, more for small ones. */
function fuelDecimals(value: number): number {
  const magnitude = Math.abs(value);
  if (magnitude >= 100 || magnitude === 0) return 0;
  if (magnitude >= 1) return 1;
  return 2;
}

export function formatFuelQuantity(
  amount: FuelAmount | null | undefined,
  fuelUnits: FuelUnits | null | undefined,
  system: UnitSystem,
  options: FormatOptions = {},
): string {
  if (!amount || !fuelUnits) return '—';
  const value = fuelQuantityIn(amount, system);
  if (!Number.isFinite(value)) return '—';
  const decimals = options.decimals ?? fuelDecimals(value);
  const number = new Intl.NumberFormat('en-US', {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  }).format(roundTo(value, decimals));
  return options.withoutUnit ? number : `${number} ${fuelUnitIn(fuelUnits, system)}`;
}

/**
 * Engine prose (cautions, advice, explanations) carries its quantities as tokens
 * `{{kind:valueSI}}`, e.g. `{{power:70300}}`, where kind is a Quantity and the value is in the
 * SI unit of the API (W, m, °C, K, m², J, m²/W …).
 */
const PROSE_TOKEN = /\{\{([A-Za-z]+):(-?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?)\}\}/g;

const isQuantity = isDisplayQuantity;

/**
 * Engine prose with each quantity token written in the user's units:
 * 'Installed output {{power:70300}} …' → 'Installed output 239,869 Btu/h …' (US). A kind this
 * module does not know shows its bare number (its unit is unknown here), never the braces.
 */
export function formatProse(text: string | null | undefined, system: UnitSystem): string {
  if (!text) return '';
  return text.replace(PROSE_TOKEN, (_token, kind: string, raw: string) => {
    const valueSi = Number(raw);
    if (!isQuantity(kind)) {
      return new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 }).format(valueSi);
    }
    return formatQuantity(kind, valueSi, system);
  });
}

export interface Units {
  system: UnitSystem;
  label: (quantity: Quantity) => string;
  decimals: (quantity: Quantity) => number;
  toDisplay: (quantity: Quantity, siValue: number) => number;
  fromDisplay: (quantity: Quantity, displayValue: number) => number;
  format: (quantity: Quantity, siValue: number | null | undefined, options?: FormatOptions) => string;
  toInput: (quantity: Quantity, siValue: number | null | undefined) => string;
  range: (quantity: Quantity, siRange: { min: number; max: number }) => { min: number; max: number };
  /** money in the farm's currency (ISO 4217 code; no conversion) */
  money: (amount: number | null | undefined, currency: string, decimals?: number) => string;
  fuel: (
    amount: FuelAmount | null | undefined,
    fuelUnits: FuelUnits | null | undefined,
    options?: FormatOptions,
  ) => string;
  fuelValue: (amount: FuelAmount) => number;
  fuelUnit: (fuelUnits: FuelUnits) => string;
  /** engine prose with its {{kind:valueSI}} tokens in the user's units */
  prose: (text: string | null | undefined) => string;
}

export function unitsFor(system: UnitSystem): Units {
  return {
    system,
    label: (quantity) => unitLabel(quantity, system),
    decimals: (quantity) => unitDecimals(quantity, system),
    toDisplay: (quantity, siValue) => toDisplay(quantity, siValue, system),
    fromDisplay: (quantity, displayValue) => fromDisplay(quantity, displayValue, system),
    format: (quantity, siValue, options) => formatQuantity(quantity, siValue, system, options),
    toInput: (quantity, siValue) => toInputString(quantity, siValue, system),
    range: (quantity, siRange) => rangeInDisplay(quantity, siRange, system),
    money: (amount, currency, decimals) => formatMoney(amount, currency, decimals),
    fuel: (amount, fuelUnits, options) => formatFuelQuantity(amount, fuelUnits, system, options),
    fuelValue: (amount) => fuelQuantityIn(amount, system),
    fuelUnit: (fuelUnits) => fuelUnitIn(fuelUnits, system),
    prose: (text) => formatProse(text, system),
  };
}

/**
 * The signed-in user's unit system. The app provides it from the current-user query, so this
 * module depends on no feature.
 */
const UnitSystemContext = createContext<UnitSystem>('si');

export function UnitSystemProvider({ system, children }: { system: UnitSystem; children: ReactNode }) {
  return createElement(UnitSystemContext.Provider, { value: system }, children);
}

/** Conversions and formatting in the signed-in user's unit system. */
export function useUnits(): Units {
  const system = useContext(UnitSystemContext);
  return useMemo(() => unitsFor(system), [system]);
}
