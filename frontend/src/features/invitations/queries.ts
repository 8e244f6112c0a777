import { queryOptions, useMutation } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { AcceptedInvitation, AuthResponse, InvitationPreview, InvitedSignUpRequest } from '../../api/types';
import { invitationKeys } from '../../api/query-keys';

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: ({ signal }) => api.get<InvitationPreview>(`/api/invitations/${encodeURIComponent(token)}`, { signal }),
    retry: false,
  });

export function useInvitedSignUp(token: string, onSignedIn: (response: AuthResponse) => void) {
  return useMutation({
    mutationFn: (body: InvitedSignUpRequest) =>
      api.post<AuthResponse>(`/api/invitations/${encodeURIComponent(token)}/sign-up`, body),
    onSuccess: onSignedIn,
  });
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: () => api.post<AcceptedInvitation>(`/api/invitations/${encodeURIComponent(token)}/accept`),
  });
}
