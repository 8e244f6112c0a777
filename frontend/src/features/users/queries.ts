import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { User } from '../../api/types';

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
};

export const usersListQueryOptions = () =>
  queryOptions({
    queryKey: userKeys.lists(),
    queryFn: ({ signal }) => api.get<User[]>('/api/users', { signal }),
  });
