import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { userKeys } from '../../api/query-keys';

export const usersListQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.lists(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/users', { signal })),
  });
