import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { MeasuresRequest, NightDemandRequest, SeasonRequest } from '../../api/types';
import { measurePlanKeys, seasonKeys } from '../../api/query-keys';

/**
 * Season results are computed on request and stored nowhere: POST reads cached like queries.
 * Everything sits under 'season' so that a change of prices, climate or calendar refreshes it.
 */

export const houseSeasonQueryOptions = (houseId: number, request: SeasonRequest) =>
  queryOptions({
    queryKey: seasonKeys.estimate(houseId, request),
    queryFn: ({ signal }) =>
      unwrap(client.POST('/api/houses/{houseId}/season', { params: { path: { houseId } }, body: request, signal })),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

export const nightDemandQueryOptions = (houseId: number, request: NightDemandRequest) =>
  queryOptions({
    queryKey: seasonKeys.night(houseId, request),
    queryFn: ({ signal }) =>
      unwrap(
        client.POST('/api/houses/{houseId}/night-demand', { params: { path: { houseId } }, body: request, signal }),
      ),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

export const productionCalendarQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: seasonKeys.calendar(houseId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/houses/{houseId}/calendar', { params: { path: { houseId } }, signal })),
  });

/** Each measure re-runs the season, so the comparison is cached per list of measures and costs. */
export const measuresQueryOptions = (houseId: number, request: MeasuresRequest) =>
  queryOptions({
    queryKey: seasonKeys.measures(houseId, request),
    queryFn: ({ signal }) =>
      unwrap(client.POST('/api/houses/{houseId}/measures', { params: { path: { houseId } }, body: request, signal })),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

/** The measures and costs kept with the house (empty at version 0 before the first save). */
export const measurePlanQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: measurePlanKeys.house(houseId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/houses/{houseId}/measure-plan', { params: { path: { houseId } }, signal })),
  });
