import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { AddMemberRequest, FarmMember, FarmRole } from '../../api/types';
import { memberKeys } from './queries';

function useRefreshMembers(farmId: number) {
  const queryClient = useQueryClient();
  return () => {
    void queryClient.invalidateQueries({ queryKey: memberKeys.farm(farmId) });
    // A role change may change what the signed-in user may do on this farm.
    void queryClient.invalidateQueries({ queryKey: ['farms'] });
  };
}

export function useAddMember(farmId: number) {
  const refresh = useRefreshMembers(farmId);
  return useMutation({
    mutationFn: (body: AddMemberRequest) => api.post<FarmMember>(`/api/farms/${farmId}/members`, body),
    onSuccess: refresh,
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
