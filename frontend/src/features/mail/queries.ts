import { queryOptions } from '@tanstack/react-query';
import { client, downloadFile, unwrap } from '../../api/client';
import { mailKeys } from '../../api/query-keys';

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.outbox(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/mail/outbox', { signal })),
  });

export const inboxQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.inbox(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/mail/inbox', { signal })),
  });

/** An attachment as a file, through the client (token, errors as ApiError). */
export const downloadAttachment = (mailId: number, attachmentId: number, fallbackFileName: string) =>
  downloadFile(
    client.GET('/api/mail/messages/{mailId}/attachments/{attachmentId}', {
      params: { path: { mailId, attachmentId } },
      parseAs: 'blob',
    }),
    fallbackFileName,
  );
