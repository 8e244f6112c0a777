import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Farm } from '../../api/types';

export const farmKeys = {
  all: ['farms'] as const,
  lists: () => [...farmKeys.all, 'list'] as const,
  details: () => [...farmKeys.all, 'detail'] as const,
  detail: (farmId: number) => [...farmKeys.details(), farmId] as const,
};

export const farmsListQueryOptions = () =>
  queryOptions({
    queryKey: farmKeys.lists(),
    queryFn: ({ signal }) => api.get<Farm[]>('/api/farms', { signal }),
  });

export const farmDetailQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: farmKeys.detail(farmId),
    queryFn: ({ signal }) => api.get<Farm>(`/api/farms/${farmId}`, { signal }),
  });
