import { Button, Stack, Typography } from '@mui/material';
import { Form, Formik } from 'formik';
import type { User } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useRegister } from '../mutations';
import { PASSWORD_HELP, registerSchema, type RegisterValues } from '../schemas';

export function RegisterForm({ onRegistered }: { onRegistered: (user: User) => void }) {
  const register = useRegister();
  const initialValues: RegisterValues = { name: '', email: '', password: '' };
  return (
    <Formik
      initialValues={initialValues}
      validationSchema={registerSchema}
      onSubmit={async (values) => {
        try {
          const response = await register.mutateAsync({
            name: values.name.trim(),
            email: values.email.trim(),
            password: values.password,
          });
          onRegistered(response.user);
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-labelledby="register-heading">
          <Stack spacing={2}>
            <Typography id="register-heading" variant="h1" component="h1">
              Create an account
            </Typography>
            {register.error ? <ErrorAlert error={register.error} /> : null}
            <FormTextField name="name" label="Name" autoComplete="name" required />
            <FormTextField name="email" label="E-mail" type="email" autoComplete="email" required />
            <FormTextField
              name="password"
              label="Password"
              type="password"
              autoComplete="new-password"
              helperText={PASSWORD_HELP}
              required
            />
            <Button type="submit" variant="contained" disabled={isSubmitting}>
              {isSubmitting ? 'Creating account…' : 'Create account'}
            </Button>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
