import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { CreateInvitationRequest, FarmMember, FarmRole, InvitationSent } from '../../api/types';
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
    mutationFn: (body: CreateInvitationRequest) => api.post<InvitationSent>(`/api/farms/${farmId}/invitations`, body),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useResendInvitation(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) =>
      api.post<InvitationSent>(`/api/farms/${farmId}/invitations/${invitationId}/resend`),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useRevokeInvitation(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => api.delete(`/api/farms/${farmId}/invitations/${invitationId}`),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: memberKeys.invitations(farmId) }),
  });
}

export function useChangeMemberRole(farmId: number) {
  const refresh = useRefreshMembers(farmId);
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: FarmRole }) =>
      api.patch<FarmMember>(`/api/farms/${farmId}/members/${userId}`, { role }),
    onSuccess: refresh,
  });
}

export function useRemoveMember(farmId: number) {
  const refresh = useRefreshMembers(farmId);
  return useMutation({
    mutationFn: (userId: number) => api.delete(`/api/farms/${farmId}/members/${userId}`),
    onSuccess: refresh,
  });
}
