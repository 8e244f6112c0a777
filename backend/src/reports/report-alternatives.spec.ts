import { alternativeCautions, alternativesSection, ALTERNATIVES_HEADING } from './report-alternatives';
import type { ReportAlternativeColumn, ReportAlternatives } from './report-snapshot';

/**
 * Columns written by hand with round numbers, so each expected text below is plain arithmetic:
 * 1 kW = 1000 W; 1 Btu/h = 1055.05585262 J / 3600 s (International Table Btu); 1 cfm = 0.3048³ m³
 * per minute = 0.000471947443 m³/s; °F = °C × 9/5 + 32.
 */
type Heating = NonNullable<ReportAlternativeColumn['heating']>;

function heating(totalW: number, verdict: Heating['heater']['verdict'], installedOutputW: number): Heating {
  const requiredOutputW = totalW * 1.15;
  return {
    heatLoss: { totalW, insideC: 15 } as Heating['heatLoss'],
    heater: {
      verdict,
      requiredOutputW,
      installedOutputW,
      shortfallW: Math.max(requiredOutputW - installedOutputW, 0),
      lowestHeldOutdoorC: verdict === 'none-installed' ? null : -20,
    } as Heating['heater'],
    cautions: [],
  };
}

function column(
  index: number,
  changes: Partial<ReportAlternativeColumn> & Pick<ReportAlternativeColumn, 'name'>,
): ReportAlternativeColumn {
  return {
    key: index === 0 ? 'house' : `alternative-${index}`,
    alternativeId: index === 0 ? null : index,
    changedFields: [],
    ownCalendar: false,
    costAmount: null,
    invalid: null,
    versusHouse: null,
    heating: heating(40_000, 'adequate', 50_000),
    cooling: {
      capacity: { requiredFlowM3PerS: 12, installedFlowM3PerS: 10, verdict: 'short' },
    } as ReportAlternativeColumn['cooling'],
    season: {
      period: { startDate: '2026-09-01', endDate: '2027-05-31', days: 273, heatedDays: 273 },
      fuel: { fuelId: 'propane', label: 'Propane', unitSi: 'L', unitUs: 'US gal', pricePerUnit: 0.5 },
      total: { energyKWh: 100_000, fuelInputKWh: 125_000, fuelQuantitySi: 17_675, fuelQuantityUs: 4_669, cost: 8_000 },
      cautions: [],
    } as unknown as ReportAlternativeColumn['season'],
    ...changes,
  };
}

const versus = (changes: Partial<NonNullable<ReportAlternativeColumn['versusHouse']>>) => ({
  yearlySaving: 1_000,
  heatSavedKWh: 0,
  fuelInputSavedKWh: 0,
  designHeatLossChangeW: 0,
  paybackYears: null,
  paybackStatus: 'enter-cost' as const,
  ...changes,
});

function compared(columns: ReportAlternativeColumn[], savedCount = columns.length - 1): ReportAlternatives {
  return {
    status: 'compared',
    savedCount,
    columns,
    heatingConditionsUsed: { designOutdoorC: -20 } as never,
    seasonInputsUsed: { startDate: '2026-09-01', endDate: '2027-05-31' } as never,
  };
}

const rowsOf = (alternatives: ReportAlternatives, system: 'si' | 'us' = 'si') => {
  const section = alternativesSection(alternatives, system, 'USD')!;
  const table = section.blocks.find((b) => b.kind === 'table')!;
  return { section, table, row: (label: string) => table.rows!.find((r) => r[0] === label)!.slice(1) };
};

describe('the alternatives-compared section of a report', () => {
  const house = column(0, { name: 'North house' });
  const curtain = column(1, {
    name: 'Curtain',
    changedFields: ['curtainId'],
    costAmount: 2_500,
    season: { ...house.season!, total: { ...house.season!.total, cost: 7_000 } },
    versusHouse: versus({ yearlySaving: 1_000, paybackYears: 2.5, paybackStatus: 'years' }),
  });
  const fewerHeaters = column(2, {
    name: 'One heater',
    changedFields: ['heaters.0.count'],
    ownCalendar: true,
    costAmount: 0,
    heating: heating(40_000, 'short', 20_000),
    season: { ...house.season!, total: { ...house.season!.total, cost: 8_400 } },
    versusHouse: versus({ yearlySaving: -400, paybackStatus: 'never' }),
  });

  it('writes one column per house and alternative, each row in words and the farm’s currency', () => {
    const { table, row } = rowsOf(compared([house, curtain, fewerHeaters]));
    expect(table.comparison).toBe(true);
    expect(table.columns).toEqual(['', 'North house as it is', 'Curtain', 'One heater']);
    expect(row('What it changes')).toEqual([
      'Nothing: the house as it is',
      'Changes curtain',
      'Changes heaters, production calendar',
    ]);
    expect(row('Installed cost')).toEqual(['—', '$2,500', '$0']);
    expect(row('Design heat loss')).toEqual(['40.0 kW', '40.0 kW', '40.0 kW']);
    // 40 kW × 1.15 = 46 kW required; 46 − 20 = 26 kW short
    expect(row('Heater output required / installed')).toEqual([
      '46.0 kW / 50.0 kW',
      '46.0 kW / 50.0 kW',
      '46.0 kW / 20.0 kW',
    ]);
    expect(row('Heaters on the design night')[0]).toBe(
      'Holds the night setpoint (15.0 °C); the heaters hold it down to -20.0 °C outside',
    );
    expect(row('Heaters on the design night')[2]).toBe(
      'Does not hold the night setpoint (15.0 °C): 26.0 kW short; the heaters hold it down to -20.0 °C outside',
    );
    expect(row('Exhaust air, summer')[0]).toBe('12.00 m³/s required; 10.00 m³/s installed (short)');
    expect(row('Season fuel')).toEqual(['Propane: 17,675 L', 'Propane: 17,675 L', 'Propane: 17,675 L']);
    expect(row('Season fuel cost')).toEqual(['$8,000', '$7,000', '$8,400']);
    expect(row('Saving a year against the house')).toEqual(['—', '$1,000', 'costs $400 more']);
    expect(row('Simple payback')).toEqual(['—', '2.5 years', 'never (it saves nothing)']);
  });

  it('says "no price" where the farm had no price for the fuel, and which payback cannot be given', () => {
    const unpriced = (c: ReportAlternativeColumn): ReportAlternativeColumn => ({
      ...c,
      season: { ...c.season!, total: { ...c.season!.total, cost: null } },
    });
    const { row } = rowsOf(
      compared([
        unpriced(house),
        unpriced({ ...curtain, versusHouse: versus({ yearlySaving: null, paybackStatus: 'enter-price' }) }),
        unpriced({
          ...fewerHeaters,
          costAmount: null,
          versusHouse: versus({ yearlySaving: null, paybackStatus: 'enter-price' }),
        }),
      ]),
    );
    expect(row('Season fuel cost')).toEqual(['no price', 'no price', 'no price']);
    expect(row('Saving a year against the house')).toEqual(['—', 'no price', 'no price']);
    expect(row('Simple payback')).toEqual(['—', 'no price', 'no price']);
    expect(row('Installed cost')).toEqual(['—', '$2,500', 'not entered']);
  });

  it('writes the US reader’s units', () => {
    const { row } = rowsOf(compared([house, curtain]), 'us');
    // 40,000 W ÷ 0.29307107 W per Btu/h = 136,485.6 → 136,486 Btu/h
    expect(row('Design heat loss')[0]).toBe('136,486 Btu/h');
    // 12 m³/s ÷ 0.000471947443 = 25,426.6 → 25,427 cfm; 10 m³/s → 21,188.8 → 21,189 cfm
    expect(row('Exhaust air, summer')[0]).toBe('25,427 cfm required; 21,189 cfm installed (short)');
    expect(row('Season fuel')[0]).toBe('Propane: 4,669 US gal');
    // 15 °C = 59 °F, −20 °C = −4 °F
    expect(row('Heaters on the design night')[0]).toBe(
      'Holds the night setpoint (59.0 °F); the heaters hold it down to -4.0 °F outside',
    );
  });

  it('leaves out the exhaust row when no column has fans, and marks one without fans', () => {
    const noFans = (c: ReportAlternativeColumn): ReportAlternativeColumn => ({
      ...c,
      cooling: { capacity: { requiredFlowM3PerS: 12, installedFlowM3PerS: 0, verdict: 'no-fans' } } as never,
    });
    expect(rowsOf(compared([noFans(house), noFans(curtain)])).table.rows!.map((r) => r[0])).not.toContain(
      'Exhaust air, summer',
    );
    expect(rowsOf(compared([noFans(house), curtain])).row('Exhaust air, summer')[0]).toBe(
      '12.00 m³/s required; no fans',
    );
  });

  it('names why an alternative could not be computed, and leaves its numbers empty', () => {
    const invalid = column(3, {
      name: 'Taller walls',
      changedFields: ['eaveHeightM'],
      invalid: { field: 'ridgeHeightM', message: 'must be above the eave' },
      heating: null,
      cooling: null,
      season: null,
    });
    const { row } = rowsOf(compared([house, invalid]));
    expect(row('What it changes')[1]).toBe(
      'Not a valid house with the house as it was (ridge height: must be above the eave)',
    );
    expect(row('Design heat loss')[1]).toBe('—');
    expect(row('Simple payback')[1]).toBe('—');
  });

  it('says how many were compared of how many', () => {
    const { section } = rowsOf(compared([house, curtain, fewerHeaters], 6));
    expect(section.blocks[0]!.text).toMatch(
      /^The house had 6 saved alternatives; the 2 newest are compared, oldest of them first\. .*outside -20\.0 °C/,
    );
  });

  it('has one sentence for none, the reason when they could not be compared, and nothing for an old report', () => {
    expect(alternativesSection({ status: 'none' }, 'si', 'USD')).toEqual({
      heading: ALTERNATIVES_HEADING,
      blocks: [{ kind: 'paragraph', text: 'The house had no saved alternatives when this report was taken.' }],
    });
    const failed = alternativesSection(
      { status: 'not-available', savedCount: 1, reason: 'no summer design temperature' },
      'si',
      'USD',
    );
    expect(failed?.blocks[0]?.text).toBe(
      'The house had 1 saved alternative, but it could not be compared when this report was taken: no summer design temperature',
    );
    expect(alternativesSection(undefined, 'si', 'USD')).toBeNull();
  });

  it('adds to the safety list the cautions an alternative brings that the house does not', () => {
    const shared = 'Vent every fuel-fired heater.';
    const withCautions = compared([
      { ...house, heating: { ...house.heating!, cautions: [shared] } },
      { ...fewerHeaters, heating: { ...fewerHeaters.heating!, cautions: [shared, 'Only one unit: {{power:20000}}.'] } },
    ]);
    expect(alternativeCautions(withCautions, 'si')).toEqual(['If “One heater” is chosen: Only one unit: 20.0 kW.']);
    expect(alternativeCautions(undefined, 'si')).toEqual([]);
    expect(alternativeCautions({ status: 'none' }, 'si')).toEqual([]);
  });
});
