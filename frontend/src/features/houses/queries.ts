import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { House } from '../../api/types';

export const houseKeys = {
  all: ['houses'] as const,
  lists: () => [...houseKeys.all, 'list'] as const,
  list: (farmId: number) => [...houseKeys.lists(), { farmId }] as const,
  details: () => [...houseKeys.all, 'detail'] as const,
  detail: (houseId: number) => [...houseKeys.details(), houseId] as const,
};

export const farmHousesQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: houseKeys.list(farmId),
    queryFn: ({ signal }) => api.get<House[]>(`/api/farms/${farmId}/houses`, { signal }),
  });

export const houseDetailQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: houseKeys.detail(houseId),
    queryFn: ({ signal }) => api.get<House>(`/api/houses/${houseId}`, { signal }),
  });
