import { Button, MenuItem, Stack, TextField } from '@mui/material';
import { useEffect, useRef } from 'react';
import type { EvaporativePad, ReferenceData } from '../../../api/types';
import { referenceRows } from '../../../lib/reference-data';
import type { Units } from '../../../lib/units';

/** What the user typed for an evaporative pad what-if, area in their unit; no type = no pads. */
export interface PadWhatIfValues {
  padTypeId: string;
  area: string;
}

export const EMPTY_PAD_WHAT_IF: PadWhatIfValues = { padTypeId: '', area: '' };

/** Typed pad what-if → the API's pad (SI), or null with the reason when not complete. */
export function parsePadWhatIf(values: PadWhatIfValues, units: Units): { pad: EvaporativePad | null; error?: string } {
  if (values.padTypeId === '') return { pad: null };
  if (values.area.trim() === '') return { pad: null, error: 'Enter the pad face area' };
  const typed = Number(values.area);
  if (!Number.isFinite(typed) || typed <= 0) return { pad: null, error: 'A positive area' };
  return { pad: { padTypeId: values.padTypeId, areaM2: units.fromDisplay('area', typed) } };
}

export function PadWhatIf({
  values,
  onChange,
  units,
  referenceData,
}: {
  values: PadWhatIfValues;
  onChange: (values: PadWhatIfValues) => void;
  units: Units;
  referenceData: ReferenceData | undefined;
}) {
  const { error } = parsePadWhatIf(values, units);
  const padTypes = referenceRows(referenceData, 'evaporative-pads');

  // A typed area follows a switch of unit system.
  const previousUnits = useRef(units);
  useEffect(() => {
    const before = previousUnits.current;
    previousUnits.current = units;
    if (before.system === units.system || values.area.trim() === '') return;
    const typed = Number(values.area);
    if (!Number.isFinite(typed)) return;
    onChange({ ...values, area: units.toInput('area', before.fromDisplay('area', typed)) });
    // Only a unit switch converts; values are read at that moment on purpose.
  }, [units]);

  return (
    <Stack
      direction={{ xs: 'column', sm: 'row' }}
      spacing={1.5}
      sx={{ alignItems: { sm: 'flex-start' } }}
      role="group"
      aria-label="What if (evaporative pads)"
    >
      <TextField
        select
        label="Evaporative pads"
        value={values.padTypeId}
        onChange={(event) => onChange({ ...values, padTypeId: event.target.value })}
        helperText="Try pads on the inlet wall"
        sx={{ minWidth: 220 }}
        slotProps={{ select: { displayEmpty: true }, inputLabel: { shrink: true } }}
      >
        <MenuItem value="">No pads</MenuItem>
        {padTypes.map((row) => (
          <MenuItem key={row.id} value={row.id}>
            {row.label ?? row.id}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        label={`Pad face area (${units.label('area')})`}
        value={values.area}
        disabled={values.padTypeId === ''}
        onChange={(event) => onChange({ ...values, area: event.target.value })}
        error={Boolean(error)}
        helperText={error ?? ' '}
        slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      />
      {values.padTypeId !== '' || values.area !== '' ? (
        <Button sx={{ mt: 0.5, flexShrink: 0 }} onClick={() => onChange(EMPTY_PAD_WHAT_IF)}>
          Reset
        </Button>
      ) : null}
    </Stack>
  );
}
