import {
  DISPLAY_UNITS,
  QUANTITY_TOKEN_PATTERN,
  isDisplayQuantity,
  siToShown,
  type DisplayQuantity,
  type UnitSystem,
} from '@thermbay/engine/vocabulary';

/**
 * SI → the reader's units for the server-built report (web page and PDF), from the same table the
 * UI reads (`DISPLAY_UNITS` of the vocabulary); the report is built here because the PDF is rendered
 * on the server.
 */
export type { UnitSystem };

export type ReportQuantity = DisplayQuantity;

export function unitLabel(kind: ReportQuantity, system: UnitSystem): string {
  return DISPLAY_UNITS[kind][system].label;
}

/** The number alone, in the reader's unit. */
export function convert(kind: ReportQuantity, valueSi: number, system: UnitSystem): number {
  return siToShown(kind, valueSi, system);
}

export function formatNumber(value: number, decimals: number): string {
  const shown = Number(value.toFixed(decimals)) || 0;
  return new Intl.NumberFormat('en-US', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }).format(
    shown,
  );
}

/** "70.3 kW" / "239,877 Btu/h" */
export function format(kind: ReportQuantity, valueSi: number | null | undefined, system: UnitSystem): string {
  if (valueSi === null || valueSi === undefined || !Number.isFinite(valueSi)) return '—';
  const unit = DISPLAY_UNITS[kind][system];
  return `${formatNumber(convert(kind, valueSi, system), unit.decimals)} ${unit.label}`;
}

/** Engine prose with its {{kind:valueSI}} tokens written in the reader's units. */
export function prose(text: string, system: UnitSystem): string {
  return text.replace(QUANTITY_TOKEN_PATTERN, (_token, kind: string, raw: string) =>
    isDisplayQuantity(kind) ? format(kind, Number(raw), system) : raw,
  );
}
