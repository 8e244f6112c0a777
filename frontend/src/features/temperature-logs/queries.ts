import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { temperatureLogKeys } from '../../api/query-keys';

export const farmTemperatureLogsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: temperatureLogKeys.farm(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/temperature-logs', { params: { path: { farmId } }, signal })),
  });

export const temperatureLogDetailQueryOptions = (logId: number) =>
  queryOptions({
    queryKey: temperatureLogKeys.detail(logId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/temperature-logs/{logId}', { params: { path: { logId } }, signal })),
  });
