import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MeasureComparison, MeasureResult } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { MeasuresPanel } from './measures-panel';

const season = {
  energyKWh: 141_081,
  fuelInputKWh: 176_352,
  fuelQuantitySi: 24_940,
  fuelQuantityUs: 6_588,
  cost: 10_541,
  fuelId: 'propane',
  unitSi: 'L',
  unitUs: 'US gal',
};

function measure(index: number, kind: MeasureResult['kind'], costAmount: number, yearlyMoneySaved: number): MeasureResult {
  return {
    index,
    kind,
    label: kind === 'thermal-curtain' ? 'Install a thermal curtain' : 'Lower the night setpoint',
    description: kind === 'night-setpoint-lower' ? 'night setpoint lowered by {{temperatureDifference:2}}' : '',
    costAmount,
    season,
    heatSavedKWh: 10_000,
    fuelInputSavedKWh: 12_500,
    fuelSavedSi: 1_768,
    fuelSavedUs: 467,
    yearlyMoneySaved,
    paybackYears: costAmount === 0 ? 0 : costAmount / yearlyMoneySaved,
    paybackText: costAmount === 0 ? 'enter a cost' : `${(costAmount / yearlyMoneySaved).toFixed(1)} years`,
    lightChange:
      kind === 'thermal-curtain'
        ? { surface: 'roof', before: 0.78, after: 0.7566, relativeChange: -0.03, source: 'rule of thumb' }
        : null,
    notes: [],
  };
}

function comparison(measures: MeasureResult[], defaultsUsed: boolean): MeasureComparison {
  return { houseId: 7, baseline: season, measures, defaultsUsed, notes: [], inputsUsed: {} as MeasureComparison['inputsUsed'] };
}

afterEach(() => vi.unstubAllGlobals());

describe('MeasuresPanel', () => {
  it('prices the default measures with the user’s costs and shows the ranking the API returns', async () => {
    const user = userEvent.setup();
    const bodies: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init: RequestInit) => {
        const body = JSON.parse(String(init.body)) as { measures: unknown[] };
        bodies.push(body);
        const result =
          body.measures.length === 0
            ? comparison([measure(0, 'thermal-curtain', 0, 2116), measure(1, 'night-setpoint-lower', 0, 847)], true)
            : comparison([measure(1, 'night-setpoint-lower', 100, 847), measure(0, 'thermal-curtain', 12_000, 2116)], false);
        return new Response(JSON.stringify(result), { status: 200, headers: { 'content-type': 'application/json' } });
      }),
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <UnitSystemProvider system="si">
          <MeasuresPanel houseId={7} climateSource="normals" />
        </UnitSystemProvider>
      </QueryClientProvider>,
    );

    const curtainCost = await screen.findByRole('textbox', { name: 'Cost of: Install a thermal curtain' });
    expect(screen.getByText('Roof: 78 % → 76 % (3 % less light)')).toBeTruthy();
    // The API's prose carries quantities as tokens; they are written in the user's units.
    expect(screen.getByText('night setpoint lowered by 2.0 K')).toBeTruthy();
    await user.type(curtainCost, '12000');
    await user.type(screen.getByRole('textbox', { name: 'Cost of: Lower the night setpoint' }), '100');
    await user.click(screen.getByRole('button', { name: 'Rank by payback' }));

    await waitFor(() => expect(bodies).toHaveLength(2));
    expect(bodies[1]).toEqual({
      measures: [
        { kind: 'thermal-curtain', costAmount: 12_000 },
        { kind: 'night-setpoint-lower', costAmount: 100 },
      ],
      climateSource: 'normals',
    });
    await screen.findByText('5.7 years');
    const rows = screen.getAllByRole('row').slice(1);
    expect(rows[0]!.textContent).toContain('Lower the night setpoint');
    expect(rows[1]!.textContent).toContain('Install a thermal curtain');
  });
});
