import * as yup from 'yup';
import type { FuelPrice, FuelPricesInput, PriceUnit, ReferenceRow, UnitSystem } from '../../api/types';

/** One fuel's row as typed: a blank price means the farm has no price for that fuel. */
export interface FuelPriceRowValues {
  fuelId: string;
  label: string;
  unitSi: string;
  unitUs: string;
  price: string;
  priceUnit: PriceUnit;
  note: string;
}

export interface FuelPriceFormValues {
  rows: FuelPriceRowValues[];
}

const text = (value: unknown) => (typeof value === 'string' ? value : '');

/** Every fuel of the reference table, with the farm's stored price where it has one. */
export function fuelPriceFormValues(
  fuels: ReferenceRow[],
  stored: FuelPrice[],
  system: UnitSystem,
): FuelPriceFormValues {
  return {
    rows: fuels.map((fuel) => {
      const price = stored.find((row) => row.fuelId === fuel.id);
      return {
        fuelId: fuel.id,
        label: fuel.label ?? fuel.id,
        unitSi: text(fuel.unitSi),
        unitUs: text(fuel.unitUs),
        price: price ? String(price.pricePerUnit) : '',
        // A fuel not priced yet offers the unit of the user's own system first.
        priceUnit: price?.priceUnit ?? system,
        note: price?.note ?? '',
      };
    }),
  };
}

export function toFuelPricesInput(values: FuelPriceFormValues): FuelPricesInput {
  return {
    prices: values.rows
      .filter((row) => row.price.trim() !== '')
      .map((row) => ({
        fuelId: row.fuelId,
        pricePerUnit: Number(row.price),
        priceUnit: row.priceUnit,
        note: row.note.trim() || null,
      })),
  };
}

/** The unit a row's price is per, e.g. 'therm' or 'm³'. */
export function priceUnitLabel(row: Pick<FuelPriceRowValues, 'unitSi' | 'unitUs' | 'priceUnit'>): string {
  return row.priceUnit === 'us' ? row.unitUs : row.unitSi;
}

export const fuelPriceFormSchema = yup.object({
  rows: yup.array(
    yup.object({
      price: yup.string().test('price', 'Enter a price of 0 or more, or leave it blank', (value) => {
        if (!value || value.trim() === '') return true;
        const number = Number(value);
        return Number.isFinite(number) && number >= 0 && number <= 1e6;
      }),
      priceUnit: yup.mixed<PriceUnit>().oneOf(['si', 'us']).required(),
      note: yup.string().max(300, 'At most 300 characters'),
    }),
  ),
});

/** The price a grower types in place (season or budget page) for one fuel. */
export interface SinglePrice {
  fuelId: string;
  pricePerUnit: number;
  priceUnit: PriceUnit;
}

/**
 * The whole set to PUT when one fuel's price is added in place: the stored prices as they are,
 * with this fuel's price added (or replaced).
 */
export function withPrice(stored: FuelPrice[], price: SinglePrice): FuelPricesInput {
  const others = stored
    .filter((row) => row.fuelId !== price.fuelId)
    .map(({ fuelId, pricePerUnit, priceUnit, note }) => ({ fuelId, pricePerUnit, priceUnit, note }));
  return { prices: [...others, { ...price, note: null }] };
}

/** A typed price, or the reason it is not one (in the user's words). */
export function parsePrice(text: string): { price: number } | { problem: string } {
  const trimmed = text.trim().replace(/^\p{Sc}\s*/u, ''); // a currency sign in front is allowed
  if (trimmed === '') return { problem: 'Enter the price' };
  const value = Number(trimmed);
  if (!Number.isFinite(value) || value < 0 || value > 1e6) return { problem: 'Enter a price of 0 or more' };
  return { price: value };
}
