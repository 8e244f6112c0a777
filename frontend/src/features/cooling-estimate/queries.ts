import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { CoolingConditions, CoolingSite, HouseSpec, PartialCoolingConditions } from '../../api/types';
import { coolingEstimateKeys } from '../../api/query-keys';

/**
 * Keys: ['estimates', 'cooling', houseId, 'stored', storedVersion, conditions] for the stored
 * house (its updatedAt makes a save refetch) and ['estimates', 'cooling', houseId, 'edited',
 * { spec, site, conditions }] for unsaved edits.
 */

/** Keep the previous result on screen while the next computes, but never another house's. */
const sameHouse = (houseId: number, previousKey: readonly unknown[] | undefined) => previousKey?.[2] === houseId;

export const storedCoolingEstimateQueryOptions = (
  houseId: number,
  storedVersion: string,
  conditions: PartialCoolingConditions,
) =>
  queryOptions({
    queryKey: coolingEstimateKeys.stored(houseId, storedVersion, conditions),
    queryFn: ({ signal }) =>
      unwrap(
        client.POST('/api/houses/{houseId}/cooling', { params: { path: { houseId } }, body: { conditions }, signal }),
      ),
    placeholderData: (previous, previousQuery) => (sameHouse(houseId, previousQuery?.queryKey) ? previous : undefined),
    // The farm's climate may have changed on the farm page: ask again whenever the panel mounts.
    staleTime: 0,
  });

export const editedCoolingEstimateQueryOptions = (
  houseId: number,
  spec: HouseSpec,
  site: CoolingSite,
  conditions: CoolingConditions,
) =>
  queryOptions({
    queryKey: coolingEstimateKeys.edited(houseId, spec, site, conditions),
    queryFn: ({ signal }) =>
      unwrap(client.POST('/api/estimates/cooling', { body: { house: spec, site, conditions }, signal })),
    placeholderData: (previous, previousQuery) => (sameHouse(houseId, previousQuery?.queryKey) ? previous : undefined),
  });
