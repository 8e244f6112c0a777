import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { DemoAccounts, User } from '../../api/types';
import { authKeys } from '../../api/query-keys';

export const currentUserQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => api.get<User>('/api/auth/me', { signal }),
    staleTime: 5 * 60_000,
  });

export const demoAccountsQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.demoAccounts(),
    queryFn: ({ signal }) => api.get<DemoAccounts>('/api/auth/demo-accounts', { signal }),
    staleTime: Infinity,
  });
