import { Stack, Typography } from '@mui/material';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { ChangePasswordForm } from '../../features/auth';
import { SettingsForm } from '../../features/settings';
import { useCurrentUser, useSetCurrentUser } from '../session';
import { PageTitle } from '../../components/page-title';

export default function SettingsPage() {
  const currentUser = useCurrentUser();
  const setCurrentUser = useSetCurrentUser();
  if (currentUser.isError) return <ErrorAlert error={currentUser.error} />;
  if (!currentUser.data) return <LoadingState />;
  return (
    <Stack spacing={2}>
      <PageTitle title={'Settings'} />
      <Typography variant="h1">Settings</Typography>
      <SettingsForm user={currentUser.data} onUpdated={setCurrentUser} />
      <ChangePasswordForm />
    </Stack>
  );
}
