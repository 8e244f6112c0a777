import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Outbox, ReceivedMail } from '../../api/types';
import { mailKeys } from '../../api/query-keys';

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.outbox(),
    queryFn: ({ signal }) => api.get<Outbox>('/api/mail/outbox', { signal }),
  });

export const inboxQueryOptions = () =>
  queryOptions({
    queryKey: mailKeys.inbox(),
    queryFn: ({ signal }) => api.get<ReceivedMail[]>('/api/mail/inbox', { signal }),
  });

export const attachmentPath = (mailId: number, attachmentId: number) =>
  `/api/mail/messages/${mailId}/attachments/${attachmentId}`;
