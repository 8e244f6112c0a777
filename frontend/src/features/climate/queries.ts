import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { climateKeys } from '../../api/query-keys';

export const farmClimateQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: climateKeys.farm(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/climate', { params: { path: { farmId } }, signal })),
  });
