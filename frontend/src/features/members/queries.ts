import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { memberKeys } from '../../api/query-keys';

export const farmMembersQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: memberKeys.farm(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/members', { params: { path: { farmId } }, signal })),
  });

export const pendingInvitationsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: memberKeys.invitations(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/invitations', { params: { path: { farmId } }, signal })),
  });
