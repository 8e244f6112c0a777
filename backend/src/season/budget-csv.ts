import { JOULES_PER_BTU, JOULES_PER_KWH } from '@thermbay/engine/season/fuel';
import { moneyHeading, plainAmount } from '../common/money';
import type { BudgetFuelTotalDto, SeasonBudgetDto } from './dto/season-budget.dto';

export type CsvUnits = 'si' | 'us';

/** kWh in one million Btu (from the Btu's definition in joules). */
export const KWH_PER_MMBTU = (1e6 * JOULES_PER_BTU) / JOULES_PER_KWH;

/** A cell that a spreadsheet would run as a formula: =, +, -, @, or their full-width forms, after any whitespace. */
const FORMULA_START = /^[\s\u3000]*[=+\-@\t\r\uFF1D\uFF0B\uFF0D\uFF20]/;
/** A plain number (negative ones included): written as it is, since no spreadsheet runs it. */
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

/**
 * A field as the exports write it: always quoted, and never read as a formula by a spreadsheet
 * (text that begins like one gets a leading apostrophe, which spreadsheets show as text).
 */
export function csvField(value: string | number | null): string {
  if (value === null) return '""';
  let text = String(value);
  if (!PLAIN_NUMBER.test(text) && FORMULA_START.test(text)) text = `'${text}`;
  return `"${text.replace(/"/g, '""')}"`;
}

/** UTF-8 byte-order mark: spreadsheets then read "m³" and "–" as written rather than as a legacy code page. */
export const UTF8_BOM = '\uFEFF';

/**
 * The budget as CSV: one row per house per month, a season total per house, then the farm's
 * months and season total. The header names every unit: heat in kWh (SI) or MMBtu (US), and
 * one fuel column per fuel in its SI or US purchase unit (m³ / therm, L / US gal …), and the
 * farm's currency ("Cost (EUR)"); amounts are plain numbers in the currency's own decimals, and
 * empty where a house has no fuel price.
 */
export function budgetCsv(budget: SeasonBudgetDto, units: CsvUnits): string {
  const energyUnit = units === 'si' ? 'kWh' : 'MMBtu';
  const energy = (kWh: number) => (units === 'si' ? kWh.toFixed(0) : (kWh / KWH_PER_MMBTU).toFixed(3));
  const fuels: BudgetFuelTotalDto[] = budget.byFuel;
  const unitOf = (fuel: BudgetFuelTotalDto) => (units === 'si' ? fuel.unitSi : fuel.unitUs);
  const quantity = (si: number, us: number) => (units === 'si' ? si : us).toFixed(1);
  const money = (amount: number | null) => plainAmount(amount, budget.currency) ?? '';

  const header = [
    'House',
    'Year',
    'Month',
    'Fuel',
    `Heat delivered (${energyUnit})`,
    `Fuel burnt (${energyUnit})`,
    ...fuels.map((fuel) => `${fuel.label} (${unitOf(fuel)})`),
    moneyHeading('Cost', budget.currency),
  ];
  const lines: string[][] = [header];
  const fuelCells = (fuelId: string | null, si: number, us: number) =>
    fuels.map((fuel) => (fuel.fuelId === fuelId ? quantity(si, us) : ''));

  for (const house of budget.houses) {
    for (const month of house.monthly) {
      lines.push([
        house.name,
        String(month.year),
        String(month.month),
        house.fuelLabel ?? '',
        energy(month.energyKWh),
        energy(month.fuelInputKWh),
        ...fuelCells(house.fuelId, month.fuelQuantitySi, month.fuelQuantityUs),
        money(month.cost),
      ]);
    }
    lines.push([
      house.name,
      '',
      'season total',
      house.fuelLabel ?? '',
      energy(house.energyKWh),
      energy(house.fuelInputKWh),
      ...fuelCells(house.fuelId, house.fuelQuantitySi, house.fuelQuantityUs),
      money(house.cost),
    ]);
  }
  for (const month of budget.monthly) {
    lines.push([
      'All houses',
      String(month.year),
      String(month.month),
      '',
      energy(month.energyKWh),
      energy(month.fuelInputKWh),
      ...fuels.map((fuel) => {
        const entry = month.byFuel.find((item) => item.fuelId === fuel.fuelId);
        return entry ? quantity(entry.fuelQuantitySi, entry.fuelQuantityUs) : '';
      }),
      money(month.cost),
    ]);
  }
  lines.push([
    'All houses',
    '',
    'season total',
    '',
    energy(budget.totalEnergyKWh),
    energy(budget.houses.reduce((sum, house) => sum + house.fuelInputKWh, 0)),
    ...fuels.map((fuel) => quantity(fuel.fuelQuantitySi, fuel.fuelQuantityUs)),
    money(budget.totalCost),
  ]);
  return UTF8_BOM + lines.map((cells) => cells.map(csvField).join(',')).join('\r\n') + '\r\n';
}
