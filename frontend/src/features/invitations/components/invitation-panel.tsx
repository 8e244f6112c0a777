import { Alert, Button, Link, Stack, Typography } from '@mui/material';
import { PASSWORD_RULES, passwordRuleProblem } from '@thermbay/engine/vocabulary';
import { useQuery } from '@tanstack/react-query';
import { Form, Formik } from 'formik';
import { Link as RouterLink } from 'react-router-dom';
import * as yup from 'yup';
import type { AuthResponse, InvitationPreview } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { FormTextField } from '../../../components/form-fields';
import { invitationPreviewQueryOptions, useAcceptInvitation, useInvitedSignUp } from '../queries';

const ROLE_WORDS: Record<InvitationPreview['role'], string> = {
  owner: 'an owner',
  grower: 'a grower (edits houses and runs estimates)',
  adviser: 'an adviser (reads the farm, runs estimates and writes reports)',
  viewer: 'a viewer (reads the farm)',
};

interface Props {
  token: string;
  /** the signed-in user's e-mail, or null when signed out */
  signedInEmail: string | null;
  onSignedIn: (response: AuthResponse) => void;
  onJoined: (farmId: number) => void;
  /** where the sign-in page sends the visitor back to */
  signInPath: string;
  signInState: unknown;
}

function SignUpForm({
  token,
  preview,
  onSignedIn,
}: { token: string; preview: InvitationPreview } & Pick<Props, 'onSignedIn'>) {
  const signUp = useInvitedSignUp(token, onSignedIn);
  const schema = yup.object({
    name: yup.string().trim().max(120, 'At most 120 characters').required('Enter your name'),
    password: yup
      .string()
      .required('Choose a password')
      .test('password-rules', function check(value) {
        const problem = passwordRuleProblem(value ?? '', preview.email);
        return problem ? this.createError({ message: problem }) : true;
      }),
  });
  return (
    <Formik
      initialValues={{ name: '', password: '' }}
      validationSchema={schema}
      onSubmit={async (values) => {
        try {
          await signUp.mutateAsync({ name: values.name.trim(), password: values.password });
        } catch {
          // shown through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Create your account">
          <Stack spacing={2}>
            <Typography>
              Create your account for <strong>{preview.email}</strong> to join.
            </Typography>
            <FormTextField name="name" label="Your name" autoComplete="name" required />
            <FormTextField
              name="password"
              label="Choose a password"
              type="password"
              autoComplete="new-password"
              helperText={`At least ${PASSWORD_RULES.minLength} characters, not your e-mail address, not a common password`}
              required
            />
            <ErrorAlert error={signUp.error} title="The account was not created" />
            <Button type="submit" variant="contained" disabled={isSubmitting}>
              {isSubmitting ? 'Creating account…' : 'Create account and join'}
            </Button>
          </Stack>
        </Form>
      )}
    </Formik>
  );
}

/** Opening an invitation link: sign up, sign in, or accept, as the visitor's state needs. */
export function InvitationPanel({ token, signedInEmail, onSignedIn, onJoined, signInPath, signInState }: Props) {
  const preview = useQuery(invitationPreviewQueryOptions(token));
  const accept = useAcceptInvitation(token);
  if (preview.isPending) return <LoadingState />;
  if (preview.error) return <ErrorAlert error={preview.error} />;
  const invitation = preview.data;
  const wrongAccount = signedInEmail !== null && signedInEmail.toLowerCase() !== invitation.email;
  return (
    <Stack spacing={2}>
      <Typography variant="h1" component="h1">
        Join {invitation.farmName}
      </Typography>
      <Typography>
        {invitation.invitedByName ?? 'A farm owner'} invites {invitation.email} to {invitation.farmName} as{' '}
        {ROLE_WORDS[invitation.role]}. The link works until {new Date(invitation.expiresAt).toLocaleString()}.
      </Typography>
      {signedInEmail !== null && !wrongAccount ? (
        <>
          <ErrorAlert error={accept.error} />
          <Button
            variant="contained"
            disabled={accept.isPending}
            onClick={() => accept.mutate(undefined, { onSuccess: (joined) => onJoined(joined.farmId) })}
          >
            Accept and open the farm
          </Button>
        </>
      ) : null}
      {wrongAccount ? (
        <Alert severity="warning">
          You are signed in as {signedInEmail}, but this invitation is for {invitation.email}. Sign out and sign in with
          the invited address.
        </Alert>
      ) : null}
      {signedInEmail === null && invitation.accountExists ? (
        <Alert severity="info">
          An account already uses {invitation.email}.{' '}
          <Link component={RouterLink} to={signInPath} state={signInState}>
            Sign in to accept
          </Link>
          .
        </Alert>
      ) : null}
      {signedInEmail === null && !invitation.accountExists ? (
        <SignUpForm token={token} preview={invitation} onSignedIn={onSignedIn} />
      ) : null}
    </Stack>
  );
}
