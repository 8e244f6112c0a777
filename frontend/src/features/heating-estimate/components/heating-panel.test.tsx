import { act, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import type { HouseSpec } from '../../../api/types';
import { houseSpecOf } from '../../../lib/house-spec';
import type { UnitSystem } from '../../../lib/units';
import { demoHouseB, demoHouseBHeating } from '../../../test/estimate-fixtures';
import { referenceDataFixture } from '../../../test/fixtures';
import { fakeApi } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { HeatingPanel, type HeatingPanelProps } from './heating-panel';

const api = fakeApi();
const post = api.post;
const get = api.get;

const referenceData = {
  ...referenceDataFixture,
  coverings: {
    ...referenceDataFixture.coverings!,
    rows: [{ id: 'poly-single', label: 'Single polyethylene film', layers: 1, source: 'test', confidence: 'memory' }],
  },
};

function renderPanel(props: Partial<HeatingPanelProps> = {}, system: UnitSystem = 'si') {
  return renderWithProviders(<HeatingPanel house={demoHouseB} canRunEstimates {...props} />, system);
}

beforeEach(() => {
  api.install();
  get.mockImplementation(async (path: string) => {
    if (path === '/api/reference-data') return referenceData as never;
    throw new Error(`unexpected GET ${path}`);
  });
  post.mockImplementation(async (path: string) => {
    if (path === `/api/houses/${demoHouseB.id}/estimate`) return demoHouseBHeating as never;
    throw new Error(`unexpected POST ${path}`);
  });
});

afterEach(() => {
  vi.clearAllMocks();
  vi.unstubAllGlobals();
});

describe('HeatingPanel', () => {
  it('shows the design loss in kW, the heater shortfall and the conditions with their source', async () => {
    renderPanel();
    expect(await screen.findByTestId('heating-total')).toHaveProperty('textContent', '96.6 kW');
    expect(post).toHaveBeenCalledWith(`/api/houses/${demoHouseB.id}/estimate`, { conditions: {} }, expect.anything());

    const verdict = screen.getByTestId('heater-verdict');
    expect(verdict.textContent).toContain('Heaters are short by 40.8 kW');
    expect(verdict.textContent).toContain('111.1 kW required');
    expect(screen.getByText('Design outdoor (farm climate)')).toBeTruthy();
    expect(screen.getByText('-29.0 °C')).toBeTruthy();
    // one unit: what it alone holds, and the advice to split
    expect(screen.getByText(/A single unit is all the heat/).textContent).toContain('at least 2 units');
  });

  it('shows the lamps’ heat beside the heaters but never credits it', async () => {
    post.mockImplementation(async (path: string) => {
      if (path === `/api/houses/${demoHouseB.id}/estimate`)
        return {
          ...demoHouseBHeating,
          lamps: { electricW: 20_000, heatW: 19_000, creditedW: 0, shareOfDesignLoss: 0.25 },
        } as never;
      throw new Error(`unexpected POST ${path}`);
    });
    renderPanel();
    const note = await screen.findByTestId('heater-lamps-note');
    expect(note.textContent).toContain('19.0 kW of heat while they run (25 % of the design loss)');
    expect(note.textContent).toContain('sized without it');
  });

  it('reads single poly clearly in the condensation verdict and marks weak sources', async () => {
    renderPanel();
    await screen.findByTestId('heating-total');
    const table = screen.getByRole('table', { name: 'Condensation by surface' });
    expect(within(table).getAllByText('single layer:')).toHaveLength(3);
    expect(within(table).getAllByText('drips')).toHaveLength(3);
    expect(screen.getByTestId('condensation-verdict').textContent).toContain('dew point 7.6 °C');
    expect(screen.getAllByText('from memory').length).toBeGreaterThan(0);
    expect(screen.getAllByText('rule of thumb').length).toBeGreaterThan(0);
    expect(screen.getByRole('note').textContent).toMatch(/carbon monoxide/i);
  });

  it('speaks Btu/h and °F to a US user', async () => {
    renderPanel({}, 'us');
    expect((await screen.findByTestId('heating-total')).textContent).toBe('329,748 Btu/h');
    expect(screen.getByText('-20.2 °F')).toBeTruthy();
  });

  it("writes the cautions' quantities in the reader's units, never as raw tokens", async () => {
    renderPanel({}, 'us');
    const cautions = await screen.findByRole('note');
    const text = cautions.textContent ?? '';
    // House B's heater: 300,000 Btu/h input × 0.80 efficiency = 240,000 Btu/h output (demo scenario)
    expect(text).toContain('Installed output 240,000 Btu/h is 139,210 Btu/h short of the 379,208 Btu/h required');
    // chimney 0.61 m ÷ 0.3048 m/ft = 2.0 ft; combustion air 8.805 E-07 m²/W = 0.40 in² per 1,000 Btu/h
    expect(text).toContain('at least 2.0 ft above the ridge');
    expect(text).toContain('at least about 0.40 in² per 1,000 Btu/h of heater input');
    expect(text).not.toMatch(/\{\{|\}\}/);
    expect(text).not.toMatch(/\d (kW|m|°C|cm²)\b/);
    // the assumption labels too (elevation 313 m ÷ 0.3048 = 1,026.9 ft)
    expect(screen.getByText(/Barometric pressure at 1,026\.9 ft/)).toBeTruthy();
  });

  it('writes the same cautions in SI for an SI reader', async () => {
    renderPanel({}, 'si');
    const text = (await screen.findByRole('note')).textContent ?? '';
    expect(text).toContain('Installed output 70.3 kW is 40.8 kW short of the 111.1 kW required');
    expect(text).toContain('at least 0.61 m above the ridge');
    expect(text).not.toContain('{{');
  });

  it('tells a viewer why there is no result, without asking the API', () => {
    renderPanel({ canRunEstimates: false });
    expect(screen.getByRole('note').textContent).toMatch(/not run heating estimates/);
    expect(post).not.toHaveBeenCalled();
  });

  it('turns a 403 into the same note', async () => {
    post.mockRejectedValue(new ApiError(403, 'Forbidden'));
    renderPanel();
    expect((await screen.findByRole('note')).textContent).toMatch(/not run heating estimates/);
  });

  it('links to the farm page when the farm has no climate', async () => {
    post.mockRejectedValue(new ApiError(422, 'no climate', 'conditions.designOutdoorC'));
    renderPanel();
    expect(await screen.findByText('This farm has no climate yet')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'farm page' }).getAttribute('href')).toBe(`/farms/${demoHouseB.farmId}`);
  });

  it('computes unsaved edits on the stateless route with the farm conditions, not the stored setpoint', async () => {
    const edited: HouseSpec = { ...houseSpecOf(demoHouseB), setpoints: { ...demoHouseB.setpoints, nightHeatingC: 15 } };
    post.mockImplementation(async (path: string) => {
      if (path === `/api/houses/${demoHouseB.id}/estimate`) return demoHouseBHeating as never;
      if (path === '/api/estimates') {
        return {
          ...demoHouseBHeating,
          heatLoss: { ...demoHouseBHeating.heatLoss, insideC: 15, totalW: 109_000 },
        } as never;
      }
      throw new Error(`unexpected POST ${path}`);
    });
    renderPanel({ editedHouse: edited });
    await waitFor(() => expect(screen.getByTestId('heating-total').textContent).toBe('109.0 kW'));
    expect(post).toHaveBeenCalledWith(
      '/api/estimates',
      {
        house: edited,
        conditions: { designOutdoorC: -29, elevationM: 313, insideRelativeHumidityPct: 85, curtainClosed: false },
      },
      expect.anything(),
    );
    expect(screen.getByText('Unsaved edits')).toBeTruthy();
  });

  it('sends a what-if design temperature typed in °F as °C', async () => {
    const user = userEvent.setup();
    renderPanel({}, 'us');
    await screen.findByTestId('heating-total');
    await user.type(screen.getByRole('textbox', { name: /Design outdoor/ }), '-31');
    // −31 °F = −35 °C
    await waitFor(() =>
      expect(post).toHaveBeenCalledWith(
        `/api/houses/${demoHouseB.id}/estimate`,
        { conditions: { designOutdoorC: expect.closeTo(-35, 9) } },
        expect.anything(),
      ),
    );
  });

  it('refuses a what-if temperature outside the shared bounds and does not send it', async () => {
    // fake timers that also follow real time (so Testing Library's waiting still works); the
    // debounce is then run out on purpose rather than slept through
    vi.useFakeTimers({ shouldAdvanceTime: true });
    try {
      const user = userEvent.setup({ advanceTimers: vi.advanceTimersByTime });
      renderPanel();
      await screen.findByTestId('heating-total');
      const field = screen.getByRole('textbox', { name: /Design outdoor/ });
      await user.type(field, '-80');
      expect(await screen.findByText('Between -50 and 25 °C')).toBeTruthy();
      await act(() => vi.advanceTimersByTimeAsync(2000)); // well past the 400 ms debounce
      expect(post.mock.calls.map(([, body]) => body)).toEqual(post.mock.calls.map(() => ({ conditions: {} })));
      // the same field does send a value within the bounds once the debounce runs out
      await user.clear(field);
      await user.type(field, '-20');
      await act(() => vi.advanceTimersByTimeAsync(2000));
      await waitFor(() =>
        expect(post).toHaveBeenCalledWith(
          `/api/houses/${demoHouseB.id}/estimate`,
          { conditions: { designOutdoorC: -20 } },
          expect.anything(),
        ),
      );
      expect(post.mock.calls.some(([, body]) => JSON.stringify(body).includes('-80'))).toBe(false);
    } finally {
      vi.useRealTimers();
    }
  });
});
