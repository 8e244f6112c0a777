import { describe, expect, it } from 'vitest';
import type { SideBySide, SideBySideColumn } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { sideBySideRows } from './side-by-side-rows';

/** Two columns with only what the season and summer rows read; the alternative may add lamps. */
function data(lampElectricityKWh: number | null): SideBySide {
  const column = (key: string, lamps: boolean, requiredFlowM3PerS: number) =>
    ({
      key,
      alternativeId: key === 'house' ? null : 1,
      name: key,
      changedFields: [],
      invalid: null,
      heating: null,
      cooling: { capacity: { requiredFlowM3PerS, verdict: 'adequate' }, airExchange: { airChangesPerHour: 40 } },
      season: {
        fuel: { fuelId: 'propane', label: 'Propane', unitSi: 'L', unitUs: 'US gal' },
        total: { energyKWh: 100_000, cost: 5_000, fuelQuantitySi: 15_000, fuelQuantityUs: 3_960 },
        lamps: lamps ? { electricityKWh: lampElectricityKWh } : null,
      },
      versusHouse: null,
      light: null,
    }) as unknown as SideBySideColumn;
  return {
    columns: [column('house', false, 10), column('alternative-1', lampElectricityKWh !== null, 12.5)],
    seasonInputsUsed: { currency: 'USD' },
  } as unknown as SideBySide;
}

describe('side-by-side rows with lamps', () => {
  it('without lamps in any column there is no lamp row', () => {
    const keys = sideBySideRows(data(null), unitsFor('si')).map((row) => row.key);
    expect(keys).not.toContain('lamp-electricity');
    expect(keys).not.toContain('fan-flow');
  });

  it('an alternative with lamps shows their electricity against none for the house, and the fan flow', () => {
    const rows = sideBySideRows(data(25_000), unitsFor('si'));
    const electricity = rows.find((row) => row.key === 'lamp-electricity')!;
    expect(electricity.label).toMatch(/not in the fuel cost/);
    expect(electricity.cells.map((cell) => cell.value)).toEqual([0, 25_000]);
    expect(electricity.cells[1].difference).toMatch(/^\+25,000/);
    const flow = rows.find((row) => row.key === 'fan-flow')!;
    // 12.5 − 10 = 2.5 m³/s more
    expect(flow.cells[1].difference).toMatch(/^\+2\.50/);
  });
});
