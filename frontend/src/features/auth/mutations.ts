import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, tokenStorage } from '../../api/client';
import type {
  AuthResponse,
  ChangePasswordRequest,
  LoginRequest,
  PasswordResetRequest,
  RegisterRequest,
  ServerMessage,
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
    mutationFn: (body: LoginRequest) => api.post<AuthResponse>('/api/auth/login', body),
    onSuccess: onSignedIn,
  });
}

export function useRegister() {
  const onSignedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: RegisterRequest) => api.post<AuthResponse>('/api/auth/register', body),
    onSuccess: onSignedIn,
  });
}

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      try {
        await api.post<void>('/api/auth/logout');
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
    mutationFn: (body: ChangePasswordRequest) => api.post<AuthResponse>('/api/auth/password', body),
    onSuccess: (response) => {
      tokenStorage.set(response.accessToken);
      queryClient.setQueryData(authKeys.me(), response.user);
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) => api.post<ServerMessage>('/api/auth/password-reset/request', { email }),
  });
}

export function useResetPassword() {
  const onSignedIn = useSignedIn();
  return useMutation({
    mutationFn: (body: PasswordResetRequest) => api.post<AuthResponse>('/api/auth/password-reset', body),
    onSuccess: onSignedIn,
  });
}
