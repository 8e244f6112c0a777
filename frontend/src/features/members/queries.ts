import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmMember } from '../../api/types';

export const memberKeys = {
  all: ['members'] as const,
  farm: (farmId: number) => [...memberKeys.all, 'farm', farmId] as const,
};

export const farmMembersQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: memberKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmMember[]>(`/api/farms/${farmId}/members`, { signal }),
  });
