/** GET /api/health — 200 when the database answers, 503 with status "error" / db "down" otherwise. */
export interface HealthResponse {
  status: 'ok' | 'error';
  db: 'up' | 'down';
  /** With the database up: journal events the read models have not applied yet, and failed catch-ups in a row. */
  projection?: { events: number; failedRuns: number };
}

/** GET /api/dev/outbox — one e-mail caught by the local fake SMTP server (development only). */
export interface OutboxMessage {
  id: string;
  /** ISO 8601 */
  receivedAt: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** POST /api/auth/password-reset/request answers 202 with a sentence to show. */
export interface MessageResponse {
  message: string;
}
