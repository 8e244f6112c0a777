import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { houseKeys } from '../../api/query-keys';

export const farmHousesQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: houseKeys.list(farmId),
    queryFn: ({ signal }) => unwrap(client.GET('/api/farms/{farmId}/houses', { params: { path: { farmId } }, signal })),
  });

export const houseDetailQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: houseKeys.detail(houseId),
    queryFn: ({ signal }) => unwrap(client.GET('/api/houses/{houseId}', { params: { path: { houseId } }, signal })),
  });
