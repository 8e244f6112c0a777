import { Alert, Button, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { InvitationSent } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { useResendInvitation, useRevokeInvitation } from '../mutations';
import { pendingInvitationsQueryOptions } from '../queries';
import { ROLE_LABELS } from '../schemas';
import { InvitationOutcome } from './invite-form';

export function PendingInvitations({ farmId }: { farmId: number }) {
  const invitations = useQuery(pendingInvitationsQueryOptions(farmId));
  const resend = useResendInvitation(farmId);
  const revoke = useRevokeInvitation(farmId);
  const [resent, setResent] = useState<InvitationSent | null>(null);
  if (invitations.data?.length === 0) return null;
  return (
    <Stack spacing={1} aria-label="Pending invitations">
      <Typography variant="h3" sx={{ fontSize: '1.1rem', fontWeight: 600 }}>
        Pending invitations
      </Typography>
      <ErrorAlert error={invitations.error ?? resend.error ?? revoke.error} />
      {resent ? <InvitationOutcome sent={resent} /> : null}
      <Table size="small">
        <TableHead>
          <TableRow>
            <TableCell>E-mail</TableCell>
            <TableCell>Role</TableCell>
            <TableCell>Link works until</TableCell>
            <TableCell align="right">Actions</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {(invitations.data ?? []).map((invitation) => (
            <TableRow key={invitation.id}>
              <TableCell>{invitation.email}</TableCell>
              <TableCell>{ROLE_LABELS[invitation.role]}</TableCell>
              <TableCell>
                {invitation.expired ? (
                  <Alert severity="warning" sx={{ py: 0 }}>
                    expired
                  </Alert>
                ) : (
                  new Date(invitation.expiresAt).toLocaleString()
                )}
              </TableCell>
              <TableCell align="right">
                <Button
                  size="small"
                  disabled={resend.isPending}
                  onClick={() => resend.mutate(invitation.id, { onSuccess: setResent })}
                >
                  Resend
                </Button>
                <Button
                  size="small"
                  color="error"
                  disabled={revoke.isPending}
                  onClick={() => revoke.mutate(invitation.id)}
                  aria-label={`Revoke the invitation for ${invitation.email}`}
                >
                  Revoke
                </Button>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Stack>
  );
}
