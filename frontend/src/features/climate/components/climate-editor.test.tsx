import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import type { SiteClimate } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { ClimateEditor } from './climate-editor';

const climate: SiteClimate = {
  winterDesignC: -20,
  summerDesignC: 30,
  summerDesignWetBulbC: 22,
  summerDailyRangeK: 10,
  monthly: Array.from({ length: 12 }, (_unused, index) => ({
    month: index + 1,
    meanDailyMinC: index - 5,
    meanDailyMaxC: index + 5,
  })),
  sourceNote: null,
};

function renderEditor(
  onSave: (body: SiteClimate) => Promise<unknown>,
  system: 'si' | 'us' = 'si',
  stored: SiteClimate | null = climate,
) {
  return render(
    <UnitSystemProvider system={system}>
      <ClimateEditor climate={stored} onSave={onSave} />
    </UnitSystemProvider>,
  );
}

describe('ClimateEditor', () => {
  it('saves a monthly minimum typed in °F as °C', async () => {
    const user = userEvent.setup();
    const onSave = vi.fn(async (_body: SiteClimate) => ({}));
    renderEditor(onSave, 'us');
    const marchMin = screen.getByRole('textbox', { name: 'March mean daily minimum (°F)' });
    // March: −3 °C = 26.6 °F
    expect((marchMin as HTMLInputElement).value).toBe('26.6');
    await user.clear(marchMin);
    await user.type(marchMin, '32');
    await user.click(screen.getByRole('button', { name: 'Save climate' }));
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    const body = onSave.mock.calls[0]![0];
    expect(body.monthly[2]!.meanDailyMinC).toBeCloseTo(0, 12);
    expect(body.monthly[3]!.meanDailyMinC).toBe(-2);
    expect(await screen.findByText('Climate saved.')).toBeTruthy();
  });

  it('refuses a maximum below the minimum on the field itself, sending nothing', async () => {
    const user = userEvent.setup();
    const onSave = vi.fn(async () => ({}));
    renderEditor(onSave);
    const juneMax = screen.getByRole('textbox', { name: 'June mean daily maximum (°C)' });
    await user.clear(juneMax);
    await user.type(juneMax, '-10');
    await user.tab();
    expect(await screen.findByText('The maximum cannot be below the minimum')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save climate' }));
    // Formik validates asynchronously: a valid value saved next is the only call, so the refused
    // attempt sent nothing (had it, its call would have come first)
    await user.clear(juneMax);
    await user.type(juneMax, '27');
    await user.click(screen.getByRole('button', { name: 'Save climate' }));
    await waitFor(() => expect(onSave).toHaveBeenCalled());
    expect(onSave).toHaveBeenCalledTimes(1);
    expect((onSave.mock.calls[0] as unknown as [SiteClimate])[0].monthly[5]!.meanDailyMaxC).toBe(27);
  });

  it("shows the server's 422 under the month it names", async () => {
    const user = userEvent.setup();
    const onSave = vi.fn(async () => {
      throw new ApiError(
        422,
        'the mean daily minimum cannot be above the mean daily maximum',
        'climate.monthly[2].meanDailyMinC',
      );
    });
    renderEditor(onSave);
    await user.click(screen.getByRole('button', { name: 'Save climate' }));
    const marchMin = screen.getByRole('textbox', { name: 'March mean daily minimum (°C)' });
    await waitFor(() => expect(marchMin.getAttribute('aria-invalid')).toBe('true'));
  });

  it('says when no climate is stored yet and asks for every value', async () => {
    const user = userEvent.setup();
    const onSave = vi.fn(async () => ({}));
    renderEditor(onSave, 'si', null);
    expect(screen.getByText(/No climate entered yet/)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save climate' }));
    expect(await screen.findByText('Enter the heating design temperature')).toBeTruthy();
    expect(onSave).not.toHaveBeenCalled();
  });
});
