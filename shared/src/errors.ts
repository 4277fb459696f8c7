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
