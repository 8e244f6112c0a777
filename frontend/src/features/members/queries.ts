import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmMember, Invitation } from '../../api/types';
import { memberKeys } from '../../api/query-keys';

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
