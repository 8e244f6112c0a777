import { Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { ErrorAlert } from '../../../components/feedback';
import { farmMembersQueryOptions } from '../queries';
import { InviteForm } from './invite-form';
import { MembersTable } from './members-table';
import { PendingInvitations } from './pending-invitations';

export function MembersSection({
  farmId,
  canManage,
  currentUserId,
  onLeftFarm,
}: {
  farmId: number;
  canManage: boolean;
  currentUserId?: number;
  onLeftFarm?: () => void;
}) {
  const members = useQuery(farmMembersQueryOptions(farmId));
  return (
    <Paper component="section" aria-labelledby="members-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="members-heading" variant="h2">
          Members
        </Typography>
        <Typography variant="body2" color="text.secondary">
          {canManage
            ? 'Invite people by e-mail (with or without a Thermbay account), choose what each may do, or remove them.'
            : 'The people who share this farm. Only its owners can change who is a member.'}
        </Typography>
        {canManage ? <InviteForm farmId={farmId} /> : null}
        {canManage ? <PendingInvitations farmId={farmId} /> : null}
        <ErrorAlert error={members.error} title="Members could not be loaded" />
        <MembersTable
          farmId={farmId}
          members={members.data ?? []}
          loading={members.isPending}
          canManage={canManage}
          currentUserId={currentUserId}
          onLeftFarm={onLeftFarm}
        />
      </Stack>
    </Paper>
  );
}
