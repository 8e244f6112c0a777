import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { HeatingConditions, HouseHeatingEstimate, HouseSpec, PartialHeatingConditions } from '../../api/types';
import { heatingEstimateKeys } from '../../api/query-keys';

/**
 * Keys: ['estimates', 'heating', houseId, 'stored', storedVersion, conditions] for the stored
 * house (its updatedAt makes a save refetch) and ['estimates', 'heating', houseId, 'edited',
 * { spec, conditions }] for unsaved edits. Query keys hash objects with sorted keys, so equal
 * conditions share a cache entry.
 */

/** Keep the previous result on screen while the next computes, but never another house's. */
const sameHouse = (houseId: number, previousKey: readonly unknown[] | undefined) => previousKey?.[2] === houseId;

export const storedHeatingEstimateQueryOptions = (
  houseId: number,
  storedVersion: string,
  conditions: PartialHeatingConditions,
) =>
  queryOptions({
    queryKey: heatingEstimateKeys.stored(houseId, storedVersion, conditions),
    queryFn: ({ signal }) =>
      unwrap(
        client.POST('/api/houses/{houseId}/estimate', { params: { path: { houseId } }, body: { conditions }, signal }),
      ),
    placeholderData: (previous, previousQuery) => (sameHouse(houseId, previousQuery?.queryKey) ? previous : undefined),
    // The farm's climate may have changed on the farm page: ask again whenever the panel mounts.
    staleTime: 0,
  });

export const editedHeatingEstimateQueryOptions = (houseId: number, spec: HouseSpec, conditions: HeatingConditions) =>
  queryOptions({
    queryKey: heatingEstimateKeys.edited(houseId, spec, conditions),
    queryFn: ({ signal }) => unwrap(client.POST('/api/estimates', { body: { house: spec, conditions }, signal })),
    placeholderData: (previous, previousQuery) => (sameHouse(houseId, previousQuery?.queryKey) ? previous : undefined),
  });

/**
 * Conditions for the stateless route, taken from what the per-house route used (the farm's
 * climate and elevation, any what-if values). The inside temperature is left out unless the user
 * stated it, so an edited night setpoint is what the estimate holds.
 */
export function statelessHeatingConditions(stored: HouseHeatingEstimate): HeatingConditions {
  const { designOutdoorC, elevationM, insideRelativeHumidityPct, insideC, curtainClosed } = stored.conditionsUsed;
  return {
    designOutdoorC,
    elevationM,
    insideRelativeHumidityPct,
    curtainClosed,
    ...(stored.conditionsSource.insideC === 'request' ? { insideC } : {}),
  };
}
