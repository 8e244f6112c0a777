import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { TemperatureColumnMapping, TemperatureCsvInspection } from '../../../api/types';
import { ColumnMappingForm } from './column-mapping-form';

const inspection: TemperatureCsvInspection = {
  delimiter: ',',
  hasHeader: true,
  headers: ['Date', 'Hour', 'Air'],
  sampleRows: [
    ['10/01/2026', '00:00', '41.2'],
    ['10/01/2026', '01:00', '40.8'],
  ],
  dataRowCount: 48,
  proposal: {
    timestampColumn: null,
    dateColumn: 'Date',
    timeColumn: 'Hour',
    temperatureColumn: 'Air',
    minColumn: null,
    maxColumn: null,
    unit: 'C',
    unitReason: 'the values fit either unit; °C assumed',
    resolution: 'hourly',
    dateOrder: 'MDY',
    dateOrderAmbiguous: true,
    decimalComma: false,
  },
  notes: ['2 rows have no temperature and will be skipped'],
};

describe('ColumnMappingForm', () => {
  it('shows the detected columns and sample, and confirms the mapping the user adjusted', async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn((_name: string, _mapping: TemperatureColumnMapping) => {});
    render(
      <ColumnMappingForm inspection={inspection} fileName="station.csv" onConfirm={onConfirm} onCancel={() => {}} />,
    );

    const sample = screen.getByRole('table', { name: 'First rows of the file' });
    expect(within(sample).getByText('41.2')).toBeTruthy();
    expect(within(sample).getByText('temperature (°C)')).toBeTruthy();
    expect(screen.getByText(/fit both day-first and month-first/)).toBeTruthy();
    expect(screen.getByText('2 rows have no temperature and will be skipped')).toBeTruthy();

    // The numbers are Fahrenheit: the user corrects the guessed unit.
    await user.click(screen.getByRole('radio', { name: '°F' }));
    expect(within(sample).getByText('temperature (°F)')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Upload log' }));

    await waitFor(() => expect(onConfirm).toHaveBeenCalledTimes(1));
    const [name, mapping] = onConfirm.mock.calls[0]!;
    expect(name).toBe('station');
    expect(mapping).toMatchObject({
      timestampColumn: null,
      dateColumn: 'Date',
      timeColumn: 'Hour',
      temperatureColumn: 'Air',
      unit: 'F',
      dateOrder: 'MDY',
      resolution: 'hourly',
    });
  });

  it('does not confirm without a name', async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn();
    render(
      <ColumnMappingForm inspection={inspection} fileName="station.csv" onConfirm={onConfirm} onCancel={() => {}} />,
    );
    await user.clear(screen.getByRole('textbox', { name: /Name of the log/ }));
    await user.click(screen.getByRole('button', { name: 'Upload log' }));
    expect(await screen.findByText('Name the log')).toBeTruthy();
    expect(onConfirm).not.toHaveBeenCalled();
  });
});
