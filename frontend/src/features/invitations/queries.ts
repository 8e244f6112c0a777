import { queryOptions, useMutation } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { AuthResponse, InvitedSignUpRequest } from '../../api/types';
import { invitationKeys } from '../../api/query-keys';

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: ({ signal }) => unwrap(client.GET('/api/invitations/{token}', { params: { path: { token } }, signal })),
    retry: false,
  });

export function useInvitedSignUp(token: string, onSignedIn: (response: AuthResponse) => void) {
  return useMutation({
    mutationFn: (body: InvitedSignUpRequest) =>
      unwrap(client.POST('/api/invitations/{token}/sign-up', { params: { path: { token } }, body })),
    onSuccess: onSignedIn,
  });
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: () => unwrap(client.POST('/api/invitations/{token}/accept', { params: { path: { token } } })),
  });
}
