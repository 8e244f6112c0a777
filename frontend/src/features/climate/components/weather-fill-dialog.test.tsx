import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { SiteClimate } from '../../../api/types';
import { requestPath } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { PROPOSAL } from '../../../test/weather-fixtures';
import { WeatherFillDialog } from './weather-fill-dialog';

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

afterEach(() => vi.unstubAllGlobals());

function stubApi(failYear?: number) {
  const fetchMock = vi.fn(async (request: Request) => {
    const url = requestPath(request);
    if (url === '/api/farms/3/weather') return json(PROPOSAL.source);
    const year = /\/weather\/years\/(\d+)$/.exec(url);
    if (year) {
      if (Number(year[1]) === failYear) {
        return json(
          { statusCode: 502, error: 'Bad Gateway', message: 'The weather service answered 500', field: 'weather' },
          502,
        );
      }
      return json({ year: Number(year[1]), fromCache: false, hourCount: 8760, missingHourCount: 0 }, 201);
    }
    if (url.startsWith('/api/farms/3/weather/climate-proposal')) return json(PROPOSAL);
    return json({ message: `unexpected ${url}` }, 404);
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

describe('WeatherFillDialog', () => {
  it('reads every year of the span, shows the proposal beside the current values and saves what is kept', async () => {
    const user = userEvent.setup();
    const fetchMock = stubApi();
    const onSave = vi.fn(async (_climate: SiteClimate) => ({}));
    renderWithProviders(<WeatherFillDialog farmId={3} open current={null} onClose={() => {}} onSave={onSave} />, 'us');
    expect((await screen.findByTestId('weather-source-note')).textContent).toMatch(/INVENTED/);
    await user.click(screen.getByRole('button', { name: 'Read the history' }));
    await screen.findByTestId('weather-proposal');
    const yearCalls = fetchMock.mock.calls
      .map(([request]) => requestPath(request))
      .filter((url) => url.includes('/weather/years/'));
    expect(yearCalls).toHaveLength(10);
    expect(yearCalls[0]).toBe('/api/farms/3/weather/years/2016');
    // −29.5 °C = −21.1 °F, in the user's units (hand arithmetic: −29.5 × 9/5 + 32)
    expect(screen.getByRole('table', { name: 'Current and proposed design temperatures' }).textContent).toMatch(
      /-21\.1 °F/,
    );
    expect(screen.getByTestId('weather-proposal').textContent).toMatch(/Left out: 2025 \(11\.4 % missing\)/);
    await user.click(screen.getByRole('button', { name: 'Save these values' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    expect(onSave.mock.calls[0]![0]).toMatchObject({ winterDesignC: -29.5, summerDesignC: 30.2 });
  });

  it('stops at a failed year, says nothing was changed and saves nothing', async () => {
    const user = userEvent.setup();
    stubApi(2019);
    const onSave = vi.fn(async (_climate: SiteClimate) => ({}));
    renderWithProviders(<WeatherFillDialog farmId={3} open current={null} onClose={() => {}} onSave={onSave} />);
    await screen.findByTestId('weather-source-note');
    await user.click(screen.getByRole('button', { name: 'Read the history' }));
    await waitFor(() =>
      expect(screen.getAllByRole('alert').map((alert) => alert.textContent)).toContainEqual(
        expect.stringMatching(/Nothing was changed: The weather service answered 500/),
      ),
    );
    expect((screen.getByRole('button', { name: 'Save these values' }) as HTMLButtonElement).disabled).toBe(true);
    expect(onSave).not.toHaveBeenCalled();
  });
});
