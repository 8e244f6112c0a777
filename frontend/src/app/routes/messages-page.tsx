import { Stack, Typography } from '@mui/material';
import { PageTitle } from '../../components/page-title';
import { useQuery } from '@tanstack/react-query';
import { ErrorAlert, LoadingState } from '../../components/feedback';
import { inboxQueryOptions, MessageList } from '../../features/mail';

export default function MessagesPage() {
  const inbox = useQuery(inboxQueryOptions());
  return (
    <Stack spacing={2}>
      <PageTitle title={'Messages'} />
      <Typography variant="h1">Messages</Typography>
      <Typography color="text.secondary">
        E-mails the app sent to your address through its local mail server, newest first.
      </Typography>
      <ErrorAlert error={inbox.error} title="Your messages could not be loaded" />
      {inbox.isPending ? <LoadingState /> : null}
      {inbox.data ? <MessageList messages={inbox.data} emptyText="No messages for you yet." /> : null}
    </Stack>
  );
}
