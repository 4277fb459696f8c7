import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** One message kept by the local fake SMTP server (GET /api/dev/outbox, development only). */
export interface OutboxMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Newest first; the server answers 404 when it runs in production mode. */
export const outboxQuery = queryOptions({
  queryKey: ['dev', 'outbox'],
  queryFn: () => api.get<OutboxMessage[]>('/dev/outbox'),
  staleTime: 0,
});
