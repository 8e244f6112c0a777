import { QUANTITY_TOKEN_PATTERN } from '@thermbay/engine/vocabulary';

/**
 * SI → the reader's units for the server-built report (web page and PDF). The factors are the
 * frontend's `lib/units.ts` ones (exact definitions); the report is built here because the PDF is
 * rendered on the server.
 */
export type UnitSystem = 'si' | 'us';

const METRES_PER_FOOT = 0.3048;
const JOULES_PER_BTU = 1055.05585262;
const WATTS_PER_BTU_PER_HOUR = JOULES_PER_BTU / 3600;
const KELVIN_PER_FAHRENHEIT_DEGREE = 5 / 9;
const JOULES_PER_KWH = 3.6e6;
const JOULES_PER_MMBTU = 1e6 * JOULES_PER_BTU;

interface Unit {
  label: string;
  siPerUnit: number;
  decimals: number;
  offset?: number;
}

const UNITS: Record<string, Record<UnitSystem, Unit>> = {
  length: {
    si: { label: 'm', siPerUnit: 1, decimals: 2 },
    us: { label: 'ft', siPerUnit: METRES_PER_FOOT, decimals: 1 },
  },
  area: {
    si: { label: 'm²', siPerUnit: 1, decimals: 1 },
    us: { label: 'ft²', siPerUnit: METRES_PER_FOOT ** 2, decimals: 0 },
  },
  smallArea: {
    si: { label: 'cm²', siPerUnit: 1e-4, decimals: 0 },
    us: { label: 'in²', siPerUnit: 0.0254 ** 2, decimals: 0 },
  },
  volume: {
    si: { label: 'm³', siPerUnit: 1, decimals: 0 },
    us: { label: 'ft³', siPerUnit: METRES_PER_FOOT ** 3, decimals: 0 },
  },
  temperature: {
    si: { label: '°C', siPerUnit: 1, decimals: 1 },
    us: { label: '°F', siPerUnit: KELVIN_PER_FAHRENHEIT_DEGREE, decimals: 1, offset: 32 },
  },
  temperatureDifference: {
    si: { label: 'K', siPerUnit: 1, decimals: 1 },
    us: { label: '°F', siPerUnit: KELVIN_PER_FAHRENHEIT_DEGREE, decimals: 1 },
  },
  power: {
    si: { label: 'kW', siPerUnit: 1000, decimals: 1 },
    us: { label: 'Btu/h', siPerUnit: WATTS_PER_BTU_PER_HOUR, decimals: 0 },
  },
  uValue: {
    si: { label: 'W/(m²·K)', siPerUnit: 1, decimals: 2 },
    us: {
      label: 'Btu/(h·ft²·°F)',
      siPerUnit: WATTS_PER_BTU_PER_HOUR / METRES_PER_FOOT ** 2 / KELVIN_PER_FAHRENHEIT_DEGREE,
      decimals: 3,
    },
  },
  perimeterF: {
    si: { label: 'W/(m·K)', siPerUnit: 1, decimals: 2 },
    us: {
      label: 'Btu/(h·ft·°F)',
      siPerUnit: WATTS_PER_BTU_PER_HOUR / METRES_PER_FOOT / KELVIN_PER_FAHRENHEIT_DEGREE,
      decimals: 3,
    },
  },
  conductance: {
    si: { label: 'W/K', siPerUnit: 1, decimals: 0 },
    us: { label: 'Btu/(h·°F)', siPerUnit: WATTS_PER_BTU_PER_HOUR / KELVIN_PER_FAHRENHEIT_DEGREE, decimals: 0 },
  },
  energy: {
    si: { label: 'kWh', siPerUnit: JOULES_PER_KWH, decimals: 0 },
    us: { label: 'MMBtu', siPerUnit: JOULES_PER_MMBTU, decimals: 2 },
  },
  energyKWh: {
    si: { label: 'kWh', siPerUnit: 1, decimals: 0 },
    us: { label: 'MMBtu', siPerUnit: JOULES_PER_MMBTU / JOULES_PER_KWH, decimals: 2 },
  },
  airFlow: {
    si: { label: 'm³/s', siPerUnit: 1, decimals: 2 },
    us: { label: 'cfm', siPerUnit: METRES_PER_FOOT ** 3 / 60, decimals: 0 },
  },
  velocity: {
    si: { label: 'm/s', siPerUnit: 1, decimals: 2 },
    us: { label: 'ft/min', siPerUnit: METRES_PER_FOOT / 60, decimals: 0 },
  },
  pressure: {
    si: { label: 'kPa', siPerUnit: 1000, decimals: 1 },
    us: { label: 'psi', siPerUnit: 6894.757, decimals: 2 },
  },
  density: {
    si: { label: 'kg/m³', siPerUnit: 1, decimals: 3 },
    us: { label: 'lb/ft³', siPerUnit: 16.01846, decimals: 4 },
  },
  areaPerPower: {
    si: { label: 'cm²/kW', siPerUnit: 1e-7, decimals: 1 },
    us: { label: 'in² per 1,000 Btu/h', siPerUnit: 0.0254 ** 2 / (1000 * WATTS_PER_BTU_PER_HOUR), decimals: 2 },
  },
  irradiance: { si: { label: 'W/m²', siPerUnit: 1, decimals: 0 }, us: { label: 'W/m²', siPerUnit: 1, decimals: 0 } },
  illuminance: { si: { label: 'lx', siPerUnit: 1, decimals: 0 }, us: { label: 'fc', siPerUnit: 10.7639, decimals: 0 } },
  airFlowPerFloorArea: {
    si: { label: 'm³/(s·m²)', siPerUnit: 1, decimals: 4 },
    us: { label: 'cfm/ft²', siPerUnit: METRES_PER_FOOT ** 3 / 60 / METRES_PER_FOOT ** 2, decimals: 1 },
  },
};

export type ReportQuantity = keyof typeof UNITS;

export function unitLabel(kind: ReportQuantity, system: UnitSystem): string {
  return UNITS[kind]![system].label;
}

/** The number alone, in the reader's unit. */
export function convert(kind: ReportQuantity, valueSi: number, system: UnitSystem): number {
  const unit = UNITS[kind]![system];
  return valueSi / unit.siPerUnit + (unit.offset ?? 0);
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
  const unit = UNITS[kind]![system];
  return `${formatNumber(convert(kind, valueSi, system), unit.decimals)} ${unit.label}`;
}

/** Engine prose with its {{kind:valueSI}} tokens written in the reader's units. */
export function prose(text: string, system: UnitSystem): string {
  return text.replace(QUANTITY_TOKEN_PATTERN, (_token, kind: string, raw: string) =>
    kind in UNITS ? format(kind, Number(raw), system) : raw,
  );
}
