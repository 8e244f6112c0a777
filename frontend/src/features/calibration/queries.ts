import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { calibrationKeys } from '../../api/query-keys';

export const fuelRecordsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: calibrationKeys.records(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/fuel-records', { params: { path: { farmId } }, signal })),
  });

/** Saved calibrations, newest first: the first is the one "as calibrated" estimates use. */
export const calibrationsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: calibrationKeys.calibrations(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/calibrations', { params: { path: { farmId } }, signal })),
  });
