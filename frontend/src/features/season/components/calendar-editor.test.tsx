import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ProductionCalendar, ProductionCalendarInput } from '../../../api/types';
import { fakeApi } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { CalendarEditor } from './calendar-editor';

const api = fakeApi();
const get = api.get;
const put = api.put;
const HOUSE_ID = 5;
const stored: ProductionCalendar = {
  houseId: HOUSE_ID,
  version: 3,
  periods: [
    { startMonthDay: '11-15', endMonthDay: '03-31', mode: 'heated', nightHeatingC: 12.5, label: 'Winter crop' },
  ],
};

afterEach(() => {
  vi.unstubAllGlobals();
});

beforeEach(() => {
  api.install();
  get.mockReset();
  put.mockReset();
  get.mockImplementation(async (path: string) => {
    if (path === `/api/houses/${HOUSE_ID}/calendar`) return stored as never;
    throw new Error(`unexpected GET ${path}`);
  });
  put.mockImplementation(
    async (_path: string, body: unknown) =>
      ({
        houseId: HOUSE_ID,
        ...(body as ProductionCalendarInput),
      }) as never,
  );
});

const sentBodies = () => put.mock.calls.map(([path, body]) => ({ path, body }));

describe('CalendarEditor', () => {
  it('shows the stored period in °F to a US user and sends a typed night setpoint back in °C, leaving the rest as stored', async () => {
    const user = userEvent.setup();
    renderWithProviders(<CalendarEditor houseId={HOUSE_ID} canEdit />, 'us');
    const night = await screen.findByRole('textbox', { name: 'Period 1 night setpoint (°F)' });
    // 12.5 °C × 9/5 + 32 = 54.5 °F
    expect((night as HTMLInputElement).value).toBe('54.5');
    expect((screen.getByRole('textbox', { name: 'Period 1 first day (MM-DD)' }) as HTMLInputElement).value).toBe(
      '11-15',
    );
    await user.clear(night);
    await user.type(night, '50');
    await user.click(screen.getByRole('button', { name: 'Save calendar' }));
    await waitFor(() => expect(put).toHaveBeenCalledTimes(1));
    // the save names the version it was based on
    expect(put.mock.calls[0]![2].headers.get('If-Match')).toBe('3');
    // 50 °F = (50 − 32) × 5/9 = 10 °C
    expect(sentBodies()).toEqual([
      {
        path: `/api/houses/${HOUSE_ID}/calendar`,
        body: {
          periods: [
            {
              startMonthDay: '11-15',
              endMonthDay: '03-31',
              mode: 'heated',
              nightHeatingC: expect.closeTo(10, 9),
              label: 'Winter crop',
            },
          ],
        },
      },
    ]);
    expect(await screen.findByText(/Calendar saved/)).toBeTruthy();
  });

  it('adds a period and refuses a day that does not exist on the field itself; the corrected calendar is the only one sent', async () => {
    const user = userEvent.setup();
    renderWithProviders(<CalendarEditor houseId={HOUSE_ID} canEdit />);
    await screen.findByRole('textbox', { name: 'Period 1 first day (MM-DD)' });
    await user.click(screen.getByRole('button', { name: 'Add period' }));
    const start = screen.getByRole('textbox', { name: 'Period 2 first day (MM-DD)' });
    await user.clear(start);
    await user.type(start, '02-30');
    await user.tab();
    expect(await screen.findByText('Write a real day as MM-DD, e.g. 11-15')).toBeTruthy();
    expect(start.getAttribute('aria-invalid')).toBe('true');
    await user.click(screen.getByRole('button', { name: 'Save calendar' }));

    await user.clear(start);
    await user.type(start, '04-15');
    await user.click(screen.getByRole('button', { name: 'Save calendar' }));
    await waitFor(() => expect(put).toHaveBeenCalled());
    expect(put).toHaveBeenCalledTimes(1);
    const body = put.mock.calls[0]![1] as ProductionCalendarInput;
    // the stored period goes back exactly as stored (12.5 °C, not a round trip through the field)
    expect(body.periods).toEqual([
      { startMonthDay: '11-15', endMonthDay: '03-31', mode: 'heated', nightHeatingC: 12.5, label: 'Winter crop' },
      { startMonthDay: '04-15', endMonthDay: '03-31', mode: 'heated' },
    ]);
  });

  it('removes a period, and with none left says the house is heated all season', async () => {
    const user = userEvent.setup();
    renderWithProviders(<CalendarEditor houseId={HOUSE_ID} canEdit />);
    await user.click(await screen.findByRole('button', { name: 'Remove period 1' }));
    expect(screen.getByText('No periods: heated all season.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save calendar' }));
    await waitFor(() => expect(put).toHaveBeenCalledTimes(1));
    expect(put.mock.calls[0]![1]).toEqual({ periods: [] });
  });

  it('lets a reader see the calendar but offers no way to change it', async () => {
    renderWithProviders(<CalendarEditor houseId={HOUSE_ID} canEdit={false} />);
    await screen.findByRole('textbox', { name: 'Period 1 first day (MM-DD)' });
    expect(screen.queryByRole('button', { name: 'Save calendar' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add period' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Remove period 1' })).toBeNull();
    expect(put).not.toHaveBeenCalled();
  });
});
