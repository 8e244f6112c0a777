import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, onTestFinished, vi } from 'vitest';
import type { SeasonBudget } from '../../../api/types';
import { requestPath } from '../../../test/fake-api';
import { renderWithProviders } from '../../../test/render-with-providers';
import { SeasonBudgetSection } from './season-budget-section';

const propaneHouse = {
  houseId: 1,
  name: 'House A',
  heatLossBasis: 'handbook' as const,
  heatLossFactor: 1,
  fuelId: 'propane',
  fuelLabel: 'Propane',
  unitSi: 'L',
  unitUs: 'US gal',
  heaterEfficiency: 0.8,
  pricePerUnit: 1.6,
  priceUnit: 'us' as const,
  energyKWh: 141_081.37,
  fuelInputKWh: 176_351.71,
  fuelQuantitySi: 24_939.75,
  fuelQuantityUs: 6_588.39,
  cost: 10_541.42,
  heatedDays: 228,
  calendarPeriodCount: 3,
  unmetHeatKWh: 0,
  hoursBelowSetpoint: 0,
  capacityCaution: null as string | null,
  monthly: [],
  problem: null,
};

const budget: SeasonBudget = {
  heatLossBasisRequested: 'handbook',
  heatLossBasis: 'handbook',
  calibrationId: null,
  calibratedAt: null,
  heatLossBasisStatement: 'Heat loss from the handbook values (coverings, perimeter and air-leakage class).',
  farmId: 3,
  startDate: '2026-09-01',
  endDate: '2027-05-31',
  seasonFrom: 'default-heating-season',
  climateSource: 'normals',
  temperatureLogId: null,
  houses: [
    propaneHouse,
    {
      ...propaneHouse,
      houseId: 2,
      name: 'House B',
      cost: null,
      problem: 'no price for the fuel',
      unmetHeatKWh: 293.0711,
      hoursBelowSetpoint: 37,
      capacityCaution:
        'The heaters (installed output {{power:70337}}) cannot hold the setpoint for 37 hours of the season.',
    },
  ],
  byFuel: [
    {
      fuelId: 'propane',
      label: 'Propane',
      unitSi: 'L',
      unitUs: 'US gal',
      houseCount: 2,
      energyKWh: 282_162.74,
      fuelInputKWh: 352_703.42,
      fuelQuantitySi: 49_879.5,
      fuelQuantityUs: 13_176.78,
      cost: 10_541.42,
    },
  ],
  totalEnergyKWh: 282_162.74,
  totalCost: 10_541.42,
  currency: 'EUR',
  costComplete: false,
  monthly: [{ year: 2026, month: 9, energyKWh: 3984.7, fuelInputKWh: 4980.9, cost: 297.73, byFuel: [] }],
  notes: ['Heat is delivered heat.'],
  cautions: ['Propane heaters need combustion air and proper venting; carbon monoxide and ethylene.'],
};

function jsonResponse(body: unknown): Response {
  return new Response(JSON.stringify(body), { status: 200, headers: { 'content-type': 'application/json' } });
}

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe('SeasonBudgetSection', () => {
  it('shows each house and the farm total in US units, flags unpriced houses, and downloads the US CSV', async () => {
    const user = userEvent.setup();
    const fetchMock = vi.fn(async (request: Request) =>
      requestPath(request).endsWith('.csv?units=us')
        ? new Response('house,month\n', {
            status: 200,
            headers: {
              'content-type': 'text/csv',
              'content-disposition': 'attachment; filename="season-budget-farm-3-us.csv"',
            },
          })
        : jsonResponse(budget),
    );
    vi.stubGlobal('fetch', fetchMock);
    // jsdom has no object URLs: lend URL the two methods for this test only.
    const urlMethods = URL as unknown as Record<'createObjectURL' | 'revokeObjectURL', unknown>;
    const originals = { create: urlMethods.createObjectURL, revoke: urlMethods.revokeObjectURL };
    urlMethods.createObjectURL = vi.fn(() => 'blob:budget');
    urlMethods.revokeObjectURL = vi.fn();
    onTestFinished(() => {
      urlMethods.createObjectURL = originals.create;
      urlMethods.revokeObjectURL = originals.revoke;
    });
    const clicked: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function record(this: HTMLAnchorElement) {
      clicked.push(this.download);
    });

    renderWithProviders(<SeasonBudgetSection farmId={3} />, 'us');

    expect(await screen.findByTestId('farm-season-cost')).toHaveProperty('textContent', '€10,541');
    const table = screen.getByRole('table', { name: 'Season fuel budget per house' });
    const houseA = within(table).getByRole('row', { name: /House A/ });
    // 141 081.37 kWh = 481.39 MMBtu (1 MMBtu = 293.0711 kWh, NIST SP 811 B.8)
    expect(houseA.textContent).toContain('481.39 MMBtu');
    expect(houseA.textContent).toContain('6,588 US gal');
    expect(within(table).getByText('no price for the fuel')).toBeTruthy();
    // House B's heaters cannot hold its setpoint: flagged with the hours and the heat not delivered (1 MMBtu)
    const houseB = within(table).getByRole('row', { name: /House B/ });
    expect(houseB.textContent).toContain('37 h below setpoint: heaters too small (1.00 MMBtu not delivered)');
    expect(houseA.textContent).not.toContain('below setpoint');
    expect(screen.getByText(/left out of the total cost/)).toBeTruthy();
    expect(screen.getByRole('note').textContent).toContain('carbon monoxide');

    await user.click(screen.getByRole('button', { name: 'Export CSV (US units)' }));
    await waitFor(() => expect(clicked).toEqual(['season-budget-farm-3-us.csv']));
    expect(fetchMock.mock.calls.map(([request]) => requestPath(request))).toContain(
      '/api/farms/3/season-budget.csv?units=us',
    );
  });

  it('without any price, shows heat and fuel, no money, and asks for each missing price in place', async () => {
    const unpriced: SeasonBudget = {
      ...budget,
      houses: budget.houses.map((house) => ({ ...house, pricePerUnit: null, priceUnit: null, cost: null })),
      byFuel: budget.byFuel.map((fuel) => ({ ...fuel, cost: null })),
      totalCost: null,
      monthly: budget.monthly.map((month) => ({ ...month, cost: null })),
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => jsonResponse(unpriced)),
    );
    const asked: string[] = [];
    renderWithProviders(
      <SeasonBudgetSection
        farmId={3}
        renderMissingPrice={(fuel) => {
          asked.push(`${fuel.label} (${fuel.unitSi} / ${fuel.unitUs})`);
          return <p>price form for {fuel.label}</p>;
        }}
      />,
      'us',
    );
    expect(await screen.findByTestId('farm-season-cost')).toHaveProperty('textContent', 'needs fuel prices');
    // one form per fuel, however many houses burn it
    expect(screen.getAllByText('price form for Propane')).toHaveLength(1);
    expect(asked.at(-1)).toBe('Propane (L / US gal)');
    const houseA = within(screen.getByRole('table', { name: 'Season fuel budget per house' })).getByRole('row', {
      name: /House A/,
    });
    expect(houseA.textContent).toContain('6,588 US gal');
    expect(houseA.textContent).toContain('—');
  });
});
