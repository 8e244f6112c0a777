import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { CreateInvitationRequest, FarmRole } from '../../api/types';
import { farmKeys, memberKeys } from '../../api/query-keys';

function useRefreshMembers(farmId: number) {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: memberKeys.farm(farmId) });
    // A role change may change what the signed-in user may do on this farm.
    void queryClient.invalidateQueries({ queryKey: farmKeys.all });
  };
}

export function useInvite(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) =>
      unwrap(client.POST('/api/farms/{farmId}/invitations', { params: { path: { farmId } }, body })),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useResendInvitation(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) =>
      unwrap(
        client.POST('/api/farms/{farmId}/invitations/{invitationId}/resend', {
          params: { path: { farmId, invitationId } },
        }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useRevokeInvitation(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) =>
      unwrap(
        client.DELETE('/api/farms/{farmId}/invitations/{invitationId}', { params: { path: { farmId, invitationId } } }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useChangeMemberRole(farmId: number) {
  const refresh = useRefreshMembers(farmId);
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: FarmRole }) =>
      unwrap(
        client.PATCH('/api/farms/{farmId}/members/{userId}', { params: { path: { farmId, userId } }, body: { role } }),
      ),
    onSuccess: refresh,
  });
}

export function useRemoveMember(farmId: number) {
  const refresh = useRefreshMembers(farmId);
  return useMutation({
    mutationFn: (userId: number) =>
      unwrap(client.DELETE('/api/farms/{farmId}/members/{userId}', { params: { path: { farmId, userId } } })),
    onSuccess: refresh,
  });
}
