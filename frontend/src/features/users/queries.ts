import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { User } from '../../api/types';
import { userKeys } from '../../api/query-keys';

export const usersListQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.lists(),
    queryFn: ({ signal }) => api.get<User[]>('/api/users', { signal }),
  });
