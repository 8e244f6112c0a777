import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, tokenStorage, unwrap } from '../../api/client';
import type {
  AuthResponse,
  ChangePasswordRequest,
  LoginRequest,
  PasswordResetRequest,
  RegisterRequest,
} from '../../api/types';
import { authKeys } from '../../api/query-keys';

export function useSignedIn() {
  const queryClient = useQueryClient();
  return (response: AuthResponse) => {
    // Drop anything cached for a previous user before the new token takes effect.
    queryClient.clear();
    tokenStorage.set(response.accessToken);
    queryClient.setQueryData(authKeys.me(), response.user);
  };
}

export function useLogin() {
  const onSignedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: LoginRequest) => unwrap(client.POST('/api/auth/login', { body })),
    onSuccess: onSignedIn,
  });
}

export function useRegister() {
  const onSignedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: RegisterRequest) => unwrap(client.POST('/api/auth/register', { body })),
    onSuccess: onSignedIn,
  });
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      try {
        await unwrap(client.POST('/api/auth/logout'));
      } catch {
        // Signing out locally must work even when the server cannot be reached.
      }
    },
    onSettled: () => {
      tokenStorage.clear();
      queryClient.clear();
    },
  });
}

/** Other sessions end; this browser keeps going with the token the answer carries. */
export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ChangePasswordRequest) => unwrap(client.POST('/api/auth/password', { body })),
    onSuccess: (response) => {
      tokenStorage.set(response.accessToken);
      queryClient.setQueryData(authKeys.me(), response.user);
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) => unwrap(client.POST('/api/auth/password-reset/request', { body: { email } })),
  });
}

export function useResetPassword() {
  const onSignedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: PasswordResetRequest) => unwrap(client.POST('/api/auth/password-reset', { body })),
    onSuccess: onSignedIn,
  });
}
