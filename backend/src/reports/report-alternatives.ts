import { alternativeChangesSentence, changedFieldWords } from '@thermbay/engine/vocabulary';
import { formatMoney } from '../common/money';
import type { ReportBlock, ReportSection } from './report-document';
import type { ReportAlternativeColumn, ReportAlternatives } from './report-snapshot';
import { format, formatNumber, prose, type UnitSystem } from './report-units';

/**
 * The "Alternatives compared" section of a report: the house as it was and its saved alternatives
 * as the side-by-side computed them when the report was taken, one column each, in the reader's
 * units and the farm's currency. Reports saved before reports compared alternatives have no
 * `alternatives` in their snapshot and no such section.
 */
export const ALTERNATIVES_HEADING = 'Alternatives compared';

const EMPTY = '—';

function changesCell(column: ReportAlternativeColumn, index: number): string {
  if (index === 0) return 'Nothing: the house as it is';
  if (column.invalid) {
    return `Not a valid house with the house as it was (${changedFieldWords(column.invalid.field)}: ${column.invalid.message})`;
  }
  return alternativeChangesSentence(column.changedFields, column.ownCalendar);
}

function heaterCell(column: ReportAlternativeColumn, system: UnitSystem): string {
  if (!column.heating) return EMPTY;
  const { heater, heatLoss } = column.heating;
  const setpoint = `the night setpoint (${format('temperature', heatLoss.insideC, system)})`;
  const downTo =
    heater.lowestHeldOutdoorC === null
      ? ''
      : `; the heaters hold it down to ${format('temperature', heater.lowestHeldOutdoorC, system)} outside`;
  switch (heater.verdict) {
    case 'adequate':
      return `Holds ${setpoint}${downTo}`;
    case 'short':
      return `Does not hold ${setpoint}: ${format('power', heater.shortfallW, system)} short${downTo}`;
    default:
      return `No heaters entered: does not hold ${setpoint}`;
  }
}

function exhaustCell(column: ReportAlternativeColumn, system: UnitSystem): string {
  if (!column.cooling) return EMPTY;
  const { capacity } = column.cooling;
  const required = format('airFlow', capacity.requiredFlowM3PerS, system);
  if (capacity.verdict === 'no-fans') return `${required} required; no fans`;
  const installed = format('airFlow', capacity.installedFlowM3PerS, system);
  return `${required} required; ${installed} installed${capacity.verdict === 'short' ? ' (short)' : ''}`;
}

function fuelCell(column: ReportAlternativeColumn, system: UnitSystem): string {
  if (!column.season) return EMPTY;
  const { fuel, total } = column.season;
  const quantity = system === 'si' ? total.fuelQuantitySi : total.fuelQuantityUs;
  return `${fuel.label}: ${formatNumber(quantity, 0)} ${system === 'si' ? fuel.unitSi : fuel.unitUs}`;
}

function costCell(column: ReportAlternativeColumn, currency: string): string {
  if (!column.season) return EMPTY;
  return column.season.total.cost === null ? 'no price' : formatMoney(column.season.total.cost, currency, 0);
}

function savingCell(column: ReportAlternativeColumn, currency: string): string {
  const versus = column.versusHouse;
  if (!versus) return EMPTY;
  if (versus.yearlySaving === null) return 'no price';
  if (versus.yearlySaving < 0) return `costs ${formatMoney(-versus.yearlySaving, currency, 0)} more`;
  return formatMoney(versus.yearlySaving, currency, 0);
}

function paybackCell(column: ReportAlternativeColumn): string {
  const versus = column.versusHouse;
  if (!versus) return EMPTY;
  switch (versus.paybackStatus) {
    case 'years':
      return `${formatNumber(versus.paybackYears ?? 0, 1)} years`;
    case 'immediate':
      return 'at once (no installed cost)';
    case 'enter-cost':
      return 'no cost entered';
    case 'enter-price':
      return 'no price';
    default:
      return 'never (it saves nothing)';
  }
}

function installedCostCell(column: ReportAlternativeColumn, index: number, currency: string): string {
  if (index === 0) return EMPTY;
  return column.costAmount === null ? 'not entered' : formatMoney(column.costAmount, currency, 0);
}

/** The section, or null for a report saved before reports compared alternatives. */
export function alternativesSection(
  alternatives: ReportAlternatives | undefined,
  system: UnitSystem,
  currency: string,
): ReportSection | null {
  if (!alternatives) return null;
  if (alternatives.status === 'none') {
    return {
      heading: ALTERNATIVES_HEADING,
      blocks: [{ kind: 'paragraph', text: 'The house had no saved alternatives when this report was taken.' }],
    };
  }
  if (alternatives.status === 'not-available') {
    return {
      heading: ALTERNATIVES_HEADING,
      blocks: [
        {
          kind: 'paragraph',
          text: `The house had ${alternatives.savedCount} saved alternative${alternatives.savedCount === 1 ? '' : 's'}, but ${alternatives.savedCount === 1 ? 'it' : 'they'} could not be compared when this report was taken: ${prose(alternatives.reason, system)}`,
        },
      ],
    };
  }

  const { columns, savedCount, heatingConditionsUsed, seasonInputsUsed } = alternatives;
  const compared = columns.length - 1;
  const cells = (pick: (column: ReportAlternativeColumn, index: number) => string) =>
    columns.map((column, index) => (index > 0 && column.invalid ? EMPTY : pick(column, index)));
  const rows: string[][] = [
    ['What it changes', ...columns.map(changesCell)],
    ['Installed cost', ...cells((column, index) => installedCostCell(column, index, currency))],
    ['Design heat loss', ...cells((column) => format('power', column.heating?.heatLoss.totalW, system))],
    [
      'Heater output required / installed',
      ...cells((column) =>
        column.heating
          ? `${format('power', column.heating.heater.requiredOutputW, system)} / ${format('power', column.heating.heater.installedOutputW, system)}`
          : EMPTY,
      ),
    ],
    ['Heaters on the design night', ...cells((column) => heaterCell(column, system))],
  ];
  const anyFans = columns.some((column) => (column.cooling?.capacity.installedFlowM3PerS ?? 0) > 0);
  if (anyFans) rows.push(['Exhaust air, summer', ...cells((column) => exhaustCell(column, system))]);
  rows.push(
    ['Season fuel', ...cells((column) => fuelCell(column, system))],
    ['Season fuel cost', ...cells((column) => costCell(column, currency))],
    ['Saving a year against the house', ...cells((column) => savingCell(column, currency))],
    ['Simple payback', ...cells(paybackCell)],
  );

  const which =
    savedCount > compared
      ? `The house had ${savedCount} saved alternatives; the ${compared} newest are compared, oldest of them first.`
      : `The house had ${savedCount} saved alternative${savedCount === 1 ? '' : 's'}, compared here oldest first.`;
  const blocks: ReportBlock[] = [
    {
      kind: 'paragraph',
      text:
        `${which} Each column went through the same design night (outside ${format('temperature', heatingConditionsUsed.designOutdoorC, system)}, ` +
        `inside at its own night setpoint), the same summer design day and the same heating season ` +
        `(${seasonInputsUsed.startDate} to ${seasonInputsUsed.endDate}) with the farm's fuel prices, as the side-by-side compares them.`,
    },
    {
      kind: 'table',
      comparison: true,
      columns: ['', `${columns[0]!.name} as it is`, ...columns.slice(1).map((c) => c.name)],
      rows,
    },
    {
      kind: 'paragraph',
      text:
        "Saving a year: the house's season fuel cost less the alternative's. Simple payback: the alternative's installed cost " +
        'divided by that saving, without interest, price changes or upkeep. "No price": the farm had no price for the fuel. ' +
        'Planning figures to compare options, not quotes; a change of heaters or fans goes to licensed installers under local codes.',
    },
  ];
  return { heading: ALTERNATIVES_HEADING, blocks };
}

/**
 * Cautions an alternative carries that the house as it was does not (a heater it adds, say), each
 * naming the alternative, for the report's safety list.
 */
export function alternativeCautions(alternatives: ReportAlternatives | undefined, system: UnitSystem): string[] {
  if (alternatives?.status !== 'compared') return [];
  const [house, ...others] = alternatives.columns;
  const own = new Set([...(house?.heating?.cautions ?? []), ...(house?.season?.cautions ?? [])]);
  return others.flatMap((column) =>
    [...new Set([...(column.heating?.cautions ?? []), ...(column.season?.cautions ?? [])])]
      .filter((caution) => !own.has(caution))
      .map((caution) => `If “${column.name}” is chosen: ${prose(caution, system)}`),
  );
}
