import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmClimate } from '../../api/types';

export const climateKeys = {
  all: ['climate'] as const,
  farm: (farmId: number) => [...climateKeys.all, 'farm', farmId] as const,
};

export const farmClimateQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: climateKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmClimate>(`/api/farms/${farmId}/climate`, { signal }),
  });
