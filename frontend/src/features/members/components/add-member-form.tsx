import PersonAddIcon from '@mui/icons-material/PersonAddAlt1';
import { Alert, Button, Stack } from '@mui/material';
import { Form, Formik } from 'formik';
import { useState } from 'react';
import { FormSelectField, FormTextField } from '../../../components/form-fields';
import { memberErrorMessage } from '../member-errors';
import { useAddMember } from '../mutations';
import { addMemberSchema, FARM_ROLES, ROLE_LABELS, type AddMemberFormValues } from '../schemas';

const roleOptions = FARM_ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function AddMemberForm({ farmId }: { farmId: number }) {
  const addMember = useAddMember(farmId);
  const [addedEmail, setAddedEmail] = useState<string | null>(null);
  const initialValues: AddMemberFormValues = { email: '', role: 'grower' };
  const problem = memberErrorMessage(addMember.error);
  return (
    <Formik<AddMemberFormValues>
      initialValues={initialValues}
      validationSchema={addMemberSchema}
      onSubmit={async (values, helpers) => {
        setAddedEmail(null);
        try {
          const member = await addMember.mutateAsync({ email: values.email.trim(), role: values.role });
          setAddedEmail(member.email);
          helpers.resetForm();
        } catch {
          // shown below through the mutation's error
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate aria-label="Add a member">
          <Stack spacing={1.5}>
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'flex-start' } }}>
              <FormTextField name="email" label="E-mail of a registered user" type="email" sx={{ flex: 2 }} />
              <FormSelectField name="role" label="Role" options={roleOptions} sx={{ flex: 1, minWidth: 140 }} />
              <Button
                type="submit"
                variant="contained"
                startIcon={<PersonAddIcon />}
                disabled={isSubmitting}
                sx={{ whiteSpace: 'nowrap', minWidth: 140 }}
              >
                Add member
              </Button>
            </Stack>
            {problem ? (
              <Alert severity="error" role="alert">
                {problem}
              </Alert>
            ) : null}
            {addedEmail && !problem ? (
              <Alert severity="success" role="status">
                {addedEmail} is now a member of this farm.
              </Alert>
            ) : null}
          </Stack>
        </Form>
      )}
    </Formik>
  );
}
