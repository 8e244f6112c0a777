import { SendIcon } from '../../../components/icons';
import { Alert, Button, Stack } from '@mui/material';
import { Form, Formik } from 'formik';
import { useState } from 'react';
import type { InvitationSent } from '../../../api/types';
import { FormSelectField, FormTextField } from '../../../components/form-fields';
import { memberErrorMessage } from '../member-errors';
import { useInvite } from '../mutations';
import { INVITABLE_ROLES, inviteSchema, ROLE_LABELS, type InviteFormValues } from '../schemas';

const roleOptions = INVITABLE_ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

/** How an invitation's e-mail went, in words for the owner. */
export function InvitationOutcome({ sent }: { sent: InvitationSent }) {
  if (sent.mail.status === 'failed') {
    return (
      <Alert severity="warning" role="alert">
        The invitation for {sent.email} is saved, but its e-mail could not be sent: {sent.mail.error}. Try “Resend”
        below once mail works.
      </Alert>
    );
  }
  return (
    <Alert severity="success" role="status">
      Invitation sent to {sent.email}. The link works once, for 7 days.
    </Alert>
  );
}

export function InviteForm({ farmId }: { farmId: number }) {
  const invite = useInvite(farmId);
  const [sent, setSent] = useState<InvitationSent | null>(null);
  const initialValues: InviteFormValues = { email: '', role: 'grower' };
  const problem = memberErrorMessage(invite.error);
  return (
    <Formik<InviteFormValues>
      initialValues={initialValues}
      validationSchema={inviteSchema}
      onSubmit={async (values, helpers) => {
        setSent(null);
        try {
          setSent(await invite.mutateAsync({ email: values.email.trim(), role: values.role }));
          helpers.resetForm();
        } catch {
          // shown below through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Invite someone">
          <Stack spacing={1.5}>
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'flex-start' } }}>
              <FormTextField name="email" label="E-mail address to invite" type="email" sx={{ flex: 2 }} />
              <FormSelectField name="role" label="Role" options={roleOptions} sx={{ flex: 1, minWidth: 140 }} />
              <Button
                type="submit"
                variant="contained"
                startIcon={<SendIcon />}
                disabled={isSubmitting}
                sx={{ whiteSpace: 'nowrap', minWidth: 140 }}
              >
                Invite
              </Button>
            </Stack>
            {problem ? (
              <Alert severity="error" role="alert">
                {problem}
              </Alert>
            ) : null}
            {sent && !problem ? <InvitationOutcome sent={sent} /> : null}
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
