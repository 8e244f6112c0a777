import { useMutation } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { UpdateMeRequest, User } from '../../api/types';

/**
 * PATCH /api/users/me. The caller says what to do with the updated user (the app writes it into
 * the current-user cache, which re-renders every number in the new unit system).
 */
export function useUpdateMe(options: { onSuccess?: (user: User) => void } = {}) {
  return useMutation({
    mutationFn: (body: UpdateMeRequest) => unwrap(client.PATCH('/api/users/me', { body })),
    onSuccess: (user) => options.onSuccess?.(user),
  });
}
