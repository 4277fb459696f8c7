/** The one shape of every 4xx/5xx answer of the API. */
export interface ApiError {
  statusCode: number;
  /** Short name of the status, e.g. "Bad Request". */
  error: string;
  /** A sentence a person can read. */
  message: string;
  /** A stable machine-readable code for errors a client reacts to, e.g. "csrf_invalid", "last_owner". */
  code?: string;
  /** Per-field messages, keyed by the request field's name (dotted path for nested fields). */
  fieldErrors?: Record<string, string[]>;
  /** Quote this when reporting a problem; the server log has the details. */
  requestId?: string;
}

/**
 * The `code` values the API sends. Clients react to these, never to the message text:
 * csrf_invalid (refetch the token once and retry), token_invalid, last_owner, email_taken, rate_limited…
 */
export const API_ERROR_CODES = [
  'validation_failed',
  'invalid_json',
  'csrf_invalid',
  'unauthenticated',
  'wrong_credentials',
  'account_disabled',
  'forbidden',
  'not_found',
  'token_invalid',
  'email_taken',
  'last_owner',
  'already_member',
  'invite_email_mismatch',
  'self_lockout',
  'wrong_password',
  'rate_limited',
  'mail_failed',
  'db_unavailable',
  'idempotency_key_invalid',
  'idempotency_key_reused',
  'idempotency_key_in_use',
  'internal_error',
] as const;
export type ApiErrorCode = (typeof API_ERROR_CODES)[number];

/**
 * The request header that makes a journal write safe to repeat (draft-ietf-httpapi-idempotency-key-header):
 * the same key with the same body gets the first answer again and writes nothing.
 */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
