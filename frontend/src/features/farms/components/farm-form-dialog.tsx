import {
  Autocomplete,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  TextField,
} from '@mui/material';
import { Form, Formik, getIn } from 'formik';
import { useMemo } from 'react';
import { isStaleWrite } from '../../../api/client';
import type { Farm, FarmInput } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { useSaveConflict } from '../../../components/save-conflict';
import { FormNumberField, FormTextField } from '../../../components/form-fields';
import { DEFAULT_CURRENCY } from '@thermbay/engine/vocabulary';
import { currencyCodes, useUnits, type Units } from '../../../lib/units';
import { useCreateFarm, useUpdateFarm } from '../mutations';
import { farmFormSchema, type FarmFormValues } from '../schemas';
import { farmKeys } from '../../../api/query-keys';

function allTimeZones(): string[] {
  try {
    return Intl.supportedValuesOf('timeZone');
  } catch {
    return ['UTC'];
  }
}

/** "EUR — Euro" where the browser knows the name, else the code. */
function currencyName(code: string): string {
  try {
    const name = new Intl.DisplayNames(['en'], { type: 'currency' }).of(code);
    return name && name !== code ? `${code} — ${name}` : code;
  } catch {
    return code;
  }
}

function browserTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

function toFormValues(farm: Farm | undefined, units: Units): FarmFormValues {
  if (!farm) {
    return {
      name: '',
      latitudeDeg: '',
      longitudeDeg: '',
      elevationM: '',
      timeZone: browserTimeZone(),
      currency: DEFAULT_CURRENCY,
    };
  }
  return {
    name: farm.name,
    latitudeDeg: String(farm.latitudeDeg),
    longitudeDeg: String(farm.longitudeDeg),
    elevationM: units.toInput('length', farm.elevationM),
    timeZone: farm.timeZone,
    currency: farm.currency,
  };
}

function toFarmInput(values: FarmFormValues, initial: FarmFormValues, farm: Farm | undefined, units: Units): FarmInput {
  // An untouched elevation keeps its stored SI value instead of a rounded round trip.
  const elevationM =
    farm && values.elevationM === initial.elevationM
      ? farm.elevationM
      : units.fromDisplay('length', Number(values.elevationM));
  return {
    name: values.name.trim(),
    latitudeDeg: Number(values.latitudeDeg),
    longitudeDeg: Number(values.longitudeDeg),
    elevationM,
    timeZone: values.timeZone,
    currency: values.currency,
  };
}

export interface FarmFormDialogProps {
  open: boolean;
  onClose: () => void;
  /** the farm to edit; omit to create one */
  farm?: Farm;
  onSaved?: (farm: Farm) => void;
}

export function FarmFormDialog({ open, onClose, farm, onSaved }: FarmFormDialogProps) {
  const units = useUnits();
  const create = useCreateFarm();
  const update = useUpdateFarm(farm?.id ?? 0);
  const mutation = farm ? update : create;
  const saveConflict = useSaveConflict({
    what: 'farm',
    mutation: update,
    queryKey: farmKeys.detail(farm?.id ?? 0),
    onOverwritten: (saved) => {
      onSaved?.(saved);
      onClose();
    },
  });
  const schema = useMemo(() => farmFormSchema(units), [units]);
  const initialValues = useMemo(() => toFormValues(farm, units), [farm, units]);
  const timeZones = useMemo(allTimeZones, []);
  const currencies = useMemo(currencyCodes, []);
  const title = farm ? `Edit ${farm.name}` : 'New farm';

  return (
    <>
      <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="farm-dialog-title">
        <Formik
          initialValues={initialValues}
          validationSchema={schema}
          enableReinitialize
          onSubmit={async (values) => {
            try {
              const body = toFarmInput(values, initialValues, farm, units);
              const saved = farm
                ? await update.mutateAsync({ body, version: farm.version })
                : await create.mutateAsync(body);
              onSaved?.(saved);
              onClose();
            } catch {
              // shown through the mutation's error
            }
          }}
        >
          {({ values, errors, touched, submitCount, setFieldValue, setFieldTouched, isSubmitting }) => {
            const currencyError =
              (getIn(touched, 'currency') || submitCount > 0) && typeof errors.currency === 'string'
                ? errors.currency
                : undefined;
            const timeZoneError =
              (getIn(touched, 'timeZone') || submitCount > 0) && typeof errors.timeZone === 'string'
                ? errors.timeZone
                : undefined;
            return (
              <Form noValidate>
                <DialogTitle id="farm-dialog-title">{title}</DialogTitle>
                <DialogContent>
                  <Stack spacing={2} sx={{ pt: 1 }}>
                    {mutation.error && !isStaleWrite(mutation.error) ? <ErrorAlert error={mutation.error} /> : null}
                    <FormTextField name="name" label="Farm name" required autoFocus />
                    <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
                      <FormNumberField
                        name="latitudeDeg"
                        label="Latitude"
                        unit="°"
                        helperText="North positive"
                        required
                      />
                      <FormNumberField
                        name="longitudeDeg"
                        label="Longitude"
                        unit="°"
                        helperText="East positive"
                        required
                      />
                    </Stack>
                    <FormNumberField name="elevationM" label="Elevation" unit={units.label('length')} required />
                    <Autocomplete
                      options={timeZones}
                      value={values.timeZone || null}
                      onChange={(_event, value) => void setFieldValue('timeZone', value ?? '')}
                      onBlur={() => void setFieldTouched('timeZone', true)}
                      autoHighlight
                      renderInput={(params) => (
                        <TextField
                          {...params}
                          id="field-timeZone"
                          label="Time zone"
                          required
                          error={Boolean(timeZoneError)}
                          helperText={timeZoneError}
                        />
                      )}
                    />
                    <Autocomplete
                      options={currencies}
                      value={values.currency || null}
                      onChange={(_event, value) => void setFieldValue('currency', value ?? '')}
                      onBlur={() => void setFieldTouched('currency', true)}
                      getOptionLabel={(code) => currencyName(code)}
                      autoHighlight
                      renderInput={(params) => (
                        <TextField
                          {...params}
                          id="field-currency"
                          label="Currency"
                          required
                          error={Boolean(currencyError)}
                          helperText={currencyError ?? 'Fuel prices and every cost of the farm are in this currency'}
                        />
                      )}
                    />
                  </Stack>
                </DialogContent>
                <DialogActions>
                  <Button onClick={onClose}>Cancel</Button>
                  <Button type="submit" variant="contained" disabled={isSubmitting}>
                    {farm ? 'Save farm' : 'Create farm'}
                  </Button>
                </DialogActions>
              </Form>
            );
          }}
        </Formik>
      </Dialog>
      {saveConflict}
    </>
  );
}
