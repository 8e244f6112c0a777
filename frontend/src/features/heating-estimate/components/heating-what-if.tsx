import { BOUNDS } from '@thermbay/engine/vocabulary';
import { Button, Checkbox, FormControlLabel, Stack, TextField, Tooltip } from '@mui/material';
import { useEffect, useRef } from 'react';
import type { PartialHeatingConditions } from '../../../api/types';
import type { Units } from '../../../lib/units';

/** What the user typed in the what-if row, in their units; empty = the farm's value. */
export interface HeatingWhatIfValues {
  designOutdoor: string;
  insideRelativeHumidityPct: string;
  curtainClosed: boolean;
  /** size for a clear night: radiation to a sky colder than the air */
  clearSky: boolean;
}

export const EMPTY_HEATING_WHAT_IF: HeatingWhatIfValues = {
  designOutdoor: '',
  insideRelativeHumidityPct: '',
  curtainClosed: false,
  clearSky: false,
};

interface ParsedWhatIf {
  conditions: PartialHeatingConditions;
  errors: Partial<Record<'designOutdoor' | 'insideRelativeHumidityPct', string>>;
}

/** Typed what-if values → SI conditions for the API; a value out of range is left out and named. */
export function parseHeatingWhatIf(values: HeatingWhatIfValues, units: Units): ParsedWhatIf {
  const conditions: PartialHeatingConditions = {};
  const errors: ParsedWhatIf['errors'] = {};
  if (values.designOutdoor.trim() !== '') {
    const range = units.range('temperature', BOUNDS.designOutdoorC);
    const typed = Number(values.designOutdoor);
    if (!Number.isFinite(typed) || typed < range.min || typed > range.max) {
      errors.designOutdoor = `Between ${range.min} and ${range.max} ${units.label('temperature')}`;
    } else {
      conditions.designOutdoorC = units.fromDisplay('temperature', typed);
    }
  }
  if (values.insideRelativeHumidityPct.trim() !== '') {
    const range = BOUNDS.relativeHumidityPct;
    const typed = Number(values.insideRelativeHumidityPct);
    if (!Number.isFinite(typed) || typed < range.min || typed > range.max) {
      errors.insideRelativeHumidityPct = `Between ${range.min} and ${range.max} %`;
    } else {
      conditions.insideRelativeHumidityPct = typed;
    }
  }
  if (values.curtainClosed) conditions.curtainClosed = true;
  if (values.clearSky) conditions.clearSky = true;
  return { conditions, errors };
}

export function HeatingWhatIf({
  values,
  onChange,
  units,
  placeholders,
  hasCurtain,
}: {
  values: HeatingWhatIfValues;
  onChange: (values: HeatingWhatIfValues) => void;
  units: Units;
  /** the values in use, shown greyed in the empty fields */
  placeholders: { designOutdoor?: string; insideRelativeHumidityPct?: string };
  hasCurtain: boolean;
}) {
  const { errors } = parseHeatingWhatIf(values, units);

  // A typed temperature follows a switch of unit system.
  const previousUnits = useRef(units);
  useEffect(() => {
    const before = previousUnits.current;
    previousUnits.current = units;
    if (before.system === units.system || values.designOutdoor.trim() === '') return;
    const typed = Number(values.designOutdoor);
    if (!Number.isFinite(typed)) return;
    onChange({ ...values, designOutdoor: units.toInput('temperature', before.fromDisplay('temperature', typed)) });
    // Only a unit switch converts; values are read at that moment on purpose.
  }, [units]);

  const changed =
    values.designOutdoor !== '' || values.insideRelativeHumidityPct !== '' || values.curtainClosed || values.clearSky;
  return (
    <Stack
      direction={{ xs: 'column', sm: 'row' }}
      spacing={1.5}
      sx={{ alignItems: { sm: 'flex-start' } }}
      role="group"
      aria-label="What if (heating)"
    >
      <TextField
        label={`Design outdoor (${units.label('temperature')})`}
        value={values.designOutdoor}
        placeholder={placeholders.designOutdoor}
        onChange={(event) => onChange({ ...values, designOutdoor: event.target.value })}
        error={Boolean(errors.designOutdoor)}
        helperText={errors.designOutdoor ?? 'Empty: farm climate'}
        slotProps={{ htmlInput: { inputMode: 'decimal' }, inputLabel: { shrink: true } }}
      />
      <TextField
        label="Inside RH (%)"
        value={values.insideRelativeHumidityPct}
        placeholder={placeholders.insideRelativeHumidityPct}
        onChange={(event) => onChange({ ...values, insideRelativeHumidityPct: event.target.value })}
        error={Boolean(errors.insideRelativeHumidityPct)}
        helperText={errors.insideRelativeHumidityPct ?? 'Empty: default'}
        slotProps={{ htmlInput: { inputMode: 'decimal' }, inputLabel: { shrink: true } }}
      />
      <Tooltip title={hasCurtain ? 'Credit the drawn curtain in the design loss' : 'No curtain entered for this house'}>
        <span>
          <FormControlLabel
            sx={{ whiteSpace: 'nowrap', mt: 0.5 }}
            control={
              <Checkbox
                checked={values.curtainClosed && hasCurtain}
                disabled={!hasCurtain}
                onChange={(event) => onChange({ ...values, curtainClosed: event.target.checked })}
              />
            }
            label="Curtain drawn"
          />
        </span>
      </Tooltip>
      <Tooltip title="A clear sky is far colder than the air: a film that passes long-wave radiation loses more">
        <FormControlLabel
          sx={{ whiteSpace: 'nowrap', mt: 0.5 }}
          control={
            <Checkbox
              checked={values.clearSky}
              onChange={(event) => onChange({ ...values, clearSky: event.target.checked })}
            />
          }
          label="Clear night"
        />
      </Tooltip>
      {changed ? (
        <Button sx={{ mt: 0.5, flexShrink: 0 }} onClick={() => onChange(EMPTY_HEATING_WHAT_IF)}>
          Reset
        </Button>
      ) : null}
    </Stack>
  );
}
