import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { TemperatureLog, TemperatureLogDetail } from '../../api/types';
import { temperatureLogKeys } from '../../api/query-keys';

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
