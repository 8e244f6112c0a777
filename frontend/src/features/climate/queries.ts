import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmClimate } from '../../api/types';
import { climateKeys } from '../../api/query-keys';

export const farmClimateQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: climateKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmClimate>(`/api/farms/${farmId}/climate`, { signal }),
  });
