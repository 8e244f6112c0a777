import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Alternative, SideBySide, SideBySideRequest } from '../../api/types';
import { alternativeKeys } from '../../api/query-keys';

/**
 * Keys: ['alternatives', 'list', houseId] and ['alternatives', 'side-by-side', houseId, version,
 * request]. `version` is the house's updatedAt, so a saved house edit recomputes every column.
 */

export const houseAlternativesQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: alternativeKeys.list(houseId),
    queryFn: ({ signal }) => api.get<Alternative[]>(`/api/houses/${houseId}/alternatives`, { signal }),
    // each alternative is read against the house as it is now: ask again on every visit
    staleTime: 0,
  });

export const sideBySideQueryOptions = (houseId: number, version: string, request: SideBySideRequest) =>
  queryOptions({
    queryKey: alternativeKeys.sideBySide(houseId, version, request),
    queryFn: ({ signal }) => api.post<SideBySide>(`/api/houses/${houseId}/side-by-side`, request, { signal }),
    // the farm's climate or prices may have changed elsewhere: recompute on every visit
    staleTime: 0,
  });
