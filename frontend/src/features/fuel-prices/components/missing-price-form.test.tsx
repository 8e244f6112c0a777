import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FarmFuelPrices } from '../../../api/types';
import { requestPath } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { parsePrice, withPrice } from '../fuel-price-values';
import { MissingPriceForm } from './missing-price-form';

const PROPANE = { fuelId: 'propane', label: 'Propane', unitSi: 'L', unitUs: 'US gal' };
const gasOnly: FarmFuelPrices = {
  farmId: 7,
  version: 3,
  prices: [
    {
      fuelId: 'natural-gas',
      fuelLabel: 'Natural gas',
      pricePerUnit: 0.5,
      priceUnit: 'si',
      priceUnitLabel: 'm³',
      note: 'bill',
    },
  ],
};

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

function stubServer(stored: FarmFuelPrices, putAnswers: Array<(body: unknown) => Response>) {
  const puts: Array<{ ifMatch: string | undefined; body: { prices: Array<Record<string, unknown>> } }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (request: Request) => {
      if (request.method === 'PUT') {
        const body = (await request.json()) as (typeof puts)[number]['body'];
        puts.push({ ifMatch: request.headers.get('If-Match') ?? undefined, body });
        const answer = putAnswers.shift();
        if (!answer) throw new Error(`unexpected PUT ${requestPath(request)}`);
        return answer(body);
      }
      return json(200, stored);
    }),
  );
  return { puts };
}

afterEach(() => vi.unstubAllGlobals());

describe('MissingPriceForm (a price asked for in place)', () => {
  it('asks per US gallon for a US user, writes the unit and currency beside the box, and adds the price to the set', async () => {
    const { puts } = stubServer(gasOnly, [(body) => json(200, { ...gasOnly, version: 4, prices: body })]);
    renderWithProviders(<MissingPriceForm farmId={7} fuel={PROPANE} currency="EUR" canEdit />, 'us');
    const box = await screen.findByLabelText('Price of Propane');
    expect(screen.getByText('per US gal')).toBeTruthy();
    expect(screen.getByText('€')).toBeTruthy();
    const user = userEvent.setup();
    await user.type(box, '2.10');
    await waitFor(() => expect(screen.getByRole('button', { name: 'Save price' })).toHaveProperty('disabled', false));
    await user.click(screen.getByRole('button', { name: 'Save price' }));
    await waitFor(() => expect(puts).toHaveLength(1));
    expect(puts[0].ifMatch).toBe('3');
    expect(puts[0].body.prices).toEqual([
      { fuelId: 'natural-gas', pricePerUnit: 0.5, priceUnit: 'si', note: 'bill' },
      { fuelId: 'propane', pricePerUnit: 2.1, priceUnit: 'us', note: null },
    ]);
  });

  it('asks per litre for an SI user', async () => {
    stubServer(gasOnly, []);
    renderWithProviders(<MissingPriceForm farmId={7} fuel={PROPANE} currency="USD" canEdit />, 'si');
    await screen.findByLabelText('Price of Propane');
    expect(screen.getByText('per L')).toBeTruthy();
  });

  it('says what is wrong with a price in plain words and sends nothing', async () => {
    const { puts } = stubServer(gasOnly, []);
    renderWithProviders(<MissingPriceForm farmId={7} fuel={PROPANE} currency="USD" canEdit />, 'us');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Price of Propane'), 'cheap');
    await waitFor(() => expect(screen.getByRole('button', { name: 'Save price' })).toHaveProperty('disabled', false));
    await user.click(screen.getByRole('button', { name: 'Save price' }));
    expect(await screen.findByText('Enter a price of 0 or more')).toBeTruthy();
    expect(puts).toHaveLength(0);
  });

  it('adds the price to the newer set when someone saved other prices meanwhile (409)', async () => {
    const theirs: FarmFuelPrices = { ...gasOnly, version: 4, prices: [{ ...gasOnly.prices[0]!, pricePerUnit: 0.6 }] };
    const { puts } = stubServer(gasOnly, [
      () => json(409, { statusCode: 409, error: 'Conflict', message: 'Changed by someone else', current: theirs }),
      (body) => json(200, { ...theirs, version: 5, prices: body }),
    ]);
    renderWithProviders(<MissingPriceForm farmId={7} fuel={PROPANE} currency="USD" canEdit />, 'us');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Price of Propane'), '2');
    await waitFor(() => expect(screen.getByRole('button', { name: 'Save price' })).toHaveProperty('disabled', false));
    await user.click(screen.getByRole('button', { name: 'Save price' }));
    await waitFor(() => expect(puts).toHaveLength(2));
    expect(puts[1].ifMatch).toBe('4');
    expect(puts[1].body.prices[0]).toMatchObject({ fuelId: 'natural-gas', pricePerUnit: 0.6 });
    expect(puts[1].body.prices[1]).toMatchObject({ fuelId: 'propane', pricePerUnit: 2, priceUnit: 'us' });
  });

  it('tells a role that cannot set prices whom to ask', () => {
    renderWithProviders(<MissingPriceForm farmId={7} fuel={PROPANE} currency="USD" canEdit={false} />);
    expect(screen.getByText(/Ask the owner or a grower to enter it/)).toBeTruthy();
  });
});

describe('price values', () => {
  it('replaces or adds one fuel, keeping the others', () => {
    expect(withPrice(gasOnly.prices, { fuelId: 'natural-gas', pricePerUnit: 0.7, priceUnit: 'us' }).prices).toEqual([
      { fuelId: 'natural-gas', pricePerUnit: 0.7, priceUnit: 'us', note: null },
    ]);
  });

  it('reads a typed price, a currency sign in front allowed', () => {
    expect(parsePrice('2.10')).toEqual({ price: 2.1 });
    expect(parsePrice('$1.5')).toEqual({ price: 1.5 });
    expect(parsePrice('')).toEqual({ problem: 'Enter the price' });
    expect(parsePrice('-1')).toEqual({ problem: 'Enter a price of 0 or more' });
  });
});
