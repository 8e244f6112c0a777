import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type {
  MeasureComparison,
  MeasurePlan,
  MeasuresRequest,
  HouseNightDemand,
  HouseSeasonEstimate,
  NightDemandRequest,
  ProductionCalendar,
  SeasonRequest,
} from '../../api/types';
import { measurePlanKeys, seasonKeys } from '../../api/query-keys';

/**
 * Season results are computed on request and stored nowhere: POST reads cached like queries.
 * Everything sits under 'season' so that a change of prices, climate or calendar refreshes it.
 */

export const houseSeasonQueryOptions = (houseId: number, request: SeasonRequest) =>
  queryOptions({
    queryKey: seasonKeys.estimate(houseId, request),
    queryFn: ({ signal }) => api.post<HouseSeasonEstimate>(`/api/houses/${houseId}/season`, request, { signal }),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

export const nightDemandQueryOptions = (houseId: number, request: NightDemandRequest) =>
  queryOptions({
    queryKey: seasonKeys.night(houseId, request),
    queryFn: ({ signal }) => api.post<HouseNightDemand>(`/api/houses/${houseId}/night-demand`, request, { signal }),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

export const productionCalendarQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: seasonKeys.calendar(houseId),
    queryFn: ({ signal }) => api.get<ProductionCalendar>(`/api/houses/${houseId}/calendar`, { signal }),
  });

/** Each measure re-runs the season, so the comparison is cached per list of measures and costs. */
export const measuresQueryOptions = (houseId: number, request: MeasuresRequest) =>
  queryOptions({
    queryKey: seasonKeys.measures(houseId, request),
    queryFn: ({ signal }) => api.post<MeasureComparison>(`/api/houses/${houseId}/measures`, request, { signal }),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

/** The measures and costs kept with the house (empty at version 0 before the first save). */
export const measurePlanQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: measurePlanKeys.house(houseId),
    queryFn: ({ signal }) => api.get<MeasurePlan>(`/api/houses/${houseId}/measure-plan`, { signal }),
  });
