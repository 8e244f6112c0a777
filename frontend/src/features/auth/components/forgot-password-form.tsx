import { Alert, Button, Stack, Typography } from '@mui/material';
import { Form, Formik } from 'formik';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useRequestPasswordReset } from '../mutations';
import { forgotPasswordSchema, type ForgotPasswordValues } from '../schemas';

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const initialValues: ForgotPasswordValues = { email: '' };
  return (
    <Formik<ForgotPasswordValues>
      initialValues={initialValues}
      validationSchema={forgotPasswordSchema}
      onSubmit={async (values) => {
        try {
          await request.mutateAsync(values.email.trim());
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-labelledby="forgot-heading">
          <Stack spacing={2}>
            <Typography id="forgot-heading" variant="h1" component="h1">
              Forgot your password?
            </Typography>
            <Typography>
              Enter your account's e-mail address and we will send you a link to choose a new one.
            </Typography>
            <FormTextField name="email" label="E-mail" type="email" autoComplete="email" required />
            <ErrorAlert error={request.error} />
            {request.data ? (
              <Alert severity="success" role="status">
                {request.data.message}
              </Alert>
            ) : null}
            <Button type="submit" variant="contained" disabled={isSubmitting}>
              {isSubmitting ? 'Sending…' : 'Send reset link'}
            </Button>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
