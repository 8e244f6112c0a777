import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { TemperatureLog, TemperatureLogDetail } from '../../api/types';

export const temperatureLogKeys = {
  all: ['temperature-logs'] as const,
  farm: (farmId: number) => [...temperatureLogKeys.all, 'farm', farmId] as const,
  detail: (logId: number) => [...temperatureLogKeys.all, 'detail', logId] as const,
};

export const farmTemperatureLogsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: temperatureLogKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<TemperatureLog[]>(`/api/farms/${farmId}/temperature-logs`, { signal }),
  });

export const temperatureLogDetailQueryOptions = (logId: number) =>
  queryOptions({
    queryKey: temperatureLogKeys.detail(logId),
    queryFn: ({ signal }) => api.get<TemperatureLogDetail>(`/api/temperature-logs/${logId}`, { signal }),
  });
