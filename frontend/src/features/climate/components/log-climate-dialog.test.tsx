import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { LogClimateProposal, SiteClimate } from '../../../api/types';
import { requestPath } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { proposalMonthly } from '../../../test/weather-fixtures';
import { LogClimateDialog } from './log-climate-dialog';

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** A log proposal as the API answers it (invented values): no humidity, so no wet bulb. */
const LOG_PROPOSAL: LogClimateProposal = {
  farmId: 3,
  temperatureLogId: 9,
  temperatureLogName: 'Station north 2025',
  firstHour: '2025-01-01T00:00',
  lastHour: '2025-12-31T23:00',
  hourCount: 8760,
  hoursUsed: 8760,
  winterDesign996C: -24,
  winterDesign99C: -21,
  summerDesign04C: 33,
  summerDesign1C: 31,
  summerCoincidentWetBulb04C: null,
  summerCoincidentWetBulb1C: null,
  summerDailyRangeK: 11,
  monthly: proposalMonthly(2).map((m) => ({ ...m, clearness: null, dayCount: 30 })),
  proposedClimate: {
    winterDesignC: -24,
    summerDesignC: 31,
    summerDesignWetBulbC: null,
    summerDailyRangeK: 11,
    monthly: proposalMonthly(2).map((m) => ({ ...m, clearness: null })),
    sourceNote: 'the farm\'s temperature log "Station north 2025": 99.6 % heating and 1 % cooling design values',
  },
  currentClimate: null,
  notes: ['Percentiles are read from the sorted hours without interpolation.'],
};

const LOGS = [
  { id: 8, name: 'January only', startDate: '2025-01-01', endDate: '2025-01-31', resolution: 'hourly' as const },
  { id: 9, name: 'Station north 2025', startDate: '2025-01-01', endDate: '2025-12-31', resolution: 'hourly' as const },
];

afterEach(() => vi.unstubAllGlobals());

describe('LogClimateDialog', () => {
  it('says plainly why a short log gives no proposal', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        json(
          {
            statusCode: 422,
            error: 'Unprocessable Entity',
            message:
              'design temperatures need a whole year of hours (365 days, 8,760 hourly readings); this log covers about 31 days',
            field: 'readings',
          },
          422,
        ),
      ),
    );
    renderWithProviders(
      <LogClimateDialog farmId={3} logs={LOGS} open current={null} onClose={() => {}} onSave={async () => {}} />,
    );
    await userEvent.setup().click(screen.getByRole('button', { name: 'Work out the climate' }));
    expect(await screen.findByText(/this log covers about 31 days/)).toBeTruthy();
  });

  it('shows the proposal beside the current values and, for a farm with no climate, asks for the wet bulb before saving', async () => {
    const fetchMock = vi.fn(async (_request: Request) => json(LOG_PROPOSAL));
    vi.stubGlobal('fetch', fetchMock);
    const saved: SiteClimate[] = [];
    renderWithProviders(
      <LogClimateDialog
        farmId={3}
        logs={LOGS}
        open
        current={null}
        onClose={() => {}}
        onSave={async (climate) => {
          saved.push(climate);
        }}
      />,
    );
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Work out the climate' }));
    await screen.findByTestId('log-climate-proposal');
    expect(requestPath(fetchMock.mock.calls[0]![0])).toBe('/api/farms/3/temperature-logs/8/climate-proposal');
    expect(screen.getByText('From the log')).toBeTruthy();
    const save = screen.getByRole('button', { name: 'Save these values' });
    expect(save).toHaveProperty('disabled', true);
    expect(screen.getByText(/Enter the summer design wet bulb/)).toBeTruthy();
    await user.type(screen.getByLabelText(/Summer design wet bulb/), '22');
    await waitFor(() => expect(save).toHaveProperty('disabled', false));
    await user.click(save);
    await waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0]).toMatchObject({ winterDesignC: -24, summerDesignC: 31, summerDesignWetBulbC: 22 });
    expect(saved[0]!.sourceNote).toMatch(/temperature log "Station north 2025"/);
  });
});
