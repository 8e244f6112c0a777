import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Calibration, FuelRecord } from '../../api/types';
import { calibrationKeys } from '../../api/query-keys';

export const fuelRecordsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: calibrationKeys.records(farmId),
    queryFn: ({ signal }) => api.get<FuelRecord[]>(`/api/farms/${farmId}/fuel-records`, { signal }),
  });

/** Saved calibrations, newest first: the first is the one "as calibrated" estimates use. */
export const calibrationsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: calibrationKeys.calibrations(farmId),
    queryFn: ({ signal }) => api.get<Calibration[]>(`/api/farms/${farmId}/calibrations`, { signal }),
  });
