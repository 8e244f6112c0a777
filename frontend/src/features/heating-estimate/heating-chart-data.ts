import type { HeatLossComponent } from '../../api/types';
import type { Quantity, Units } from '../../lib/units';

export const COMPONENT_LABELS: Record<HeatLossComponent['key'], string> = {
  roof: 'Roof',
  sidewalls: 'Sidewalls',
  endwalls: 'Endwalls',
  kneewall: 'Kneewall',
  perimeter: 'Perimeter',
  infiltration: 'Air leakage',
  sky: 'Clear night sky',
};

const QUANTITY_OF: Record<HeatLossComponent['quantityUnit'], Quantity> = { m2: 'area', m: 'length', m3: 'volume' };

export interface HeatLossRow {
  key: HeatLossComponent['key'];
  label: string;
  /** what the API says the part is made of, e.g. the covering's name */
  detail: string | null;
  quantity: string;
  coefficient: string;
  loss: string;
  share: string;
}

/** "Roof (Single polyethylene film)" → "Single polyethylene film". */
function detailOf(apiLabel: string): string | null {
  const open = apiLabel.indexOf('(');
  const close = apiLabel.lastIndexOf(')');
  return open >= 0 && close > open ? apiLabel.slice(open + 1, close) : null;
}

function coefficientOf(component: HeatLossComponent, units: Units): string {
  if (component.key === 'infiltration') return `${component.coefficient} ACH`;
  if (component.key === 'perimeter') return `F ${units.format('perimeterFactor', component.coefficient)}`;
  // radiation to the sky is per m² of floor, not per kelvin
  if (component.key === 'sky') return `${units.format('irradiance', component.coefficient)} of floor`;
  return `U ${units.format('uValue', component.coefficient)}`;
}

/** The breakdown table's rows, every number in the user's units. */
export function heatLossRows(components: HeatLossComponent[], units: Units): HeatLossRow[] {
  return components.map((component) => ({
    key: component.key,
    label: COMPONENT_LABELS[component.key],
    detail: component.key === 'infiltration' ? null : detailOf(component.label),
    quantity: units.format(QUANTITY_OF[component.quantityUnit], component.quantity, { decimals: 0 }),
    coefficient: coefficientOf(component, units),
    loss: units.format('power', component.watts),
    share: `${Math.round(component.share * 100)} %`,
  }));
}

export interface HeatLossChartData {
  labels: string[];
  datasets: Array<{ label: string; data: number[]; backgroundColor: string[]; borderWidth: number }>;
}

/**
 * Horizontal bar data: one bar per part of the loss, in the user's power unit (rounded as shown),
 * largest first so the eye lands on what matters. Colours come from the theme via `colors`.
 */
export function heatLossChartData(
  components: HeatLossComponent[],
  units: Units,
  colors: { covering: string; ground: string; air: string },
): HeatLossChartData {
  const sorted = [...components].sort((a, b) => b.watts - a.watts);
  const decimals = units.decimals('power');
  const factor = 10 ** decimals;
  return {
    labels: sorted.map((component) => COMPONENT_LABELS[component.key]),
    datasets: [
      {
        label: `Heat loss (${units.label('power')})`,
        data: sorted.map((component) => Math.round(units.toDisplay('power', component.watts) * factor) / factor),
        backgroundColor: sorted.map((component) =>
          component.key === 'infiltration'
            ? colors.air
            : component.key === 'perimeter'
              ? colors.ground
              : colors.covering,
        ),
        borderWidth: 0,
      },
    ],
  };
}
