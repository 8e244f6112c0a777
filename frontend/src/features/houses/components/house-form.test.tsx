import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { HouseInput } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { houseFixture, referenceDataFixture } from '../../../test/fixtures';
import { houseInputOf } from '../house-form-values';
import { HouseForm } from './house-form';

function renderForm(onSubmit: (input: HouseInput) => Promise<void>, system: 'si' | 'us' = 'us') {
  return render(
    <UnitSystemProvider system={system}>
      <HouseForm house={houseInputOf(houseFixture)} referenceData={referenceDataFixture} onSubmit={onSubmit} />
    </UnitSystemProvider>,
  );
}

describe('HouseForm', () => {
  it('shows the width in feet for a US user and flags an out-of-bounds width on the field itself', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async () => {});
    renderForm(onSubmit);

    const width = screen.getByRole('textbox', { name: /width of one span/i });
    expect((width as HTMLInputElement).value).toBe('30');

    await user.clear(width);
    await user.type(width, '3');
    await user.tab();

    // 2 m (the shared lower bound) is 6.56 ft; the form offers the range in feet.
    const message = await screen.findByText('Width must be between 6.6 and 65.6 ft');
    expect(width.getAttribute('aria-invalid')).toBe('true');
    expect(width.getAttribute('aria-describedby')).toContain(message.id);

    await user.click(screen.getByRole('button', { name: 'Save house' }));
    // Formik validates asynchronously; a valid width submitted next is the only call, so the
    // refused attempt sent nothing (had it, its call would have come first)
    await user.clear(width);
    await user.type(width, '40');
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit).toHaveBeenCalledTimes(1);
    expect((onSubmit.mock.calls[0] as unknown as [HouseInput])[0].widthM).toBeCloseTo(12.192, 10);
  });

  it('converts a width typed in feet to metres on submit and keeps untouched values exact', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit);

    const width = screen.getByRole('textbox', { name: /width of one span/i });
    await user.clear(width);
    await user.type(width, '40');
    await user.click(screen.getByRole('button', { name: 'Save house' }));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = onSubmit.mock.calls[0]![0];
    // 40 ft × 0.3048 m/ft (exact) = 12.192 m
    expect(input.widthM).toBeCloseTo(12.192, 10);
    // untouched fields go back as stored, not as a rounded round trip through feet
    expect(input.lengthM).toBe(houseFixture.lengthM);
    expect(input.heaters[0]!.ratedInputW).toBe(houseFixture.heaters[0]!.ratedInputW);
    expect(input.setpoints.nightHeatingC).toBe(15.5);
  });

  it('shows a server error naming a field under that field', async () => {
    const user = userEvent.setup();
    const { ApiError } = await import('../../../api/client');
    const onSubmit = vi.fn(async () => {
      throw new ApiError(422, 'house.ridgeHeightM must be between 1.5 and 15', 'house.ridgeHeightM');
    });
    renderForm(onSubmit, 'si');

    await user.click(screen.getByRole('button', { name: 'Save house' }));

    const ridge = screen.getByRole('textbox', { name: /ridge height/i });
    await waitFor(() => expect(ridge.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getAllByText('house.ridgeHeightM must be between 1.5 and 15').length).toBeGreaterThan(0);
  });

  it('keeps an unsaved edit when the user switches units, re-expressed in the new unit', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    const form = (system: 'si' | 'us') => (
      <UnitSystemProvider system={system}>
        <HouseForm house={houseInputOf(houseFixture)} referenceData={referenceDataFixture} onSubmit={onSubmit} />
      </UnitSystemProvider>
    );
    const { rerender } = render(form('si'));

    const width = screen.getByRole('textbox', { name: /width of one span/i });
    await user.clear(width);
    await user.type(width, '10');
    rerender(form('us'));

    // 10 m ÷ 0.3048 m/ft = 32.808 ft, shown to one more decimal than usual; untouched length is 96 ft
    await waitFor(() =>
      expect((screen.getByRole('textbox', { name: /width of one span/i }) as HTMLInputElement).value).toBe('32.81'),
    );
    expect((screen.getByRole('textbox', { name: /^length/i }) as HTMLInputElement).value).toBe('96');

    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    const input = onSubmit.mock.calls[0]![0];
    expect(input.widthM).toBeCloseTo(32.81 * 0.3048, 10);
    expect(input.lengthM).toBe(houseFixture.lengthM);
  });
});
