import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { House } from '../../api/types';
import { houseKeys } from '../../api/query-keys';

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
