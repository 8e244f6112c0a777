import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { SideBySideRequest } from '../../api/types';
import { alternativeKeys } from '../../api/query-keys';

/**
 * Keys: ['alternatives', 'list', houseId] and ['alternatives', 'side-by-side', houseId, version,
 * request]. `version` is the house's updatedAt, so a saved house edit recomputes every column.
 */

export const houseAlternativesQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: alternativeKeys.list(houseId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/houses/{houseId}/alternatives', { params: { path: { houseId } }, signal })),
    // each alternative is read against the house as it is now: ask again on every visit
    staleTime: 0,
  });

export const sideBySideQueryOptions = (houseId: number, version: string, request: SideBySideRequest) =>
  queryOptions({
    queryKey: alternativeKeys.sideBySide(houseId, version, request),
    queryFn: ({ signal }) =>
      unwrap(
        client.POST('/api/houses/{houseId}/side-by-side', { params: { path: { houseId } }, body: request, signal }),
      ),
    // the farm's climate or prices may have changed elsewhere: recompute on every visit
    staleTime: 0,
  });
