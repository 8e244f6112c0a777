import { Alert, Stack, Typography } from '@mui/material';
import { PageTitle } from '../../components/page-title';
import { useQuery } from '@tanstack/react-query';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { FailedSendList, MessageList, outboxQueryOptions } from '../../features/mail';
import { useCurrentUser } from '../session';

export default function AdminOutboxPage() {
  const currentUser = useCurrentUser();
  const isAdmin = currentUser.data?.siteRole === 'admin';
  const outbox = useQuery({ ...outboxQueryOptions(), enabled: isAdmin });

  if (!currentUser.data) return <LoadingState />;
  if (!isAdmin) return <Alert severity="warning">Only site administrators can read the outbox.</Alert>;
  return (
    <Stack spacing={2}>
      <PageTitle title={'Outbox'} />
      <Typography variant="h1">Outbox</Typography>
      <Typography color="text.secondary">
        Every message the app sent through its local mail server, newest first. Nothing here left this machine.
      </Typography>
      <ErrorAlert error={outbox.error} title="The outbox could not be loaded" />
      {outbox.isPending ? <LoadingState /> : null}
      {outbox.data && !outbox.data.localServer ? (
        <Alert severity="info">
          Mail goes to the SMTP server set in SMTP_URL, so messages are not kept here; failed sends still are.
        </Alert>
      ) : null}
      {outbox.data ? <FailedSendList sends={outbox.data.failedSends} /> : null}
      {outbox.data ? <MessageList messages={outbox.data.messages} emptyText="No messages yet." /> : null}
    </Stack>
  );
}
