import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Farm } from '../../api/types';
import { farmKeys } from '../../api/query-keys';

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
