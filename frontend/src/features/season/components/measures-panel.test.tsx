import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MeasureComparison, MeasureResult } from '../../../api/types';
import { renderWithProviders } from '../../../test/render-with-providers';
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

function measure(
  index: number,
  kind: MeasureResult['kind'],
  costAmount: number | null,
  yearlyMoneySaved: number,
): MeasureResult {
  const paybackYears = costAmount === null ? null : costAmount / yearlyMoneySaved;
  return {
    index,
    kind,
    label: kind === 'thermal-curtain' ? 'Install a thermal curtain' : 'Lower the night setpoint',
    description: kind === 'night-setpoint-lower' ? 'night setpoint lowered by {{temperatureDifference:2}}' : '',
    costAmount,
    applicable: true,
    notApplicableReason: null,
    season,
    heatSavedKWh: 10_000,
    fuelInputSavedKWh: 12_500,
    fuelSavedSi: 1_768,
    fuelSavedUs: 467,
    yearlyMoneySaved,
    paybackStatus: paybackYears === null ? 'enter-cost' : 'years',
    paybackYears,
    paybackText: paybackYears === null ? 'enter a cost' : `${paybackYears.toFixed(1)} years`,
    lightChange:
      kind === 'thermal-curtain'
        ? { surface: 'roof', before: 0.78, after: 0.7566, relativeChange: -0.03, source: 'rule of thumb' }
        : null,
    notes: [],
  };
}

function comparison(measures: MeasureResult[], defaultsUsed: boolean): MeasureComparison {
  return {
    houseId: 7,
    baseline: season,
    measures,
    defaultsUsed,
    notes: [],
    inputsUsed: {} as MeasureComparison['inputsUsed'],
  };
}

afterEach(() => vi.unstubAllGlobals());

describe('MeasuresPanel', () => {
  it('prices the default measures with the user’s costs and shows the ranking the API returns', async () => {
    const user = userEvent.setup();
    const bodies: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (request: Request) => {
        const body = (await request.json()) as { measures: unknown[] };
        bodies.push(body);
        const result =
          body.measures.length === 0
            ? comparison(
                [measure(0, 'thermal-curtain', null, 2116), measure(1, 'night-setpoint-lower', null, 847)],
                true,
              )
            : comparison(
                [measure(1, 'night-setpoint-lower', 100, 847), measure(0, 'thermal-curtain', 12_000, 2116)],
                false,
              );
        return new Response(JSON.stringify(result), { status: 200, headers: { 'content-type': 'application/json' } });
      }),
    );
    renderWithProviders(<MeasuresPanel houseId={7} climateSource="normals" />, 'si');

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

  it('shows why a measure does not apply in place of its savings and payback, listed last without a rank', async () => {
    const notApplicable: MeasureResult = {
      ...measure(1, 'night-setpoint-lower', 500, 0),
      kind: 'second-poly-layer',
      label: 'Add a second, inflated poly layer',
      description: 'roof and sidewalls covered with Inflated double polyethylene',
      applicable: false,
      notApplicableReason:
        'The roof and sidewalls already lose as little heat as Inflated double polyethylene or less (U now: roof {{uValue:3.41}}, sidewalls {{uValue:3.41}}; Inflated double polyethylene: {{uValue:3.97}}).',
      heatSavedKWh: 0,
      fuelInputSavedKWh: 0,
      fuelSavedSi: 0,
      fuelSavedUs: 0,
      yearlyMoneySaved: 0,
      paybackStatus: 'not-applicable',
      paybackYears: null,
      paybackText: 'not applicable',
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        const result = comparison([measure(0, 'thermal-curtain', null, 2116), notApplicable], true);
        return new Response(JSON.stringify(result), { status: 200, headers: { 'content-type': 'application/json' } });
      }),
    );
    renderWithProviders(<MeasuresPanel houseId={7} climateSource="normals" />, 'us');
    const table = await screen.findByRole('table', { name: 'Measures ranked by payback' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows[0]!.textContent).toContain('enter a cost');
    const layer = rows[1]!;
    // the reason, with its U-values in the user's units (3.41 W/(m²·K) ÷ 5.678263 = 0.601 Btu/(h·ft²·°F), NIST SP 811 B.8)
    expect(layer.textContent).toContain('Does not apply: The roof and sidewalls already lose as little heat');
    expect(layer.textContent).toMatch(/0\.601 Btu/);
    expect(layer.textContent).not.toMatch(/\{\{/);
    // no rank, no savings and no payback for it
    expect(within(layer).getAllByRole('cell')[0]!.textContent).toBe('—');
    expect(layer.textContent).not.toContain('years');
    expect(layer.textContent).not.toContain('never');
    expect(layer.textContent).not.toContain('$0');
  });
});
