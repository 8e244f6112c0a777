import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import type { HouseSpec } from '../../../api/types';
import { houseSpecOf } from '../../../lib/house-spec';
import type { UnitSystem } from '../../../lib/units';
import { demoHouseB, demoHouseBCooling } from '../../../test/estimate-fixtures';
import { referenceDataFixture } from '../../../test/fixtures';
import { fakeApi } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { CoolingPanel, type CoolingPanelProps } from './cooling-panel';

const api = fakeApi();
const post = api.post;
const get = api.get;

const referenceData = {
  ...referenceDataFixture,
  'evaporative-pads': {
    title: 'Pads',
    description: 'test rows',
    rows: [{ id: 'cellulose-100mm', label: 'Cellulose pad, 100 mm', source: 'test', confidence: 'memory' }],
  },
};

function renderPanel(props: Partial<CoolingPanelProps> = {}, system: UnitSystem = 'si') {
  return renderWithProviders(<CoolingPanel house={demoHouseB} canRunEstimates {...props} />, system);
}

beforeEach(() => {
  api.install();
  get.mockImplementation(async (path: string) => {
    if (path === '/api/reference-data') return referenceData as never;
    throw new Error(`unexpected GET ${path}`);
  });
  post.mockImplementation(async (path: string) => {
    if (path === `/api/houses/${demoHouseB.id}/cooling`) return demoHouseBCooling as never;
    throw new Error(`unexpected POST ${path}`);
  });
});

afterEach(() => {
  vi.clearAllMocks();
  vi.unstubAllGlobals();
});

describe('CoolingPanel', () => {
  it('flags the undersized fans with the number of fans needed', async () => {
    renderPanel();
    const verdict = await screen.findByTestId('fan-verdict');
    expect(verdict.textContent).toContain('Fans are short');
    expect(verdict.textContent).toContain('3.78 m³/s installed against 12.60 m³/s required');
    expect(verdict.textContent).toContain('4 fans of this size are needed in all (add 3)');
    expect(screen.getByText('27.5 per hour · 0.46 per minute')).toBeTruthy();
    expect(screen.getByText(/1.2 m² entered, 6.2 m² needed/)).toBeTruthy();
    // the light factor's light is named with where it came from: the design day's own sun
    expect(screen.getByTestId('light-source').textContent).toBe(
      "Light at the crop 89,835 lx: the design day's clear-sky sun through the roof, the same sun as the hour-by-hour day, with no shade cloth.",
    );
    expect(screen.getByTestId('hours-not-held').textContent).toBe('15 (solar 7–21 h)');
  });

  it('says what the supplemental lamps add to the fan requirement', async () => {
    post.mockImplementation(async (path: string) => {
      if (path === `/api/houses/${demoHouseB.id}/cooling`)
        return {
          ...demoHouseBCooling,
          lamps: {
            electricW: 20_000,
            heatW: 19_000,
            hoursOn: 6,
            sunriseSolarHour: 4.6,
            addedFlowM3PerS: 1.25,
            governingHour: 2,
          },
        } as never;
      throw new Error(`unexpected POST ${path}`);
    });
    renderPanel();
    const verdict = await screen.findByTestId('fan-verdict');
    expect(verdict.textContent).toContain('19.0 kW of heat while they run');
    expect(verdict.textContent).toContain('set at solar hour 2: they add 1.25 m³/s');
  });

  it('carries the electrical and backdraft cautions', async () => {
    renderPanel();
    await screen.findByTestId('fan-verdict');
    const cautions = screen.getByRole('note');
    expect(cautions.textContent).toMatch(/qualified electrician with ground-fault protection/);
    expect(cautions.textContent).toMatch(/backdrafting/);
  });

  it('shows flows in cfm and cfm/ft² to a US user', async () => {
    renderPanel({}, 'us');
    const verdict = await screen.findByTestId('fan-verdict');
    // 3.776 m³/s ÷ 4.719 474 E-04 = 8,001 cfm (NIST SP 811 B.8 "cubic foot per minute")
    expect(verdict.textContent).toContain('8,001 cfm installed');
    expect(screen.getByText('4.2 cfm/ft²')).toBeTruthy();
  });

  it('sends an evaporative pad what-if in SI', async () => {
    const user = userEvent.setup();
    renderPanel({}, 'us');
    await screen.findByTestId('fan-verdict');
    await user.click(screen.getByRole('combobox', { name: /Evaporative pads/ }));
    await user.click(await screen.findByRole('option', { name: 'Cellulose pad, 100 mm' }));
    await user.type(screen.getByRole('textbox', { name: /Pad face area/ }), '100');
    // 100 ft² = 9.290 304 m² (NIST SP 811 B.8 "square foot", exact)
    await waitFor(() =>
      expect(post).toHaveBeenCalledWith(
        `/api/houses/${demoHouseB.id}/cooling`,
        { conditions: { evaporativePad: { padTypeId: 'cellulose-100mm', areaM2: expect.closeTo(9.290304, 9) } } },
        expect.anything(),
      ),
    );
  });

  it('computes unsaved edits on the stateless route with the farm site and conditions', async () => {
    const edited: HouseSpec = { ...houseSpecOf(demoHouseB), exhaustFans: { count: 2, capacityEachM3PerS: 3.776 } };
    post.mockImplementation(async (path: string) => {
      if (path === `/api/houses/${demoHouseB.id}/cooling`) return demoHouseBCooling as never;
      if (path === '/api/estimates/cooling') {
        return {
          ...demoHouseBCooling,
          capacity: {
            ...demoHouseBCooling.capacity,
            installedFlowM3PerS: 7.552,
            verdict: 'adequate',
            additionalFansNeeded: 0,
          },
        } as never;
      }
      throw new Error(`unexpected POST ${path}`);
    });
    renderPanel({ editedHouse: edited });
    // two requests in turn (the stored result, then the edits): wait for the condition, not a clock
    await waitFor(() => expect(screen.getByTestId('fan-verdict').textContent).toContain('Fans are adequate'), {
      timeout: 10_000,
    });
    expect(post).toHaveBeenCalledWith(
      '/api/estimates/cooling',
      { house: edited, site: demoHouseBCooling.siteUsed, conditions: demoHouseBCooling.conditionsUsed },
      expect.anything(),
    );
  });

  it('links to the farm page when the farm has no climate', async () => {
    post.mockRejectedValue(new ApiError(422, 'no climate', 'conditions.summerDesignC'));
    renderPanel();
    expect(await screen.findByText('This farm has no climate yet')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'farm page' }).getAttribute('href')).toBe(`/farms/${demoHouseB.farmId}`);
  });

  it('tells a viewer why there is no result, without asking the API', () => {
    renderPanel({ canRunEstimates: false });
    expect(screen.getByRole('note').textContent).toMatch(/not run cooling estimates/);
    expect(post).not.toHaveBeenCalled();
  });
});
