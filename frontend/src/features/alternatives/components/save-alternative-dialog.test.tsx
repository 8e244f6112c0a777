import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import { renderWithProviders } from '../../../test/render-with-providers';
import { SaveAlternativeDialog } from './save-alternative-dialog';

function renderDialog(props: Partial<Parameters<typeof SaveAlternativeDialog>[0]> = {}) {
  const onSave = vi.fn();
  const onClose = vi.fn();
  renderWithProviders(<SaveAlternativeDialog open onSave={onSave} onClose={onClose} {...props} />);
  const dialog = screen.getByRole('dialog', { name: 'Save as alternative' });
  return { onSave, onClose, dialog };
}

const nameField = () => screen.getByRole('textbox', { name: /Name of the alternative/ });
const costField = () => screen.getByRole('textbox', { name: /Installed cost/ });
const saveButton = () => screen.getByRole('button', { name: 'Save alternative' });

describe('SaveAlternativeDialog', () => {
  it('needs a name; saves it trimmed with the cost as a number', async () => {
    const user = userEvent.setup();
    const { onSave } = renderDialog();
    expect(saveButton()).toHaveProperty('disabled', true);
    await user.type(nameField(), '  Re-cover with inflated double poly  ');
    await user.type(costField(), '4200.50');
    expect(saveButton()).toHaveProperty('disabled', false);
    await user.click(saveButton());
    expect(onSave).toHaveBeenCalledExactlyOnceWith({ name: 'Re-cover with inflated double poly', costAmount: 4200.5 });
  });

  it('keeps an empty cost as "not entered" (null), and Enter in the form saves', async () => {
    const user = userEvent.setup();
    const { onSave } = renderDialog();
    await user.type(nameField(), 'Second heater{Enter}');
    expect(onSave).toHaveBeenCalledExactlyOnceWith({ name: 'Second heater', costAmount: null });
  });

  it('refuses a negative or non-numeric cost and says why', async () => {
    const user = userEvent.setup();
    const { onSave } = renderDialog();
    await user.type(nameField(), 'Curtain');
    for (const bad of ['-5', 'abc', '200000000']) {
      await user.clear(costField());
      await user.type(costField(), bad);
      expect(screen.getByText('A number from 0 up')).toBeTruthy();
      expect(saveButton()).toHaveProperty('disabled', true);
      await user.type(costField(), '{Enter}');
    }
    expect(onSave).not.toHaveBeenCalled();
    await user.clear(costField());
    expect(screen.queryByText('A number from 0 up')).toBeNull();
  });

  it('refuses a name over 120 characters', async () => {
    const user = userEvent.setup();
    renderDialog();
    await user.click(nameField());
    await user.paste('x'.repeat(121));
    expect(screen.getByText('At most 120 characters')).toBeTruthy();
    expect(saveButton()).toHaveProperty('disabled', true);
  });

  it('shows the note, the save error and the busy state; Cancel closes', async () => {
    const user = userEvent.setup();
    const { onClose, onSave } = renderDialog({
      note: 'Heater groups are kept as you edited them.',
      error: new ApiError(422, 'Ridge height must be above the eave height', 'ridgeHeightM'),
      busy: true,
    });
    expect(screen.getByText('Heater groups are kept as you edited them.')).toBeTruthy();
    const problems = screen.getAllByRole('alert').filter((alert) => alert.textContent?.includes('Not saved'));
    expect(problems).toHaveLength(1);
    expect(problems[0].textContent).toContain('Ridge height must be above the eave height');
    await user.type(nameField(), 'Taller house');
    expect(screen.getByRole('button', { name: 'Saving…' })).toHaveProperty('disabled', true);
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(onClose).toHaveBeenCalledOnce();
    expect(onSave).not.toHaveBeenCalled();
  });
});
