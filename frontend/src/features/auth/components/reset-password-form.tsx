import { Button, Stack, Typography } from '@mui/material';
import { Form, Formik } from 'formik';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useResetPassword } from '../mutations';
import { PASSWORD_HELP, resetPasswordSchema, type ResetPasswordValues } from '../schemas';

export function ResetPasswordForm({ token, onReset }: { token: string; onReset: () => void }) {
  const reset = useResetPassword();
  const initialValues: ResetPasswordValues = { newPassword: '', repeat: '' };
  return (
    <Formik<ResetPasswordValues>
      initialValues={initialValues}
      validationSchema={resetPasswordSchema}
      onSubmit={async (values) => {
        try {
          await reset.mutateAsync({ token, newPassword: values.newPassword });
          onReset();
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-labelledby="reset-heading">
          <Stack spacing={2}>
            <Typography id="reset-heading" variant="h1" component="h1">
              Choose a new password
            </Typography>
            <FormTextField
              name="newPassword"
              label="New password"
              type="password"
              autoComplete="new-password"
              helperText={PASSWORD_HELP}
              required
            />
            <FormTextField
              name="repeat"
              label="Repeat new password"
              type="password"
              autoComplete="new-password"
              required
            />
            <ErrorAlert error={reset.error} title="The password was not changed" />
            <Button type="submit" variant="contained" disabled={isSubmitting}>
              {isSubmitting ? 'Saving…' : 'Save new password and sign in'}
            </Button>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
