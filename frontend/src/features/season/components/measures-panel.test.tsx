import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MeasureComparison, MeasureResult } from '../../../api/types';
import { requestPath } from '../../../test/fake-api';
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

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

/** No measures kept with house 7 yet (version 0). */
const EMPTY_PLAN = { houseId: 7, measures: [], version: 0 };

/** Answers the measure plan's GET and PUT; everything else goes to `measures`. */
function stubApi(
  measures: (body: { measures: unknown[] }) => MeasureComparison,
  plan: { houseId: number; measures: unknown[]; version: number } = EMPTY_PLAN,
) {
  const puts: Array<{ body: unknown; ifMatch: string | null }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (request: Request) => {
      const url = requestPath(request);
      if (url.endsWith('/api/reference-data')) {
        // the two heater types the picker names here, labels as in reference-data/heater-types.json
        const rows = [
          { id: 'unit-heater-condensing', label: 'Condensing unit heater', heaterType: 'condensing' },
          {
            id: 'unit-heater-separated-combustion',
            label: 'Separated-combustion unit heater (non-condensing)',
            heaterType: 'separated-combustion',
          },
        ];
        return json({ 'heater-types': { title: 'Heater types', rows } });
      }
      if (url.endsWith('/measure-plan')) {
        if (request.method === 'GET') return json(plan);
        const body = (await request.json()) as { measures: unknown[] };
        puts.push({ body, ifMatch: request.headers.get('If-Match') });
        return json({ houseId: 7, measures: body.measures, version: plan.version + 1 });
      }
      return json(measures((await request.json()) as { measures: unknown[] }));
    }),
  );
  return puts;
}

describe('MeasuresPanel', () => {
  it('prices the default measures with the user’s costs and shows the ranking the API returns', async () => {
    const user = userEvent.setup();
    const bodies: unknown[] = [];
    const puts = stubApi((body) => {
      bodies.push(body);
      return body.measures.length === 0
        ? comparison([measure(0, 'thermal-curtain', null, 2116), measure(1, 'night-setpoint-lower', null, 847)], true)
        : comparison(
            [measure(1, 'night-setpoint-lower', 100, 847), measure(0, 'thermal-curtain', 12_000, 2116)],
            false,
          );
    });
    renderWithProviders(<MeasuresPanel houseId={7} climateSource="normals" canSavePlan />, 'si');

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
    // the ranked list and its costs are kept with the house, on the version loaded
    await screen.findByText(/Kept with the house/);
    expect(puts).toEqual([{ body: { measures: (bodies[1] as { measures: unknown[] }).measures }, ifMatch: '0' }]);
  });

  it('starts from the measures kept with the house, costs and heater type included, and sends them as kept', async () => {
    const kept = [
      { kind: 'thermal-curtain', costAmount: 12_000 },
      { kind: 'heater-efficiency', heaterType: 'separated-combustion' },
    ];
    const bodies: Array<{ measures: unknown[] }> = [];
    const puts = stubApi(
      (body) => {
        bodies.push(body);
        return comparison(
          [
            measure(0, 'thermal-curtain', 12_000, 2116),
            {
              ...measure(1, 'night-setpoint-lower', null, 900),
              kind: 'heater-efficiency',
              label: 'More efficient heaters',
            },
          ],
          false,
        );
      },
      { houseId: 7, measures: kept, version: 3 },
    );
    const user = userEvent.setup();
    renderWithProviders(<MeasuresPanel houseId={7} climateSource="normals" canSavePlan />, 'si');

    expect(await screen.findByDisplayValue('12000')).toBeTruthy();
    // the defaults are never asked for: the first comparison is the kept list
    expect(bodies[0]!.measures).toEqual(kept);
    await user.click(screen.getByRole('combobox', { name: 'New heaters' }));
    await user.click(await screen.findByRole('option', { name: 'Condensing unit heater' }));
    await user.click(screen.getByRole('button', { name: 'Rank by payback' }));
    await waitFor(() => expect(puts).toHaveLength(1));
    expect(puts[0]).toEqual({
      body: {
        measures: [
          { kind: 'thermal-curtain', costAmount: 12_000 },
          { kind: 'heater-efficiency', heaterType: 'condensing' },
        ],
      },
      ifMatch: '3',
    });
  });

  it('compares without keeping anything for a user who may not save the house', async () => {
    const puts = stubApi(() => comparison([measure(0, 'thermal-curtain', null, 2116)], true));
    const user = userEvent.setup();
    renderWithProviders(<MeasuresPanel houseId={7} climateSource="normals" />, 'si');
    await user.type(await screen.findByRole('textbox', { name: 'Cost of: Install a thermal curtain' }), '500');
    await user.click(screen.getByRole('button', { name: 'Rank by payback' }));
    await waitFor(() =>
      expect(screen.getByRole('button', { name: 'Rank by payback' }).hasAttribute('disabled')).toBe(false),
    );
    expect(puts).toEqual([]);
    expect(screen.queryByText(/Kept with the house/)).toBeNull();
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
    stubApi(() => comparison([measure(0, 'thermal-curtain', null, 2116), notApplicable], true));
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
