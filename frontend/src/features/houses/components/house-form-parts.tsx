import { Paper, Typography } from '@mui/material';
import { useFormikContext } from 'formik';
import { useEffect, useRef, useState, type ReactNode, type RefObject } from 'react';
import type { HouseInput } from '../../../api/types';
import type { Units } from '../../../lib/units';
import { formValuesToHouseInput, type HouseFormValues } from '../house-form-values';
import { convertFormValues } from '../house-form-unit-switch';
import type { houseFormSchema } from '../schemas';

/** Small pieces of the house form: the invalid-save note, sections, and the form's watchers. */

/**
 * After a save attempt that validation stopped: moves focus to the first field in error and says
 * so beside the button (the fields may be far above it, out of sight on a phone).
 */
export function InvalidSubmitNote({ formRef }: { formRef: RefObject<HTMLFormElement | null> }) {
  const { submitCount, isSubmitting, isValidating, errors } = useFormikContext<HouseFormValues>();
  const handled = useRef(0);
  const [note, setNote] = useState<string | null>(null);
  const errorCount = countErrors(errors);
  useEffect(() => {
    if (isSubmitting || isValidating || submitCount === handled.current) return;
    handled.current = submitCount;
    if (errorCount === 0) {
      setNote(null);
      return;
    }
    const first = formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]');
    first?.focus();
    first?.scrollIntoView?.({ block: 'center' });
    const label = first instanceof HTMLInputElement ? first.labels?.[0]?.textContent?.replace(/\s*\*\s*$/, '') : null;
    setNote(
      `Not saved: ${errorCount === 1 ? 'one field needs' : `${errorCount} fields need`} attention${label ? ` (first: ${label})` : ''}.`,
    );
  }, [submitCount, isSubmitting, isValidating, errorCount, formRef]);
  useEffect(() => {
    if (errorCount === 0) setNote(null);
  }, [errorCount]);
  if (!note) return null;
  return (
    <Typography role="alert" color="error" variant="body2" sx={{ alignSelf: 'center' }}>
      {note}
    </Typography>
  );
}

export function countErrors(errors: unknown): number {
  if (!errors) return 0;
  if (typeof errors === 'string') return 1;
  if (Array.isArray(errors)) return errors.reduce((total: number, item) => total + countErrors(item), 0);
  if (typeof errors === 'object')
    return Object.values(errors).reduce((total: number, item) => total + countErrors(item), 0);
  return 0;
}

export function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <Paper component="section" aria-labelledby={id} sx={{ p: 2 }}>
      <Typography id={id} variant="h3" component="h2" sx={{ mb: 2 }}>
        {title}
      </Typography>
      {children}
    </Paper>
  );
}

/** Keeps the user's edits when they switch unit systems mid-edit (re-expressed in the new unit). */
export function FollowUnitSystem({ units, initialValues }: { units: Units; initialValues: HouseFormValues }) {
  const { values, dirty, resetForm, setValues } = useFormikContext<HouseFormValues>();
  const previous = useRef({ units, initialValues });
  useEffect(() => {
    const before = previous.current;
    previous.current = { units, initialValues };
    if (before.units.system === units.system) return;
    const edited = dirty ? convertFormValues(values, before.initialValues, initialValues, before.units, units) : null;
    resetForm({ values: initialValues });
    if (edited) void setValues(edited, true);
    // Runs only when the unit system changes; values/dirty are read at that moment on purpose.
  }, [units, initialValues]);
  return null;
}

/** Reports the form's values upward (SI, or null while invalid) as the user edits. */
export function ReportValues({
  schema,
  initialValues,
  house,
  units,
  onValuesChange,
}: {
  schema: ReturnType<typeof houseFormSchema>;
  initialValues: HouseFormValues;
  house: HouseInput;
  units: Units;
  onValuesChange: (input: HouseInput | null, state: { dirty: boolean }) => void;
}) {
  const { values, dirty } = useFormikContext<HouseFormValues>();
  const report = useRef(onValuesChange);
  report.current = onValuesChange;
  useEffect(() => {
    const valid = schema.isValidSync(values);
    report.current(valid ? formValuesToHouseInput(values, initialValues, house, units) : null, { dirty });
  }, [values, dirty, schema, initialValues, house, units]);
  return null;
}
