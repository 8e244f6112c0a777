import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import type { HouseInput } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { houseFixture, referenceDataFixture } from '../../../test/fixtures';
import { Form, Formik } from 'formik';
import { useMemo } from 'react';
import { useUnits } from '../../../lib/units';
import { formValuesToHouseInput, houseInputOf, houseToFormValues } from '../house-form-values';
import { houseFormSchema } from '../schemas';
import { HouseForm } from './house-form';
import { Section } from './house-form-parts';
import { ShadeClothFields } from './shade-cloth-fields';

/** The section alone, inside Formik with the house form's own schema and conversion to the API body. */
function SectionAlone({ house, onSubmit }: { house: HouseInput; onSubmit: (input: HouseInput) => Promise<void> }) {
  const units = useUnits();
  const initial = useMemo(() => houseToFormValues(house, units), [house, units]);
  return (
    <Formik
      initialValues={initial}
      validationSchema={houseFormSchema(units)}
      onSubmit={(values) => onSubmit(formValuesToHouseInput(values, initial, house, units))}
    >
      <Form noValidate aria-label="House details">
        <Section id="house-section-shade" title="Shade cloth">
          <ShadeClothFields referenceData={referenceDataFixture} />
        </Section>
        <button type="submit">Save house</button>
      </Form>
    </Formik>
  );
}

function renderSection(house: HouseInput, onSubmit: (input: HouseInput) => Promise<void>) {
  return render(
    <UnitSystemProvider system="si">
      <SectionAlone house={house} onSubmit={onSubmit} />
    </UnitSystemProvider>,
  );
}

function renderForm(house: HouseInput, onSubmit: (input: HouseInput) => Promise<void>) {
  return render(
    <UnitSystemProvider system="si">
      <HouseForm house={house} referenceData={referenceDataFixture} onSubmit={onSubmit} />
    </UnitSystemProvider>,
  );
}

const shadeSection = () => screen.getByRole('region', { name: 'Shade cloth' });
const monthGroup = () => within(shadeSection()).getByRole('group', { name: 'Months the cloth is in place' });
const submitted = (onSubmit: ReturnType<typeof vi.fn>) => (onSubmit.mock.calls[0] as unknown as [HouseInput])[0];

describe('HouseForm: the shade cloth section', () => {
  it('adds a cloth: it starts at 50 %, months are ticked by name, and the API gets a fraction', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderSection(houseInputOf(houseFixture), onSubmit);

    const has = within(shadeSection()).getByRole('checkbox', { name: 'The house has a shade cloth' });
    expect((has as HTMLInputElement).checked).toBe(false);
    expect(within(shadeSection()).queryByRole('group')).toBeNull();
    await user.click(has);

    const share = within(shadeSection()).getByRole('textbox', { name: /sun it lets through/i });
    expect((share as HTMLInputElement).value).toBe('50');
    // twelve months, each a checkbox named by its month, in one labelled group
    const months = within(monthGroup()).getAllByRole('checkbox');
    expect(months).toHaveLength(12);
    expect(months.map((box) => box.getAttribute('value'))).toEqual(Array.from({ length: 12 }, (_, i) => String(i + 1)));
    for (const name of ['August', 'June', 'July']) {
      await user.click(within(monthGroup()).getByRole('checkbox', { name }));
    }
    expect((within(monthGroup()).getByRole('checkbox', { name: 'July' }) as HTMLInputElement).checked).toBe(true);

    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    // 50 % → 0.5; months in calendar order whatever order they were ticked in
    expect(submitted(onSubmit).shadeCloth).toEqual({ solarTransmittance: 0.5, months: [6, 7, 8] });
  });

  it('a typical cloth fills in the share it lets through, sent as a fraction', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderSection({ ...houseInputOf(houseFixture), shadeCloth: { solarTransmittance: 0.5, months: [7] } }, onSubmit);
    const share = within(shadeSection()).getByRole('textbox', { name: /sun it lets through/i });
    await user.click(within(shadeSection()).getByRole('combobox', { name: 'Typical cloth' }));
    await user.click(await screen.findByRole('option', { name: '30 % shade cloth' }));
    expect((share as HTMLInputElement).value).toBe('70');
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    // 70 % → 0.7 (reference row: a 30 % shade cloth passes 0.7)
    expect(submitted(onSubmit).shadeCloth).toEqual({ solarTransmittance: 0.7, months: [7] });
  });

  it('refuses a share outside 0–100 % and a cloth without months, on the fields, and sends nothing', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async (_input: HouseInput) => {});
    renderSection(houseInputOf(houseFixture), onSubmit);

    await user.click(within(shadeSection()).getByRole('checkbox', { name: 'The house has a shade cloth' }));
    const share = within(shadeSection()).getByRole('textbox', { name: /sun it lets through/i });
    await user.clear(share);
    await user.type(share, '150');
    await user.tab();
    // the bounds are the shared ones (0–1 as a fraction), shown as percent
    expect(await screen.findByText('Sun it lets through must be between 0 and 100 %')).toBeTruthy();
    expect(share.getAttribute('aria-invalid')).toBe('true');

    await user.click(screen.getByRole('button', { name: 'Save house' }));
    const monthsMessage = await within(monthGroup()).findByText('Tick at least one month the cloth is in place');
    // the message is tied to the group, so it is read out with it
    expect(monthGroup().getAttribute('aria-describedby')).toBe(monthsMessage.id);
    expect(onSubmit).not.toHaveBeenCalled();

    await user.clear(share);
    await user.type(share, '40');
    await user.click(within(monthGroup()).getByRole('checkbox', { name: 'May' }));
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(submitted(onSubmit).shadeCloth).toEqual({ solarTransmittance: 0.4, months: [5] });
  });

  it('shows a stored cloth, keeps its share exact when untouched, and removes it when unticked', async () => {
    const user = userEvent.setup();
    const stored = {
      ...houseInputOf(houseFixture),
      shadeCloth: { solarTransmittance: 0.4567, months: [9, 5, 6, 7, 8] },
    };

    const keep = vi.fn(async (_input: HouseInput) => {});
    const first = renderSection(stored, keep);
    expect(
      (within(shadeSection()).getByRole('textbox', { name: /sun it lets through/i }) as HTMLInputElement).value,
    ).toBe('45.7');
    const ticked = within(monthGroup())
      .getAllByRole('checkbox')
      .filter((box) => (box as HTMLInputElement).checked)
      .map((box) => box.getAttribute('value'));
    expect(ticked).toEqual(['5', '6', '7', '8', '9']);
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(keep).toHaveBeenCalledTimes(1));
    expect(submitted(keep).shadeCloth).toEqual({ solarTransmittance: 0.4567, months: [5, 6, 7, 8, 9] });
    first.unmount();

    const remove = vi.fn(async (_input: HouseInput) => {});
    renderSection(stored, remove);
    await user.click(within(shadeSection()).getByRole('checkbox', { name: 'The house has a shade cloth' }));
    expect(within(shadeSection()).getByText(/No shade cloth/)).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    await waitFor(() => expect(remove).toHaveBeenCalledTimes(1));
    expect(submitted(remove).shadeCloth).toBeNull();
  });

  it('in the whole house form: shows a server error about the months under the month group', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(async () => {
      throw new ApiError(400, 'Request validation failed', undefined, [
        { field: 'shadeCloth.months', message: 'each value in months must not be greater than 12' },
      ]);
    });
    renderForm({ ...houseInputOf(houseFixture), shadeCloth: { solarTransmittance: 0.5, months: [7] } }, onSubmit);
    await user.click(screen.getByRole('button', { name: 'Save house' }));
    expect(await within(monthGroup()).findByText('each value in months must not be greater than 12')).toBeTruthy();
  });
});
