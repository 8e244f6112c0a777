import { DISPLAY_UNITS } from './display-units';

/**
 * Quantities inside engine prose (cautions, advice, explanations, measure descriptions).
 *
 * The engine writes every physical number in a sentence as a token `{{kind:valueSI}}`, e.g.
 * `{{power:70300}}` or `{{length:0.61}}`, so that the reader's unit system decides how it is shown:
 * the frontend replaces tokens in `lib/units.ts` (`formatProse`), and consumers without a unit
 * preference (CSV export, logs, tests) use `proseToPlainSi`. Kind names are the frontend's quantity
 * names; values are always in the SI base unit of the kind (W, m, °C, K, m², J …), never pre-scaled.
 */

/** SI base unit of each kind's token value. */
const SI_UNIT_OF_KIND = {
  length: 'm',
  area: 'm²',
  /** small areas such as an inlet or a flue (shown as cm² / in²); still m² in the token */
  smallArea: 'm²',
  volume: 'm³',
  temperature: '°C',
  temperatureDifference: 'K',
  power: 'W',
  uValue: 'W/(m²·K)',
  airFlow: 'm³/s',
  airFlowPerFloorArea: 'm³/(s·m²)',
  /** energy in joules (shown as kWh) */
  energy: 'J',
  irradiance: 'W/m²',
  conductance: 'W/K',
  velocity: 'm/s',
  illuminance: 'lx',
  pressure: 'Pa',
  density: 'kg/m³',
  /** free area per heater input, m² per W (shown as cm² per kW) */
  areaPerPower: 'm²/W',
} as const;

export type QuantityKind = keyof typeof SI_UNIT_OF_KIND;

export const QUANTITY_KINDS = Object.keys(SI_UNIT_OF_KIND) as QuantityKind[];

export function siUnitOfKind(kind: QuantityKind): string {
  return SI_UNIT_OF_KIND[kind];
}

/** Significant digits kept in a token: enough for any unit conversion to round correctly. */
const TOKEN_SIGNIFICANT_DIGITS = 6;

/**
 * A quantity to place in prose, as `{{kind:valueSI}}`. A value that is not a finite number is
 * written as a dash (there is nothing to convert).
 */
export function quantityToken(kind: QuantityKind, valueSi: number): string {
  if (!(kind in SI_UNIT_OF_KIND)) throw new Error(`unknown quantity kind '${kind}'`);
  if (typeof valueSi !== 'number' || !Number.isFinite(valueSi)) return '—';
  // toPrecision strips float noise (0.30000000000000004); Number() drops trailing zeros; `|| 0` drops −0.
  const value = Number(valueSi.toPrecision(TOKEN_SIGNIFICANT_DIGITS)) || 0;
  return `{{${kind}:${value}}}`;
}

/** Short alias for building sentences: q('power', 70300) → '{{power:70300}}'. */
export const q = quantityToken;

/** Matches one token; group 1 the kind, group 2 the SI value (may use exponent notation). */
export const QUANTITY_TOKEN_PATTERN = /\{\{([A-Za-z]+):(-?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?)\}\}/g;

function isQuantityKind(kind: string): kind is QuantityKind {
  return Object.prototype.hasOwnProperty.call(SI_UNIT_OF_KIND, kind);
}

/**
 * Prose with its tokens written out in SI for readers without a unit preference:
 * 'Installed output {{power:70300}} …' → 'Installed output 70.3 kW …'. An unknown kind shows its
 * bare number.
 */
export function proseToPlainSi(text: string): string {
  return text.replace(QUANTITY_TOKEN_PATTERN, (_token, kind: string, raw: string) => {
    const valueSi = Number(raw);
    if (!isQuantityKind(kind)) return raw;
    const unit = DISPLAY_UNITS[kind].si; // as the app shows SI readers
    const shown = Number((valueSi / unit.siPerUnit).toFixed(unit.decimals)) || 0; // `|| 0`: no "-0.0"
    const number = new Intl.NumberFormat('en-US', {
      minimumFractionDigits: unit.decimals,
      maximumFractionDigits: unit.decimals,
    }).format(shown);
    return `${number} ${unit.label}`;
  });
}

/** True when the text still holds a quantity token. */
export function hasQuantityTokens(text: string): boolean {
  return new RegExp(QUANTITY_TOKEN_PATTERN.source).test(text);
}

/** API documentation for every field that carries engine prose. */
export const PROSE_TOKENS_NOTE = "may contain {{kind:valueSI}} quantity tokens; show them in the reader's units";
