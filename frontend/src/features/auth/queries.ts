import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { authKeys } from '../../api/query-keys';

export const currentUserQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/auth/me', { signal })),
    staleTime: 5 * 60_000,
  });

export const demoAccountsQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.demoAccounts(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/auth/demo-accounts', { signal })),
    staleTime: Infinity,
  });
