import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { UpdateUserRequest, User } from '../../api/types';
import { userKeys } from '../../api/query-keys';

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, body }: { userId: number; body: UpdateUserRequest }) =>
      unwrap(client.PATCH('/api/users/{id}', { params: { path: { id: userId } }, body })),
    onSuccess: (user) => {
      queryClient.setQueryData<User[]>(userKeys.lists(), (users) =>
        users?.map((existing) => (existing.id === user.id ? user : existing)),
      );
    },
  });
}

export function useDeleteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => unwrap(client.DELETE('/api/users/{id}', { params: { path: { id: userId } } })),
    onSuccess: (_result, userId) => {
      queryClient.setQueryData<User[]>(userKeys.lists(), (users) => users?.filter((user) => user.id !== userId));
    },
  });
}
