import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { HouseInput } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { houseFixture, referenceDataFixture } from '../../../test/fixtures';
import { houseInputOf } from '../house-form-values';
import { HouseForm } from './house-form';

const LAMPS = {
  lampTypeId: 'led-horticultural',
  powerDensityWPerM2: 45,
  hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 12],
  heatToHouseFraction: 0.95,
};

function renderForm(
  onSubmit: (input: HouseInput) => Promise<void>,
  system: 'si' | 'us',
  lamps: HouseInput['lamps'] = null,
) {
  return render(
    <UnitSystemProvider system={system}>
      <HouseForm
        house={{ ...houseInputOf(houseFixture), lamps }}
        referenceData={referenceDataFixture}
        onSubmit={onSubmit}
      />
    </UnitSystemProvider>,
  );
}

const lampsGroup = () => screen.getByRole('group', { name: 'Supplemental lamps' });
const monthField = (month: string) =>
  within(lampsGroup()).getByRole('textbox', { name: new RegExp(`^${month}`) }) as HTMLInputElement;

describe('HouseForm: supplemental lamps', () => {
  it('adds lamps starting from the reference tables: LED power and heat share, the starting schedule', async () => {
    const user = userEvent.setup();
    renderForm(
      vi.fn(async () => {}),
      'si',
    );

    expect(screen.getByText('No supplemental lamps.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Add lamps' }));
    const power = within(lampsGroup()).getByRole('textbox', { name: /lamp power per floor area/i }) as HTMLInputElement;
    expect(power.value).toBe('45');
    expect((within(lampsGroup()).getByRole('textbox', { name: /heat share/i }) as HTMLInputElement).value).toBe('95');
    expect(monthField('Jan').value).toBe('12');
    expect(monthField('Jul').value).toBe('0');
  });

  it('sends an edited month with the other lamp values in SI', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit, 'si', LAMPS);

    await user.clear(monthField('Dec'));
    await user.paste('14');
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0].lamps).toEqual({
      ...LAMPS,
      hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 14],
    });
  });

  it('refuses hours over 24 on the month itself, and sends nothing', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit, 'si', LAMPS);

    // pasted in one go: each keystroke would validate the whole form again
    await user.clear(monthField('Jan'));
    await user.paste('25');
    await user.click(screen.getByRole('button', { name: 'Save house' }));

    // the same bounds as the API (vocabulary bounds.ts): 0–24 h
    expect(await screen.findByText('Lamp hours must be between 0 and 24 h')).toBeTruthy();
    expect(monthField('Jan').getAttribute('aria-invalid')).toBe('true');
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('refuses a lamp power over the bound, in the unit shown', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit, 'si', LAMPS);

    const power = within(lampsGroup()).getByRole('textbox', { name: /lamp power per floor area/i });
    await user.clear(power);
    await user.paste('500');
    await user.click(screen.getByRole('button', { name: 'Save house' }));

    // 1–200 W/m² (vocabulary bounds.ts)
    expect(await screen.findByText('Lamp power must be between 1 and 200 W/m²')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('shows a US user W/ft², keeps untouched lamps exact, and a lamp type sets its heat share', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit, 'us', LAMPS);

    // 45 W/m² × 0.09290304 m²/ft² (exact) = 4.18 W/ft²
    const power = within(lampsGroup()).getByRole('textbox', { name: /lamp power per floor area/i }) as HTMLInputElement;
    expect(power.value).toBe('4.18');
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0].lamps).toEqual(LAMPS);

    // HPS in the test tables keeps 93 % of its input in the house
    await user.click(within(lampsGroup()).getByRole('combobox', { name: /lamp type/i }));
    await user.click(await screen.findByRole('option', { name: 'HPS' }));
    const share = within(lampsGroup()).getByRole('textbox', { name: /heat share/i }) as HTMLInputElement;
    await waitFor(() => expect(share.value).toBe('93'));
  });

  it('removes the lamps: the house is sent with lamps null', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderForm(onSubmit, 'si', LAMPS);

    await user.click(screen.getByRole('button', { name: 'Remove lamps' }));
    expect(screen.getByText('No supplemental lamps.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]![0].lamps).toBeNull();
  });
});
