import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useSyncExternalStore } from 'react';
import { tokenStorage } from '../api/client';
import type { User } from '../api/types';
import { currentUserQueryOptions } from '../features/auth';

/** Whether a token is stored; re-renders when sign-in, sign-out or a 401 changes it. */
export function useAccessToken(): string | null {
  return useSyncExternalStore(tokenStorage.subscribe, tokenStorage.get, () => null);
}

export function useCurrentUser() {
  const token = useAccessToken();
  return useQuery({ ...currentUserQueryOptions(), enabled: Boolean(token) });
}

/** Writes an updated user (e.g. a new unit preference) into the current-user cache. */
export function useSetCurrentUser(): (user: User) => void {
  const queryClient = useQueryClient();
  return useCallback((user: User) => queryClient.setQueryData(currentUserQueryOptions().queryKey, user), [queryClient]);
}
