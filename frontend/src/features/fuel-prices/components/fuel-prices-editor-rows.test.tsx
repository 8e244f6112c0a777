import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { FarmFuelPrices, FuelPricesInput, ReferenceData } from '../../../api/types';
import { referenceDataFixture } from '../../../test/fixtures';
import { fakeApi } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { FuelPricesEditor } from './fuel-prices-editor';

const api = fakeApi();
const get = api.get;
const put = api.put;
const FARM_ID = 3;

const referenceData: ReferenceData = {
  ...referenceDataFixture,
  fuels: {
    ...referenceDataFixture.fuels!,
    rows: [
      { id: 'propane', label: 'Propane', unitSi: 'L', unitUs: 'US gal', source: 'test', confidence: 'derived' },
      { id: 'natural-gas', label: 'Natural gas', unitSi: 'm³', unitUs: 'therm', source: 'test', confidence: 'derived' },
      { id: 'electricity', label: 'Electricity', unitSi: 'kWh', unitUs: 'kWh', source: 'test', confidence: 'derived' },
    ],
  },
};

const stored = {
  farmId: FARM_ID,
  version: 2,
  prices: [
    {
      fuelId: 'propane',
      pricePerUnit: 1.6,
      priceUnit: 'us',
      priceUnitLabel: 'US gal',
      fuelLabel: 'Propane',
      note: 'Invented test price',
    },
  ],
} as unknown as FarmFuelPrices;

afterEach(() => {
  vi.unstubAllGlobals();
});

beforeEach(() => {
  api.install();
  get.mockReset();
  put.mockReset();
  get.mockImplementation(async (path: string) => {
    if (path === `/api/farms/${FARM_ID}/fuel-prices`) return stored as never;
    throw new Error(`unexpected GET ${path}`);
  });
  put.mockImplementation(async () => stored as never);
});

function renderEditor(canEdit = true) {
  return renderWithProviders(
    <FuelPricesEditor farmId={FARM_ID} referenceData={referenceData} canEdit={canEdit} currency="USD" />,
  );
}

describe('FuelPricesEditor', () => {
  it('lists every fuel with the stored price, and sends a new natural-gas price per therm with the propane price as stored', async () => {
    const user = userEvent.setup();
    renderEditor();
    const propane = await screen.findByRole('textbox', { name: 'Price of Propane per US gal' });
    expect((propane as HTMLInputElement).value).toBe('1.6');
    // a fuel without a price offers the user's own unit system first (SI here)
    const gas = screen.getByRole('textbox', { name: 'Price of Natural gas per m³' });
    expect((gas as HTMLInputElement).value).toBe('');

    await user.click(screen.getByRole('combobox', { name: 'Unit of the Natural gas price' }));
    await user.click(await screen.findByRole('option', { name: 'per therm' }));
    const gasPerTherm = screen.getByRole('textbox', { name: 'Price of Natural gas per therm' });
    await user.type(gasPerTherm, '0.95');
    await user.type(screen.getByRole('textbox', { name: 'Source of the Natural gas price' }), 'March bill');
    await user.click(screen.getByRole('button', { name: 'Save prices' }));

    await waitFor(() => expect(put).toHaveBeenCalledTimes(1));
    expect(put.mock.calls[0]![0]).toBe(`/api/farms/${FARM_ID}/fuel-prices`);
    // the save names the version of the prices it was based on
    expect(put.mock.calls[0]![2].headers.get('If-Match')).toBe('2');
    const body = put.mock.calls[0]![1] as FuelPricesInput;
    // a blank price (electricity) is no price: it is left out
    expect(body).toEqual({
      prices: [
        { fuelId: 'propane', pricePerUnit: 1.6, priceUnit: 'us', note: 'Invented test price' },
        { fuelId: 'natural-gas', pricePerUnit: 0.95, priceUnit: 'us', note: 'March bill' },
      ],
    });
  });

  it('refuses a negative price on the field itself; the corrected prices are the only ones sent', async () => {
    const user = userEvent.setup();
    renderEditor();
    const propane = await screen.findByRole('textbox', { name: 'Price of Propane per US gal' });
    await user.clear(propane);
    await user.type(propane, '-2');
    await user.click(screen.getByRole('button', { name: 'Save prices' }));
    expect(await screen.findByText('Enter a price of 0 or more, or leave it blank')).toBeTruthy();

    await user.clear(propane);
    await user.type(propane, '2');
    await user.click(screen.getByRole('button', { name: 'Save prices' }));
    await waitFor(() => expect(put).toHaveBeenCalled());
    expect(put).toHaveBeenCalledTimes(1);
    expect((put.mock.calls[0]![1] as FuelPricesInput).prices).toEqual([
      { fuelId: 'propane', pricePerUnit: 2, priceUnit: 'us', note: 'Invented test price' },
    ]);
  });

  it('clearing the only price sends an empty list (the farm then has no prices)', async () => {
    const user = userEvent.setup();
    renderEditor();
    await user.clear(await screen.findByRole('textbox', { name: 'Price of Propane per US gal' }));
    await user.click(screen.getByRole('button', { name: 'Save prices' }));
    await waitFor(() => expect(put).toHaveBeenCalledTimes(1));
    expect(put.mock.calls[0]![1]).toEqual({ prices: [] });
  });

  it('shows a reader the prices with a note instead of a save button', async () => {
    renderEditor(false);
    await screen.findByRole('textbox', { name: 'Price of Propane per US gal' });
    expect(screen.queryByRole('button', { name: 'Save prices' })).toBeNull();
    expect(screen.getByText(/lets you read its prices but not change them/)).toBeTruthy();
  });
});
