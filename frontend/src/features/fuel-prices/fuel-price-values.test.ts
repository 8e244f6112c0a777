import { describe, expect, it } from 'vitest';
import type { FuelPrice, ReferenceRow } from '../../api/types';
import { fuelPriceFormSchema, fuelPriceFormValues, priceUnitLabel, toFuelPricesInput } from './fuel-price-values';

const fuels = [
  { id: 'natural-gas', label: 'Natural gas', unitSi: 'm³', unitUs: 'therm', source: 'test', confidence: 'derived' },
  { id: 'propane', label: 'Propane', unitSi: 'L', unitUs: 'US gal', source: 'test', confidence: 'derived' },
] as ReferenceRow[];
const stored: FuelPrice[] = [
  {
    fuelId: 'natural-gas',
    fuelLabel: 'Natural gas',
    pricePerUnit: 0.8,
    priceUnit: 'us',
    priceUnitLabel: 'therm',
    note: 'Contract 2026',
  },
];

describe('fuel price values', () => {
  it('lists every fuel, the stored price in its own unit, and offers the user’s system for unpriced fuels', () => {
    const values = fuelPriceFormValues(fuels, stored, 'si');
    expect(values.rows[0]).toMatchObject({
      fuelId: 'natural-gas',
      price: '0.8',
      priceUnit: 'us',
      note: 'Contract 2026',
    });
    expect(priceUnitLabel(values.rows[0]!)).toBe('therm');
    expect(values.rows[1]).toMatchObject({ fuelId: 'propane', price: '', priceUnit: 'si' });
    expect(priceUnitLabel(values.rows[1]!)).toBe('L');
  });

  it('sends only priced fuels, as numbers, with the unit each is per', () => {
    const values = fuelPriceFormValues(fuels, stored, 'us');
    values.rows[1]!.price = '1.65';
    expect(toFuelPricesInput(values)).toEqual({
      prices: [
        { fuelId: 'natural-gas', pricePerUnit: 0.8, priceUnit: 'us', note: 'Contract 2026' },
        { fuelId: 'propane', pricePerUnit: 1.65, priceUnit: 'us', note: null },
      ],
    });
  });

  it('refuses a negative or non-numeric price', () => {
    const values = fuelPriceFormValues(fuels, stored, 'si');
    values.rows[1]!.price = '-1';
    expect(fuelPriceFormSchema.isValidSync(values)).toBe(false);
    values.rows[1]!.price = 'abc';
    expect(fuelPriceFormSchema.isValidSync(values)).toBe(false);
    values.rows[1]!.price = '';
    expect(fuelPriceFormSchema.isValidSync(values)).toBe(true);
  });
});
