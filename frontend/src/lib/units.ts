import { createContext, createElement, useContext, useMemo, type ReactNode } from 'react';

/**
 * The one place where SI values (as stored and computed) become what the user reads, and where
 * typed values become SI again. Factors are exact definitions (NIST SP 811, Appendix B) or
 * built from them, so a round trip loses nothing but floating-point noise.
 */

export type UnitSystem = 'si' | 'us';

// Exact definitions.
export const METRES_PER_FOOT = 0.3048;
export const SQUARE_METRES_PER_SQUARE_FOOT = METRES_PER_FOOT ** 2; // 0.092 903 04
export const CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3; // 0.028 316 846 592
export const JOULES_PER_BTU = 1055.05585262; // International Table Btu
export const SECONDS_PER_HOUR = 3600;
export const JOULES_PER_KWH = 3.6e6;
export const KELVIN_PER_FAHRENHEIT_DEGREE = 5 / 9;
export const LITRES_PER_US_GALLON = 3.785411784;
export const KILOGRAMS_PER_POUND = 0.45359237;
export const SQUARE_METRES_PER_SQUARE_INCH = 0.0254 ** 2; // 6.4516 E-04
export const LUX_PER_FOOTCANDLE = 1 / SQUARE_METRES_PER_SQUARE_FOOT; // lumen per ft² → lumen per m²
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665; // defines the pound-force
/** lbf/in² = 0.453 592 37 kg × 9.806 65 m/s² / (0.0254 m)² */
export const PASCALS_PER_PSI = (KILOGRAMS_PER_POUND * STANDARD_GRAVITY_M_PER_S2) / SQUARE_METRES_PER_SQUARE_INCH;
/** 1 therm = 100 000 Btu_IT (the "EC" therm; the US-statute therm on the 59 °F Btu is 0.02 % smaller). */
export const JOULES_PER_THERM = 1e5 * JOULES_PER_BTU;
export const JOULES_PER_MMBTU = 1e6 * JOULES_PER_BTU;

// Derived from the exact ones.
export const WATTS_PER_BTU_PER_HOUR = JOULES_PER_BTU / SECONDS_PER_HOUR;
export const WATTS_PER_M2K_PER_BTU_PER_HFT2F =
  WATTS_PER_BTU_PER_HOUR / SQUARE_METRES_PER_SQUARE_FOOT / KELVIN_PER_FAHRENHEIT_DEGREE;
export const CUBIC_METRES_PER_SECOND_PER_CFM = CUBIC_METRES_PER_CUBIC_FOOT / 60;
export const M3_PER_S_M2_PER_CFM_PER_FT2 = CUBIC_METRES_PER_SECOND_PER_CFM / SQUARE_METRES_PER_SQUARE_FOOT;
export const W_PER_MK_PER_BTU_PER_HFTF = WATTS_PER_BTU_PER_HOUR / METRES_PER_FOOT / KELVIN_PER_FAHRENHEIT_DEGREE;
export const W_PER_K_PER_BTU_PER_HF = WATTS_PER_BTU_PER_HOUR / KELVIN_PER_FAHRENHEIT_DEGREE;
export const METRES_PER_SECOND_PER_FOOT_PER_MINUTE = METRES_PER_FOOT / 60;
export const KG_PER_M3_PER_LB_PER_FT3 = KILOGRAMS_PER_POUND / CUBIC_METRES_PER_CUBIC_FOOT;
export const J_PER_KGK_PER_BTU_PER_LBF = JOULES_PER_BTU / KILOGRAMS_PER_POUND / KELVIN_PER_FAHRENHEIT_DEGREE;
/** combustion-air inlet sizing: in² of free area per 1000 Btu/h of heater input */
export const M2_PER_W_PER_IN2_PER_KBTUH = SQUARE_METRES_PER_SQUARE_INCH / (1000 * WATTS_PER_BTU_PER_HOUR);

export type Quantity =
  | 'length'
  | 'area'
  | 'smallArea'
  | 'volume'
  | 'temperature'
  | 'temperatureDifference'
  | 'power'
  | 'uValue'
  | 'airFlow'
  | 'airFlowPerFloorArea'
  | 'energy'
  | 'irradiance'
  | 'heatContentPerVolume'
  | 'heatContentPerLiquidVolume'
  | 'heatContentPerMass'
  | 'energyKWh'
  | 'degreeDays'
  | 'fraction'
  | 'durationHours'
  | 'perimeterFactor'
  | 'conductance'
  | 'velocity'
  | 'windSpeed'
  | 'illuminance'
  | 'pressure'
  | 'density'
  | 'specificHeat'
  | 'areaPerPower';

interface UnitDefinition {
  /** symbol shown after the number */
  label: string;
  /** SI value (the API's unit) → value in this unit */
  fromSi: (siValue: number) => number;
  /** value in this unit → SI value */
  toSi: (displayValue: number) => number;
  /** decimals shown and offered in inputs */
  decimals: number;
}

const scaled = (label: string, siPerUnit: number, decimals: number): UnitDefinition => ({
  label,
  fromSi: (siValue) => siValue / siPerUnit,
  toSi: (displayValue) => displayValue * siPerUnit,
  decimals,
});

/** SI units per quantity: the API's unit, except power (W shown as kW) and energy (J as kWh). */
const UNITS: Record<Quantity, Record<UnitSystem, UnitDefinition>> = {
  length: { si: scaled('m', 1, 2), us: scaled('ft', METRES_PER_FOOT, 1) },
  area: { si: scaled('m²', 1, 1), us: scaled('ft²', SQUARE_METRES_PER_SQUARE_FOOT, 0) },
  // SI value in m², for openings such as a combustion-air inlet: cm² / in²
  smallArea: { si: scaled('cm²', 1e-4, 0), us: scaled('in²', SQUARE_METRES_PER_SQUARE_INCH, 0) },
  volume: { si: scaled('m³', 1, 0), us: scaled('ft³', CUBIC_METRES_PER_CUBIC_FOOT, 0) },
  temperature: {
    si: scaled('°C', 1, 1),
    us: {
      label: '°F',
      fromSi: (celsius) => celsius * 1.8 + 32,
      toSi: (fahrenheit) => (fahrenheit - 32) / 1.8,
      decimals: 1,
    },
  },
  temperatureDifference: {
    si: scaled('K', 1, 1),
    us: scaled('°F', KELVIN_PER_FAHRENHEIT_DEGREE, 1),
  },
  power: { si: scaled('kW', 1000, 1), us: scaled('Btu/h', WATTS_PER_BTU_PER_HOUR, 0) },
  uValue: {
    si: scaled('W/(m²·K)', 1, 2),
    us: scaled('Btu/(h·ft²·°F)', WATTS_PER_M2K_PER_BTU_PER_HFT2F, 3),
  },
  airFlow: { si: scaled('m³/s', 1, 2), us: scaled('cfm', CUBIC_METRES_PER_SECOND_PER_CFM, 0) },
  airFlowPerFloorArea: {
    si: scaled('m³/(s·m²)', 1, 4),
    us: scaled('cfm/ft²', M3_PER_S_M2_PER_CFM_PER_FT2, 1),
  },
  energy: { si: scaled('kWh', JOULES_PER_KWH, 0), us: scaled('MMBtu', JOULES_PER_MMBTU, 2) },
  irradiance: { si: scaled('W/m²', 1, 0), us: scaled('W/m²', 1, 0) },
  heatContentPerVolume: {
    si: scaled('MJ/m³', 1e6, 1),
    us: scaled('Btu/ft³', JOULES_PER_BTU / CUBIC_METRES_PER_CUBIC_FOOT, 0),
  },
  heatContentPerLiquidVolume: {
    // SI value is J per litre here (fuel is bought by the litre)
    si: scaled('MJ/L', 1e6, 2),
    us: scaled('Btu/gal', JOULES_PER_BTU / LITRES_PER_US_GALLON, 0),
  },
  heatContentPerMass: {
    si: scaled('MJ/kg', 1e6, 1),
    us: scaled('Btu/lb', JOULES_PER_BTU / KILOGRAMS_PER_POUND, 0),
  },
  // The season routes give energy in kWh (not J): this quantity's SI value is kWh.
  energyKWh: { si: scaled('kWh', 1, 0), us: scaled('MMBtu', JOULES_PER_MMBTU / JOULES_PER_KWH, 2) },
  // K·day to a base temperature; a °F·day is 5/9 of a K·day.
  degreeDays: { si: scaled('K·d', 1, 0), us: scaled('°F·d', KELVIN_PER_FAHRENHEIT_DEGREE, 0) },
  // A share 0–1 shown as a percentage (clearness, light transmission, efficiency).
  fraction: { si: scaled('%', 0.01, 0), us: scaled('%', 0.01, 0) },
  durationHours: { si: scaled('h', 1, 1), us: scaled('h', 1, 1) },
  // perimeter heat-loss factor F (W per metre of perimeter per kelvin)
  perimeterFactor: {
    si: scaled('W/(m·K)', 1, 2),
    us: scaled('Btu/(h·ft·°F)', W_PER_MK_PER_BTU_PER_HFTF, 3),
  },
  // UA of a whole house
  conductance: { si: scaled('W/K', 1, 0), us: scaled('Btu/(h·°F)', W_PER_K_PER_BTU_PER_HF, 0) },
  velocity: { si: scaled('m/s', 1, 2), us: scaled('ft/min', METRES_PER_SECOND_PER_FOOT_PER_MINUTE, 0) },
  // wind is read in m/s and in miles per hour (1 mph = 0.44704 m/s exactly)
  windSpeed: { si: scaled('m/s', 1, 1), us: scaled('mph', 0.44704, 1) },
  illuminance: { si: scaled('lx', 1, 0), us: scaled('fc', LUX_PER_FOOTCANDLE, 0) },
  pressure: { si: scaled('kPa', 1000, 1), us: scaled('psi', PASCALS_PER_PSI, 2) },
  density: { si: scaled('kg/m³', 1, 3), us: scaled('lb/ft³', KG_PER_M3_PER_LB_PER_FT3, 4) },
  specificHeat: { si: scaled('J/(kg·K)', 1, 0), us: scaled('Btu/(lb·°F)', J_PER_KGK_PER_BTU_PER_LBF, 3) },
  // SI value in m² per W; shown as cm² per kW (1 cm²/kW = 1E-07 m²/W)
  areaPerPower: { si: scaled('cm²/kW', 1e-7, 1), us: scaled('in² per 1,000 Btu/h', M2_PER_W_PER_IN2_PER_KBTUH, 2) },
};

/**
 * The unit strings the API writes beside SI numbers (e.g. in assumption lists) → the quantity that
 * converts them. Null for units that read the same in both systems (1/h, %, ppm, fraction, counts).
 */
const QUANTITY_OF_SI_UNIT: Record<string, Quantity> = {
  m: 'length',
  'm²': 'area',
  'm³': 'volume',
  '°C': 'temperature',
  K: 'temperatureDifference',
  W: 'power',
  'W/(m²·K)': 'uValue',
  'W/(m·K)': 'perimeterFactor',
  'W/K': 'conductance',
  'm³/s': 'airFlow',
  'm³/(s·m²)': 'airFlowPerFloorArea',
  'W/m²': 'irradiance',
  'm/s': 'velocity',
  lx: 'illuminance',
  Pa: 'pressure',
  'kg/m³': 'density',
  'J/(kg·K)': 'specificHeat',
  'm²/W': 'areaPerPower',
};

export function quantityOfSiUnit(unit: string): Quantity | null {
  return QUANTITY_OF_SI_UNIT[unit.trim()] ?? null;
}

export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return UNITS[quantity][system].label;
}

export function unitDecimals(quantity: Quantity, system: UnitSystem): number {
  return UNITS[quantity][system].decimals;
}

/** SI value → number in the user's unit (unrounded). */
export function toDisplay(quantity: Quantity, siValue: number, system: UnitSystem): number {
  return UNITS[quantity][system].fromSi(siValue);
}

/** Number typed in the user's unit → SI value (unrounded). */
export function fromDisplay(quantity: Quantity, displayValue: number, system: UnitSystem): number {
  return UNITS[quantity][system].toSi(displayValue);
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

function isQuantity(kind: string): kind is Quantity {
  return Object.prototype.hasOwnProperty.call(UNITS, kind);
}

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
