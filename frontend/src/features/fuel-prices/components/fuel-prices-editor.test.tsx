import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FarmFuelPrices } from '../../../api/types';
import { referenceDataFixture } from '../../../test/fixtures';
import { renderWithProviders } from '../../../test/render-with-providers';
import { FuelPricesEditor } from './fuel-prices-editor';

const gas = (pricePerUnit: number, version: number, note: string): FarmFuelPrices => ({
  farmId: 7,
  version,
  prices: [
    {
      fuelId: 'natural-gas',
      fuelLabel: 'Natural gas',
      pricePerUnit,
      priceUnit: 'si',
      priceUnitLabel: 'm³',
      note,
    },
  ],
});

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** A stand-in server: GET answers `stored`; each PUT takes the next answer from `putAnswers`. */
function stubServer(stored: FarmFuelPrices, putAnswers: Array<(body: unknown) => Response>) {
  const puts: Array<{ ifMatch: string | undefined; body: unknown }> = [];
  const fetchMock = vi.fn(async (request: Request) => {
    if (request.method === 'PUT') {
      const body = (await request.json()) as unknown;
      puts.push({ ifMatch: request.headers.get('If-Match') ?? undefined, body });
      const answer = putAnswers.shift();
      if (!answer) throw new Error(`unexpected PUT ${request.url}`);
      return answer(body);
    }
    return json(200, stored);
  });
  vi.stubGlobal('fetch', fetchMock);
  return { puts };
}

const conflict = (current: FarmFuelPrices) => () =>
  json(409, {
    statusCode: 409,
    error: 'Conflict',
    message: 'Changed by someone else since you loaded it; reload their version or overwrite it with yours',
    current,
  });

async function editAndSave(price: string) {
  const user = userEvent.setup();
  const field = await screen.findByLabelText(/Price of Natural gas per/);
  await user.clear(field);
  await user.type(field, price);
  await user.click(screen.getByRole('button', { name: 'Save prices' }));
  return user;
}

afterEach(() => vi.unstubAllGlobals());

describe('FuelPricesEditor when someone else saved first (409)', () => {
  it('sends the version it loaded and offers their version or mine', async () => {
    const theirs = gas(0.61, 4, 'their bill');
    const { puts } = stubServer(gas(0.5, 3, 'old bill'), [conflict(theirs)]);
    renderWithProviders(<FuelPricesEditor farmId={7} referenceData={referenceDataFixture} canEdit currency="USD" />);
    await editAndSave('0.55');

    const dialog = await screen.findByRole('dialog', { name: 'Changed by someone else' });
    expect(puts).toHaveLength(1);
    expect(puts[0].ifMatch).toBe('3');
    expect(within(dialog).getByRole('button', { name: 'Reload their version' })).toBeTruthy();
    expect(within(dialog).getByRole('button', { name: 'Overwrite with mine' })).toBeTruthy();
    expect(within(dialog).getByText(/your changes were not saved/)).toBeTruthy();
  });

  it('"Reload their version" shows what they stored and sends nothing more', async () => {
    const theirs = gas(0.61, 4, 'their bill');
    const { puts } = stubServer(gas(0.5, 3, 'old bill'), [conflict(theirs)]);
    renderWithProviders(<FuelPricesEditor farmId={7} referenceData={referenceDataFixture} canEdit currency="USD" />);
    const user = await editAndSave('0.55');

    const dialog = await screen.findByRole('dialog', { name: 'Changed by someone else' });
    await user.click(within(dialog).getByRole('button', { name: 'Reload their version' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect((screen.getByLabelText(/Price of Natural gas per/) as HTMLInputElement).value).toBe('0.61');
    expect((screen.getByLabelText('Source of the Natural gas price') as HTMLInputElement).value).toBe('their bill');
    expect(puts).toHaveLength(1);
  });

  it('"Overwrite with mine" sends my prices again on their version', async () => {
    const theirs = gas(0.61, 4, 'their bill');
    const { puts } = stubServer(gas(0.5, 3, 'old bill'), [
      conflict(theirs),
      (body) =>
        json(200, {
          ...gas((body as { prices: Array<{ pricePerUnit: number }> }).prices[0].pricePerUnit, 5, 'old bill'),
        }),
    ]);
    renderWithProviders(<FuelPricesEditor farmId={7} referenceData={referenceDataFixture} canEdit currency="USD" />);
    const user = await editAndSave('0.55');

    const dialog = await screen.findByRole('dialog', { name: 'Changed by someone else' });
    await user.click(within(dialog).getByRole('button', { name: 'Overwrite with mine' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(puts).toHaveLength(2);
    expect(puts[1].ifMatch).toBe('4');
    expect(puts[1].body).toEqual(puts[0].body);
    expect(puts[1].body).toMatchObject({ prices: [{ fuelId: 'natural-gas', pricePerUnit: 0.55 }] });
    expect((screen.getByLabelText(/Price of Natural gas per/) as HTMLInputElement).value).toBe('0.55');
  });
});
