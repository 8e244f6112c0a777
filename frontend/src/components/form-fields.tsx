import {
  Box,
  Checkbox,
  FormControlLabel,
  FormHelperText,
  InputAdornment,
  MenuItem,
  TextField,
  type TextFieldProps,
} from '@mui/material';
import { getIn, useField, useFormikContext } from 'formik';
import { createContext, useContext } from 'react';

/**
 * The one place where Formik's touched/errors meet MUI fields: each field shows its own error
 * under itself, labelled for screen readers via the TextField's label/helperText wiring.
 */

/** Set by a form shown to someone who may read but not change it: every field is disabled. */
export const FormReadOnlyContext = createContext(false);

type BaseProps = Omit<TextFieldProps, 'name' | 'value' | 'onChange' | 'onBlur' | 'error'> & {
  name: string;
};

function useFieldError(name: string): string | undefined {
  const { errors, touched, submitCount } = useFormikContext<Record<string, unknown>>();
  const error = getIn(errors, name) as unknown;
  const wasTouched = Boolean(getIn(touched, name)) || submitCount > 0;
  return wasTouched && typeof error === 'string' ? error : undefined;
}

export function FormTextField({ name, helperText, ...rest }: BaseProps) {
  const [field] = useField<string>(name);
  const error = useFieldError(name);
  const readOnly = useContext(FormReadOnlyContext);
  return (
    <TextField
      {...rest}
      disabled={rest.disabled || readOnly}
      id={rest.id ?? `field-${name}`}
      name={field.name}
      value={field.value ?? ''}
      onChange={field.onChange}
      onBlur={field.onBlur}
      error={Boolean(error)}
      helperText={error ?? helperText}
    />
  );
}

/** A number typed in the user's unit; `unit` is shown after the value. */
/** Present for screen readers, invisible on screen (the unit is already shown after the value). */
const visuallyHidden = {
  position: 'absolute',
  // '1px', not 1: in `sx` the number 1 means 100 %, which made the hidden span as wide as the
  // field and pushed a phone's page sideways
  width: '1px',
  height: '1px',
  margin: '-1px',
  overflow: 'hidden',
  clip: 'rect(0 0 0 0)',
  whiteSpace: 'nowrap',
} as const;

export function FormNumberField({ name, unit, helperText, label, ...rest }: BaseProps & { unit?: string }) {
  const [field] = useField<string>(name);
  const error = useFieldError(name);
  const readOnly = useContext(FormReadOnlyContext);
  return (
    <TextField
      {...rest}
      // The unit joins the accessible name ("Width of one span (ft)") so it is announced too.
      label={
        unit ? (
          <>
            {label}
            <Box component="span" sx={visuallyHidden}>
              {` (${unit})`}
            </Box>
          </>
        ) : (
          label
        )
      }
      disabled={rest.disabled || readOnly}
      id={rest.id ?? `field-${name}`}
      name={field.name}
      value={field.value ?? ''}
      onChange={field.onChange}
      onBlur={field.onBlur}
      error={Boolean(error)}
      helperText={error ?? helperText}
      slotProps={{
        ...rest.slotProps,
        htmlInput: { inputMode: 'decimal', ...(rest.slotProps?.htmlInput as object | undefined) },
        input: unit ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } : undefined,
        // A resting label would run under the unit in an empty field: keep it above.
        inputLabel: unit ? { shrink: true } : undefined,
      }}
    />
  );
}

export interface SelectOption {
  value: string;
  label: string;
}

export function FormSelectField({
  name,
  options,
  helperText,
  onValueChange,
  ...rest
}: BaseProps & {
  options: SelectOption[];
  /** called after the field takes a new value */ onValueChange?: (value: string) => void;
}) {
  const [field] = useField<string>(name);
  const hasEmptyOption = options.some((option) => option.value === '');
  const error = useFieldError(name);
  const readOnly = useContext(FormReadOnlyContext);
  return (
    <TextField
      {...rest}
      disabled={rest.disabled || readOnly}
      select
      // An option with the value '' (e.g. "No curtain") is shown, not treated as empty.
      slotProps={hasEmptyOption ? { select: { displayEmpty: true }, inputLabel: { shrink: true } } : rest.slotProps}
      id={rest.id ?? `field-${name}`}
      name={field.name}
      value={field.value ?? ''}
      onChange={(event) => {
        field.onChange(event);
        onValueChange?.(String(event.target.value));
      }}
      onBlur={field.onBlur}
      error={Boolean(error)}
      helperText={error ?? helperText}
    >
      {options.map((option) => (
        <MenuItem key={option.value} value={option.value}>
          {option.label}
        </MenuItem>
      ))}
    </TextField>
  );
}

export function FormCheckboxField({
  name,
  label,
  helperText,
  disabled,
}: {
  name: string;
  label: string;
  helperText?: string;
  disabled?: boolean;
}) {
  const [field] = useField<boolean>({ name, type: 'checkbox' });
  const readOnly = useContext(FormReadOnlyContext);
  return (
    <div>
      <FormControlLabel
        control={
          <Checkbox
            name={field.name}
            checked={Boolean(field.checked ?? field.value)}
            onChange={field.onChange}
            onBlur={field.onBlur}
            disabled={disabled || readOnly}
          />
        }
        label={label}
      />
      {helperText ? <FormHelperText sx={{ mt: -0.5, ml: 4 }}>{helperText}</FormHelperText> : null}
    </div>
  );
}
