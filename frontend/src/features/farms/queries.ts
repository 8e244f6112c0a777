import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { farmKeys } from '../../api/query-keys';

export const farmsListQueryOptions = () =>
  queryOptions({
    queryKey: farmKeys.lists(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/farms', { signal })),
  });

export const farmDetailQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: farmKeys.detail(farmId),
    queryFn: ({ signal }) => unwrap(client.GET('/api/farms/{farmId}', { params: { path: { farmId } }, signal })),
  });
