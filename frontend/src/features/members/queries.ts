import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmMember, Invitation } from '../../api/types';

export const memberKeys = {
  all: ['members'] as const,
  farm: (farmId: number) => [...memberKeys.all, 'farm', farmId] as const,
  invitations: (farmId: number) => [...memberKeys.all, 'invitations', farmId] as const,
};

export const farmMembersQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: memberKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmMember[]>(`/api/farms/${farmId}/members`, { signal }),
  });

export const pendingInvitationsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: memberKeys.invitations(farmId),
    queryFn: ({ signal }) => api.get<Invitation[]>(`/api/farms/${farmId}/invitations`, { signal }),
  });
