import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../../../test/render-with-providers';
import { TemperatureLogUpload } from './temperature-log-upload';

describe('TemperatureLogUpload', () => {
  it('states the size and row limits before a file is chosen, tied to the file input', () => {
    renderWithProviders(<TemperatureLogUpload farmId={1} />);
    const limits = screen.getByText(/at most 5 MB and 200,000 rows/);
    const input = screen.getByLabelText('CSV file of temperatures');
    expect(input.getAttribute('aria-describedby')).toBe(limits.id);
  });
});
