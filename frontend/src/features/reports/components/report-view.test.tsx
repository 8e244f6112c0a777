import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { ReportDocument, ReportSection } from '../../../api/types';
import { renderWithProviders } from '../../../test/render-with-providers';
import { ReportView } from './report-view';

/** A section as the server writes it for a house and two alternatives (SI reader, USD farm). */
const alternativesSection: ReportSection = {
  heading: 'Alternatives compared',
  blocks: [
    {
      kind: 'paragraph',
      text: 'The house had 2 saved alternatives, compared here oldest first.',
    },
    {
      kind: 'table',
      comparison: true,
      columns: ['', 'North house as it is', 'Energy curtain', 'One heater only'],
      rows: [
        ['What it changes', 'Nothing: the house as it is', 'Changes curtain', 'Changes heaters'],
        ['Installed cost', '—', '$6,000', 'not entered'],
        ['Design heat loss', '102.5 kW', '102.5 kW', '102.5 kW'],
        [
          'Heaters on the design night',
          'Holds the night setpoint (15.0 °C)',
          'Holds the night setpoint (15.0 °C)',
          'Does not hold the night setpoint (15.0 °C): 77.8 kW short',
        ],
        ['Season fuel cost', '$14,957', '$11,861', 'no price'],
        ['Saving a year against the house', '—', '$3,096', 'no price'],
        ['Simple payback', '—', '1.9 years', 'no cost entered'],
      ],
    },
  ],
};

const otherSections: ReportSection[] = [
  {
    heading: 'Heat loss on the design night',
    blocks: [
      {
        kind: 'table',
        columns: ['Part', 'Heat loss (kW)'],
        rows: [
          ['Roof', '51.6'],
          ['Sidewalls', '26.2'],
        ],
      },
    ],
  },
  { heading: 'Safety', blocks: [{ kind: 'list', items: ['Carbon monoxide: fit alarms.'] }] },
];

function documentWith(sections: ReportSection[]): ReportDocument {
  return {
    unitSystem: 'si',
    pageSize: 'A4',
    farmName: 'Test farm',
    houseName: 'North house',
    title: 'Heater sizing',
    subtitle: 'North house · draft revision 1',
    sections,
    footer: 'Planning estimates.',
  };
}

describe('ReportView: the alternatives compared', () => {
  it('draws the comparison as one table: a column per house and alternative, a named row per quantity', () => {
    renderWithProviders(<ReportView document={documentWith([otherSections[0]!, alternativesSection])} />);
    const section = screen.getByRole('region', { name: 'Alternatives compared' });
    const table = within(section).getByRole('table');
    expect(
      within(table)
        .getAllByRole('columnheader')
        .map((th) => th.textContent),
    ).toEqual(['', 'North house as it is', 'Energy curtain', 'One heater only']);
    expect(
      within(table)
        .getAllByRole('rowheader')
        .map((th) => th.textContent),
    ).toEqual([
      'What it changes',
      'Installed cost',
      'Design heat loss',
      'Heaters on the design night',
      'Season fuel cost',
      'Saving a year against the house',
      'Simple payback',
    ]);
    const payback = within(table).getByRole('rowheader', { name: 'Simple payback' }).closest('tr')!;
    expect(
      within(payback)
        .getAllByRole('cell')
        .map((td) => td.textContent),
    ).toEqual(['—', '1.9 years', 'no cost entered']);
    const cost = within(table).getByRole('rowheader', { name: 'Season fuel cost' }).closest('tr')!;
    expect(
      within(cost)
        .getAllByRole('cell')
        .map((td) => td.textContent),
    ).toEqual(['$14,957', '$11,861', 'no price']);
    expect(within(section).getByText(/compared here oldest first/)).toBeTruthy();
  });

  it('fixes the comparison to the page width: row names 18 %, the three columns share the other 82 % equally', () => {
    renderWithProviders(<ReportView document={documentWith([alternativesSection])} />);
    const table = within(screen.getByRole('region', { name: 'Alternatives compared' })).getByRole('table');
    expect(getComputedStyle(table).tableLayout).toBe('fixed');
    expect(getComputedStyle(table).width).toBe('100%');
    const widths = [...table.querySelectorAll('col')].map((col) => col.style.width);
    // (100 − 18) ÷ 3 = 27.333… %
    expect(widths.map((w) => Number.parseFloat(w))).toEqual([18, 82 / 3, 82 / 3, 82 / 3]);
  });

  it('renders a report saved before reports compared alternatives: every other section, no comparison', () => {
    renderWithProviders(<ReportView document={documentWith(otherSections)} />);
    expect(screen.queryByRole('region', { name: 'Alternatives compared' })).toBeNull();
    const heatLoss = screen.getByRole('region', { name: 'Heat loss on the design night' });
    const table = within(heatLoss).getByRole('table');
    // a plain table keeps its columns as wide as their text
    expect(table.querySelector('colgroup')).toBeNull();
    expect(within(table).queryAllByRole('rowheader')).toEqual([]);
    expect(
      within(table)
        .getAllByRole('cell')
        .map((td) => td.textContent),
    ).toEqual(['Roof', '51.6', 'Sidewalls', '26.2']);
    expect(screen.getByRole('region', { name: 'Safety' })).toBeTruthy();
  });

  it('says in one sentence that the house had no alternatives', () => {
    const none: ReportSection = {
      heading: 'Alternatives compared',
      blocks: [{ kind: 'paragraph', text: 'The house had no saved alternatives when this report was taken.' }],
    };
    renderWithProviders(<ReportView document={documentWith([none])} />);
    const section = screen.getByRole('region', { name: 'Alternatives compared' });
    expect(within(section).queryByRole('table')).toBeNull();
    expect(section.textContent).toContain('The house had no saved alternatives when this report was taken.');
  });
});
