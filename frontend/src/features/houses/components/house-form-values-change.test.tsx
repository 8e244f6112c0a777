import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { HouseInput } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { houseFixture, referenceDataFixture } from '../../../test/fixtures';
import { houseInputOf } from '../house-form-values';
import { HouseForm } from './house-form';

function renderForm(onValuesChange: (input: HouseInput | null, state: { dirty: boolean }) => void) {
  return render(
    <UnitSystemProvider system="us">
      <HouseForm
        house={houseInputOf(houseFixture)}
        referenceData={referenceDataFixture}
        onSubmit={async () => {}}
        onValuesChange={onValuesChange}
      />
    </UnitSystemProvider>,
  );
}

describe('HouseForm onValuesChange', () => {
  it('reports the stored house, clean, at the start', async () => {
    const onValuesChange = vi.fn();
    renderForm(onValuesChange);
    await waitFor(() => expect(onValuesChange).toHaveBeenCalled());
    const [input, state] = onValuesChange.mock.calls[0]!;
    expect(state).toEqual({ dirty: false });
    expect(input).toEqual(houseInputOf(houseFixture));
  });

  it('reports an edited value converted to SI, dirty, before any save', async () => {
    const user = userEvent.setup();
    const onValuesChange = vi.fn();
    renderForm(onValuesChange);
    const night = screen.getByRole('textbox', { name: /Night heating/ });
    await user.clear(night);
    await user.type(night, '50');
    await waitFor(() => {
      const [input, state] = onValuesChange.mock.lastCall!;
      expect(state).toEqual({ dirty: true });
      // 50 °F = 10 °C (NIST SP 811 B.9)
      expect((input as HouseInput).setpoints.nightHeatingC).toBeCloseTo(10, 9);
      // untouched values stay exactly as stored
      expect((input as HouseInput).widthM).toBe(houseFixture.widthM);
    });
  });

  it('reports null while the values are invalid', async () => {
    const user = userEvent.setup();
    const onValuesChange = vi.fn();
    renderForm(onValuesChange);
    const width = screen.getByRole('textbox', { name: /Width of one span/ });
    await user.clear(width);
    await user.type(width, '3'); // below the 6.6 ft lower bound
    await waitFor(() => expect(onValuesChange.mock.lastCall).toEqual([null, { dirty: true }]));
  });
});
