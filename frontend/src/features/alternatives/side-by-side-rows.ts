import type { SideBySide, SideBySideColumn } from '../../api/types';
import type { Quantity, Units } from '../../lib/units';

/**
 * The side-by-side table as plain data: one row per quantity, one cell per column, each cell with
 * its text in the user's units and (for alternatives) its difference from the house. Shared by the
 * table, the CSV export and the tests.
 */
export type RowKind = { quantity: Quantity; difference: Quantity } | 'money' | 'fuel' | 'years' | 'text' | 'perHour';

export interface SideBySideCell {
  text: string;
  /** '+1.2 kW', '−5 %' … against the house; null for the house and where it does not apply */
  difference: string | null;
  /** the number behind the text in the user's units (for charts and CSV), null for words */
  value: number | null;
  /** a word to draw the eye: drips, short … */
  warning?: boolean;
}

export interface SideBySideRow {
  key: string;
  group: string;
  label: string;
  /** the unit the CSV names in its header */
  unit: string;
  cells: SideBySideCell[];
}

const VERDICT_WORDS: Record<string, string> = {
  adequate: 'enough',
  short: 'short',
  'none-installed': 'none installed',
  'no-fans': 'no fans',
};

function signed(text: string, value: number): string {
  if (value > 0) return `+${text}`;
  if (value < 0) return `−${text.replace(/^-/, '')}`;
  return text.replace(/^-/, '');
}

function numericRow(
  key: string,
  group: string,
  label: string,
  columns: SideBySideColumn[],
  pick: (column: SideBySideColumn) => number | null | undefined,
  units: Units,
  /** a quantity, or money in the farm's currency (ISO 4217) */
  kind: { quantity: Quantity; difference: Quantity } | { currency: string },
  extra?: (column: SideBySideColumn) => { suffix: string; warning: boolean } | null,
): SideBySideRow {
  const currency = 'currency' in kind ? kind.currency : '';
  const format = (q: Quantity | 'money', v: number) =>
    q === 'money' ? units.money(v, currency, 0) : units.format(q, v);
  const display = (q: Quantity | 'money', v: number) => (q === 'money' ? v : units.toDisplay(q, v));
  const quantity = 'currency' in kind ? 'money' : kind.quantity;
  const differenceQuantity = 'currency' in kind ? 'money' : kind.difference;
  const house = columns[0] ? pick(columns[0]) : null;
  return {
    key,
    group,
    label,
    unit: 'currency' in kind ? 'money' : units.label(kind.quantity),
    cells: columns.map((column, index) => {
      const value = column.invalid ? null : pick(column);
      if (value === null || value === undefined) return { text: '—', difference: null, value: null };
      const more = extra?.(column) ?? null;
      const text = format(quantity, value) + (more ? ` · ${more.suffix}` : '');
      const delta = index > 0 && house !== null && house !== undefined ? value - house : null;
      return {
        text,
        value: display(quantity, value),
        warning: more?.warning,
        difference: delta === null ? null : signed(format(differenceQuantity, Math.abs(delta)), delta),
      };
    }),
  };
}

function textRow(
  key: string,
  group: string,
  label: string,
  columns: SideBySideColumn[],
  pick: (column: SideBySideColumn) => { text: string; warning?: boolean } | null,
): SideBySideRow {
  return {
    key,
    group,
    label,
    unit: '',
    cells: columns.map((column) => {
      const picked = column.invalid ? null : pick(column);
      return picked ? { ...picked, difference: null, value: null } : { text: '—', difference: null, value: null };
    }),
  };
}

export function sideBySideRows(data: SideBySide, units: Units): SideBySideRow[] {
  const columns = data.columns;
  const rows: SideBySideRow[] = [];
  const power = { quantity: 'power', difference: 'power' } as const;
  const temperature = { quantity: 'temperature', difference: 'temperatureDifference' } as const;
  const money = { currency: data.seasonInputsUsed.currency };
  // lamps bring their electricity and summer heat into the comparison
  const anyLamps = columns.some((column) => Boolean(column.season?.lamps));

  rows.push(
    numericRow('cost', 'Cost', 'Installed cost', columns, (c) => (c.alternativeId ? c.costAmount : null), units, money),
  );

  // design night
  rows.push(
    numericRow('loss', 'Design night', 'Design heat loss', columns, (c) => c.heating?.heatLoss.totalW, units, power),
  );
  const componentKeys = columns[0]?.heating?.heatLoss.components.map((part) => part.key) ?? [];
  for (const partKey of componentKeys) {
    const label = columns[0].heating!.heatLoss.components.find((part) => part.key === partKey)!.label;
    rows.push(
      numericRow(
        `loss-${partKey}`,
        'Design night',
        `  ${label}`,
        columns,
        (c) => c.heating?.heatLoss.components.find((part) => part.key === partKey)?.watts,
        units,
        power,
      ),
    );
  }
  rows.push(
    numericRow(
      'required',
      'Heaters',
      'Required heater output',
      columns,
      (c) => c.heating?.heater.requiredOutputW,
      units,
      power,
    ),
    numericRow(
      'installed',
      'Heaters',
      'Installed heater output',
      columns,
      (c) => c.heating?.heater.installedOutputW,
      units,
      power,
    ),
    textRow('verdict', 'Heaters', 'Heaters on the design night', columns, (c) =>
      c.heating
        ? {
            text: VERDICT_WORDS[c.heating.heater.verdict] ?? c.heating.heater.verdict,
            warning: c.heating.heater.verdict !== 'adequate',
          }
        : null,
    ),
    numericRow(
      'held',
      'Heaters',
      'Lowest outdoor temperature held',
      columns,
      (c) => c.heating?.heater.lowestHeldOutdoorC,
      units,
      temperature,
    ),
    numericRow(
      'dew',
      'Drips',
      'Dew point inside',
      columns,
      (c) => c.heating?.condensation.dewPointC,
      units,
      temperature,
    ),
  );
  for (const group of ['roof', 'sidewalls', 'endwalls']) {
    const label = group.charAt(0).toUpperCase() + group.slice(1);
    rows.push(
      numericRow(
        `surface-${group}`,
        'Drips',
        `${label}: inside surface`,
        columns,
        (c) => c.heating?.condensation.surfaces.find((s) => s.group === group)?.insideSurfaceC,
        units,
        temperature,
        (c) => {
          const surface = c.heating?.condensation.surfaces.find((s) => s.group === group);
          return surface ? { suffix: surface.condenses ? 'drips' : 'dry', warning: surface.condenses } : null;
        },
      ),
    );
  }

  // summer
  rows.push(
    {
      key: 'ach',
      group: 'Summer',
      label: 'Air changes by the fans',
      unit: 'per hour',
      cells: columns.map((c, i) => {
        const v = c.invalid ? null : c.cooling?.airExchange.airChangesPerHour;
        const house = columns[0].cooling?.airExchange.airChangesPerHour;
        if (v === null || v === undefined) return { text: '—', difference: null, value: null };
        const d = i > 0 && house !== undefined ? v - house : null;
        return {
          text: `${v.toFixed(1)} /h`,
          value: v,
          difference: d === null ? null : signed(`${Math.abs(d).toFixed(1)} /h`, d),
        };
      }),
    },
    ...(anyLamps
      ? [
          numericRow(
            'fan-flow',
            'Summer',
            'Required fan flow (lamps included)',
            columns,
            (c) => c.cooling?.capacity.requiredFlowM3PerS,
            units,
            { quantity: 'airFlow', difference: 'airFlow' },
          ),
        ]
      : []),
    textRow('cooling', 'Summer', 'Fans for summer cooling', columns, (c) =>
      c.cooling
        ? {
            text: VERDICT_WORDS[c.cooling.capacity.verdict] ?? c.cooling.capacity.verdict,
            warning: c.cooling.capacity.verdict !== 'adequate',
          }
        : null,
    ),
  );

  // season
  rows.push(
    numericRow('season-heat', 'Season', 'Season heat', columns, (c) => c.season?.total.energyKWh, units, {
      quantity: 'energyKWh',
      difference: 'energyKWh',
    }),
    {
      key: 'fuel',
      group: 'Season',
      label: 'Fuel',
      unit: 'fuel',
      cells: columns.map((c, i) => {
        if (c.invalid || !c.season) return { text: '—', difference: null, value: null };
        const houseSeason = columns[0].season;
        const text = units.fuel(c.season.total, c.season.fuel);
        const sameFuel = houseSeason && houseSeason.fuel.fuelId === c.season.fuel.fuelId;
        const d = i > 0 && sameFuel ? units.fuelValue(c.season.total) - units.fuelValue(houseSeason.total) : null;
        return {
          text,
          value: units.fuelValue(c.season.total),
          difference:
            d === null
              ? null
              : signed(units.fuel({ fuelQuantitySi: Math.abs(d), fuelQuantityUs: Math.abs(d) }, c.season.fuel), d),
        };
      }),
    },
    numericRow('season-cost', 'Season', 'Season fuel cost', columns, (c) => c.season?.total.cost, units, money),
    ...(anyLamps
      ? [
          numericRow(
            'lamp-electricity',
            'Season',
            'Lamp electricity (not in the fuel cost)',
            columns,
            (c) => (c.season ? (c.season.lamps?.electricityKWh ?? 0) : null),
            units,
            { quantity: 'energyKWh', difference: 'energyKWh' },
          ),
        ]
      : []),
    numericRow('saving', 'Season', 'Yearly saving', columns, (c) => c.versusHouse?.yearlySaving, units, money),
    textRow('payback', 'Season', 'Simple payback', columns, (c) => {
      const versus = c.versusHouse;
      if (!versus) return null;
      switch (versus.paybackStatus) {
        case 'years':
          return { text: `${(versus.paybackYears ?? 0).toFixed(1)} years` };
        case 'immediate':
          return { text: 'at once (no cost)' };
        case 'enter-cost':
          return { text: 'enter a cost' };
        case 'enter-price':
          return { text: 'enter the fuel price' };
        default:
          return { text: 'never (no saving)', warning: true };
      }
    }),
  );

  // light
  for (const group of ['roof', 'sidewalls', 'endwalls'] as const) {
    const label = group.charAt(0).toUpperCase() + group.slice(1);
    rows.push({
      key: `light-${group}`,
      group: 'Light to the crop',
      label: `${label}: light through`,
      unit: '%',
      cells: columns.map((c, i) => {
        const light = c.invalid ? null : c.light?.find((l) => l.group === group);
        if (!light) return { text: '—', difference: null, value: null };
        const change = light.changeFromHouse;
        return {
          text: `${units.format('fraction', light.lightTransmittance)} (${light.coveringLabel})`,
          value: light.lightTransmittance * 100,
          warning: i > 0 && change < -0.005,
          difference: i === 0 ? null : signed(`${Math.abs(change * 100).toFixed(0)} % light`, Math.round(change * 100)),
        };
      }),
    });
  }
  return rows;
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The table as CSV: a row per quantity, the column names in the header, units in the text. */
export function sideBySideCsv(data: SideBySide, rows: SideBySideRow[]): string {
  const header = [
    'Quantity',
    ...data.columns.flatMap((c, i) => (i === 0 ? [c.name] : [c.name, `${c.name}: vs house`])),
  ];
  const lines = [header.map(csvField).join(',')];
  for (const row of rows) {
    const cells = row.cells.flatMap((cell, i) => (i === 0 ? [cell.text] : [cell.text, cell.difference ?? '']));
    lines.push([`${row.group}: ${row.label.trim()}`, ...cells].map(csvField).join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Season cost and heat loss by part, per column, for the two charts (numbers in the user's units). */
export function sideBySideChartData(data: SideBySide, units: Units) {
  const computed = data.columns.filter((c) => !c.invalid && c.season && c.heating);
  const labels = computed.map((c) => c.name);
  const partKeys = computed[0]?.heating?.heatLoss.components.map((p) => ({ key: p.key, label: p.label })) ?? [];
  return {
    labels,
    seasonCost: computed.map((c) => c.season!.total.cost),
    heatLossParts: partKeys.map((part) => ({
      label: part.label,
      values: computed.map((c) =>
        units.toDisplay('power', c.heating!.heatLoss.components.find((p) => p.key === part.key)?.watts ?? 0),
      ),
    })),
    powerUnit: units.label('power'),
  };
}
