import { Alert, Button, Stack, Typography } from '@mui/material';
import { Form, Formik } from 'formik';
import { useState } from 'react';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useChangePassword } from '../mutations';
import { changePasswordSchema, PASSWORD_HELP, type ChangePasswordValues } from '../schemas';

export function ChangePasswordForm() {
  const change = useChangePassword();
  const [done, setDone] = useState(false);
  const initialValues: ChangePasswordValues = { currentPassword: '', newPassword: '' };
  return (
    <Formik<ChangePasswordValues>
      initialValues={initialValues}
      validationSchema={changePasswordSchema}
      onSubmit={async (values, helpers) => {
        setDone(false);
        try {
          await change.mutateAsync(values);
          setDone(true);
          helpers.resetForm();
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-labelledby="change-password-heading">
          <Stack spacing={2} sx={{ maxWidth: 480 }}>
            <Typography id="change-password-heading" variant="h2" sx={{ fontSize: '1.4rem' }}>
              Change password
            </Typography>
            <FormTextField
              name="currentPassword"
              label="Current password"
              type="password"
              autoComplete="current-password"
              required
            />
            <FormTextField
              name="newPassword"
              label="New password"
              type="password"
              autoComplete="new-password"
              helperText={PASSWORD_HELP}
              required
            />
            <ErrorAlert error={change.error} title="The password was not changed" />
            {done ? (
              <Alert severity="success" role="status">
                Password changed. Every other session of your account has been signed out.
              </Alert>
            ) : null}
            <Button type="submit" variant="contained" disabled={isSubmitting} sx={{ alignSelf: 'flex-start' }}>
              {isSubmitting ? 'Changing…' : 'Change password'}
            </Button>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
