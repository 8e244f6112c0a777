import {
  Alert,
  Button,
  FormControl,
  FormControlLabel,
  FormLabel,
  Radio,
  RadioGroup,
  Stack,
  Typography,
} from '@mui/material';
import { Form, Formik } from 'formik';
import type { User } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useUpdateMe } from '../mutations';
import { profileSchema, type ProfileValues } from '../schemas';

export function SettingsForm({ user, onUpdated }: { user: User; onUpdated: (user: User) => void }) {
  const updateMe = useUpdateMe({ onSuccess: onUpdated });
  const initialValues: ProfileValues = { name: user.name, unitSystem: user.unitSystem };
  return (
    <Formik
      initialValues={initialValues}
      enableReinitialize
      validationSchema={profileSchema}
      onSubmit={async (values) => {
        try {
          await updateMe.mutateAsync({ name: values.name.trim(), unitSystem: values.unitSystem });
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ values, setFieldValue, isSubmitting, dirty }) => (
        <Form noValidate aria-label="Profile and units">
          <Stack spacing={3} sx={{ maxWidth: 480 }}>
            {updateMe.error ? <ErrorAlert error={updateMe.error} /> : null}
            {updateMe.isSuccess && !dirty ? <Alert severity="success">Saved.</Alert> : null}
            <FormTextField name="name" label="Name" autoComplete="name" required />
            <Typography variant="body2" color="text.secondary">
              Signed in as {user.email}
            </Typography>
            <FormControl component="fieldset">
              <FormLabel component="legend" id="unit-system-label">
                Units for every number shown and typed
              </FormLabel>
              <RadioGroup
                aria-labelledby="unit-system-label"
                name="unitSystem"
                value={values.unitSystem}
                onChange={(event) => void setFieldValue('unitSystem', event.target.value)}
              >
                <FormControlLabel value="si" control={<Radio />} label="SI (m, °C, kW, m³/s)" />
                <FormControlLabel value="us" control={<Radio />} label="US customary (ft, °F, Btu/h, cfm)" />
              </RadioGroup>
            </FormControl>
            <div>
              <Button type="submit" variant="contained" disabled={isSubmitting || !dirty}>
                Save settings
              </Button>
            </div>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
