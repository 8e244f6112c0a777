import {
  Alert,
  Box,
  Button,
  List,
  ListItem,
  ListItemButton,
  ListItemText,
  Paper,
  Stack,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { Form, Formik } from 'formik';
import type { User } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { useLogin } from '../mutations';
import { demoAccountsQueryOptions } from '../queries';
import { loginSchema, type LoginValues } from '../schemas';

export interface SignInFormProps {
  onSignedIn: (user: User) => void;
}

export function SignInForm({ onSignedIn }: SignInFormProps) {
  const login = useLogin();
  const demoAccounts = useQuery(demoAccountsQueryOptions());
  const initialValues: LoginValues = { email: '', password: '' };

  return (
    <Formik
      initialValues={initialValues}
      validationSchema={loginSchema}
      onSubmit={async (values) => {
        try {
          const response = await login.mutateAsync({ email: values.email.trim(), password: values.password });
          onSignedIn(response.user);
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting, setValues }) => (
        <Stack spacing={3}>
          <Form noValidate aria-labelledby="sign-in-heading">
            <Stack spacing={2}>
              <Typography id="sign-in-heading" variant="h1" component="h1">
                Sign in
              </Typography>
              {login.error ? <ErrorAlert error={login.error} /> : null}
              <FormTextField name="email" label="E-mail" type="email" autoComplete="username" required />
              <FormTextField
                name="password"
                label="Password"
                type="password"
                autoComplete="current-password"
                required
              />
              <Button type="submit" variant="contained" disabled={isSubmitting}>
                {isSubmitting ? 'Signing in…' : 'Sign in'}
              </Button>
            </Stack>
          </Form>

          {demoAccounts.data?.enabled && demoAccounts.data.accounts.length > 0 ? (
            <Paper component="section" aria-labelledby="demo-accounts-heading" sx={{ p: 2 }}>
              <Typography id="demo-accounts-heading" variant="h2" component="h2" sx={{ fontSize: '1.1rem' }}>
                Demo accounts
              </Typography>
              <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
                Choose one to fill in the form
                {demoAccounts.data.password ? (
                  <>
                    {' '}
                    (password <Box component="code">{demoAccounts.data.password}</Box>)
                  </>
                ) : null}
                .
              </Typography>
              <List dense aria-label="Demo accounts">
                {demoAccounts.data.accounts.map((account) => (
                  <ListItem key={account.email} disablePadding>
                    <ListItemButton
                      onClick={() =>
                        void setValues({ email: account.email, password: demoAccounts.data?.password ?? '' })
                      }
                    >
                      <ListItemText primary={`${account.name} — ${account.email}`} secondary={account.description} />
                    </ListItemButton>
                  </ListItem>
                ))}
              </List>
            </Paper>
          ) : null}
          {demoAccounts.error ? <Alert severity="info">Demo accounts could not be listed.</Alert> : null}
        </Stack>
      )}
    </Formik>
  );
}
