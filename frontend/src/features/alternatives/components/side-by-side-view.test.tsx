import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { SideBySide, SideBySideColumn } from '../../../api/types';
import { saveBlob } from '../../../lib/save-blob';
import { unitsFor } from '../../../lib/units';
import { demoHouseB, demoHouseBCooling, demoHouseBHeating } from '../../../test/estimate-fixtures';
import { renderWithProviders } from '../../../test/render-with-providers';
import { SideBySideView } from './side-by-side-view';

vi.mock('../../../lib/save-blob', () => ({ saveBlob: vi.fn() }));

type Heating = NonNullable<SideBySideColumn['heating']>;

/**
 * The demo house B's design night with roof and sidewalls at another U-value: each part's watts
 * scale with U (U·A·ΔT), the heater figures follow from the new total and the house's margin.
 */
function heatingWithCoverU(uWPerM2K: number): Heating {
  const heating = structuredClone(demoHouseBHeating) as Heating;
  for (const part of heating.heatLoss.components) {
    if (part.key !== 'roof' && part.key !== 'sidewalls') continue;
    part.watts *= uWPerM2K / part.coefficient;
    part.coefficient = uWPerM2K;
  }
  heating.heatLoss.totalW = heating.heatLoss.components.reduce((sum, part) => sum + part.watts, 0);
  const heater = heating.heater;
  heater.requiredOutputW = heating.heatLoss.totalW * (1 + heater.safetyMargin);
  heater.verdict = heater.requiredOutputW <= heater.installedOutputW ? 'adequate' : 'short';
  return heating;
}

function season(cost: number, energyKWh: number): SideBySideColumn['season'] {
  return {
    fuel: { fuelId: 'natural-gas', label: 'Natural gas', unitSi: 'm³', unitUs: 'therm' },
    total: { energyKWh, cost, fuelQuantitySi: energyKWh / 9, fuelQuantityUs: energyKWh / 29 },
  } as unknown as SideBySideColumn['season'];
}

const light = (lightTransmittance: number, houseTransmittance: number, coveringLabel: string) =>
  (['roof', 'sidewalls', 'endwalls'] as const).map((group) => ({
    group,
    coveringId: group,
    coveringLabel: group === 'endwalls' ? 'Single poly' : coveringLabel,
    lightTransmittance: group === 'endwalls' ? houseTransmittance : lightTransmittance,
    changeFromHouse: group === 'endwalls' ? 0 : lightTransmittance / houseTransmittance - 1,
  }));

const houseColumn: SideBySideColumn = {
  key: 'house',
  alternativeId: null,
  name: demoHouseB.name,
  changedFields: [],
  ownCalendar: false,
  costAmount: null,
  invalid: null,
  heating: demoHouseBHeating,
  cooling: demoHouseBCooling,
  season: season(9_000, 120_000),
  light: light(0.87, 0.87, 'Single poly'),
  versusHouse: null,
};

const doublePolyHeating = heatingWithCoverU(4.0);
const doublePoly: SideBySideColumn = {
  ...houseColumn,
  key: 'alternative-11',
  alternativeId: 11,
  name: 'Inflated double poly',
  changedFields: ['coverings.roof', 'coverings.sidewalls'],
  costAmount: 4_200,
  heating: doublePolyHeating,
  season: season(6_000, 80_000),
  light: light(0.78, 0.87, 'Inflated double poly'),
  versusHouse: {
    yearlySaving: 3_000,
    heatSavedKWh: 40_000,
    fuelInputSavedKWh: 50_000,
    designHeatLossChangeW: doublePolyHeating.heatLoss.totalW - demoHouseBHeating.heatLoss.totalW,
    paybackYears: 4_200 / 3_000,
    paybackStatus: 'years',
  },
};

const lowRidge: SideBySideColumn = {
  ...houseColumn,
  key: 'alternative-12',
  alternativeId: 12,
  name: 'Lower ridge',
  changedFields: ['ridgeHeightM'],
  costAmount: 900,
  invalid: { field: 'ridgeHeightM', message: 'The ridge must be higher than the eave' },
  heating: null,
  cooling: null,
  season: null,
  light: null,
};

const data = {
  houseId: demoHouseB.id,
  houseName: demoHouseB.name,
  columns: [houseColumn, doublePoly, lowRidge],
  seasonInputsUsed: { currency: 'USD' },
} as unknown as SideBySide;

/** The cells of the row headed `label`, in column order. */
function rowCells(label: string): string[] {
  const row = screen.getByRole('rowheader', { name: label }).closest('tr')!;
  return within(row)
    .getAllByRole('cell')
    .map((cell) => cell.textContent ?? '');
}

beforeEach(() => vi.mocked(saveBlob).mockClear());
afterEach(() => vi.unstubAllGlobals());

describe('SideBySideView', () => {
  it('puts the house and each alternative in columns, saying what each changes', () => {
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />);
    const table = screen.getByRole('table', { name: 'The house and its alternatives side by side' });
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((cell) => cell.textContent);
    expect(headers).toEqual([
      'Quantity',
      `${demoHouseB.name}the house as it is`,
      'Inflated double polychanges roof covering, sidewall covering',
      'Lower ridgechanges ridge height',
    ]);
  });

  it('shows each quantity with the difference against the house, in the user’s units', () => {
    const si = unitsFor('si');
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />);
    const saved = demoHouseBHeating.heatLoss.totalW - doublePolyHeating.heatLoss.totalW;
    expect(saved).toBeGreaterThan(0);
    expect(rowCells('Design heat loss')).toEqual([
      si.format('power', demoHouseBHeating.heatLoss.totalW),
      `${si.format('power', doublePolyHeating.heatLoss.totalW)}−${si.format('power', saved)} vs house`,
      '—',
    ]);
    expect(rowCells('Installed cost')).toEqual(['—', `${si.money(4_200, 'USD', 0)}`, '—']);
    expect(rowCells('Yearly saving')[1]).toBe(si.money(3_000, 'USD', 0));
    expect(rowCells('Simple payback')).toEqual(['—', '1.4 years', '—']);
    // the warning words of the engine's results reach the table
    expect(rowCells('Heaters on the design night')).toEqual(['short', doublePolyHeating.heater.verdict, '—']);
    expect(rowCells('Roof: inside surface')[0]).toContain('drips');
    // 0.78 / 0.87 − 1 = −10.3 %: the light lost is shown against the house
    expect(rowCells('Roof: light through')[1]).toContain('−10 % light vs house');
    // unchanged endwalls: no sign on a zero difference
    expect(rowCells('Endwalls: light through')[1]).toBe(
      `${si.format('fraction', 0.87)} (Single poly)0 % light vs house`,
    );
  });

  it('reads in US units for a US user', () => {
    const us = unitsFor('us');
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />, 'us');
    expect(rowCells('Design heat loss')[0]).toBe(us.format('power', demoHouseBHeating.heatLoss.totalW));
    expect(rowCells('Design heat loss')[0]).toMatch(/Btu\/h/);
  });

  it('says which alternative cannot be computed now and why, naming the field', () => {
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />);
    const warnings = screen.getAllByRole('alert');
    expect(warnings).toHaveLength(1);
    expect(warnings[0].textContent).toBe(
      'Lower ridge cannot be computed with the house as it is now: The ridge must be higher than the eave (field ridgeHeightM). Edit or delete this alternative.',
    );
  });

  it('downloads the table as CSV with a difference column per alternative', async () => {
    const user = userEvent.setup();
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />);
    await user.click(screen.getByRole('button', { name: 'Download CSV' }));
    expect(saveBlob).toHaveBeenCalledOnce();
    const [blob, fileName] = vi.mocked(saveBlob).mock.calls[0];
    expect(fileName).toBe('house-b.csv');
    const lines = (await blob.text()).trimEnd().split('\n');
    expect(lines[0]).toBe(
      `Quantity,${demoHouseB.name},Inflated double poly,Inflated double poly: vs house,Lower ridge,Lower ridge: vs house`,
    );
    expect(lines.find((line) => line.startsWith('Season: Simple payback,'))).toBe(
      'Season: Simple payback,—,1.4 years,,—,',
    );
  });

  it('prints through the browser', async () => {
    const user = userEvent.setup();
    const print = vi.fn();
    vi.stubGlobal('print', print);
    renderWithProviders(<SideBySideView data={data} fileName="house-b" />);
    await user.click(screen.getByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledOnce();
  });
});
