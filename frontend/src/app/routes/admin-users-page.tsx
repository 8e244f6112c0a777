import { Alert, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { usersListQueryOptions, UsersTable } from '../../features/users';
import { useCurrentUser } from '../session';
import { PageTitle } from '../../components/page-title';

export default function AdminUsersPage() {
  const currentUser = useCurrentUser();
  const isAdmin = currentUser.data?.siteRole === 'admin';
  const users = useQuery({ ...usersListQueryOptions(), enabled: isAdmin });

  if (!currentUser.data) return <LoadingState />;
  return (
    <Stack spacing={2}>
      <PageTitle title={'Users'} />
      <Typography variant="h1">Users</Typography>
      {isAdmin ? (
        <>
          <ErrorAlert error={users.error} title="Users could not be loaded" />
          <UsersTable users={users.data ?? []} currentUserId={currentUser.data.id} loading={users.isPending} />
        </>
      ) : (
        <Alert severity="warning">Only site administrators can manage user accounts.</Alert>
      )}
    </Stack>
  );
}
