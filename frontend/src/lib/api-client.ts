import { CSRF_HEADER, type ApiError } from '@shoalbook/shared';

/** Base path of the API; the built front end and the API share one origin. */
export const API_BASE = '/api';

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** An API answer other than 2xx, or no answer at all (statusCode 0), in the contract's error shape. */
export class ApiRequestError extends Error implements ApiError {
  readonly statusCode: number;
  readonly error: string;
  readonly code?: string;
  readonly fieldErrors?: Record<string, string[]>;
  readonly requestId?: string;

  constructor(body: ApiError) {
    super(body.message);
    this.name = 'ApiRequestError';
    this.statusCode = body.statusCode;
    this.error = body.error;
    this.code = body.code;
    this.fieldErrors = body.fieldErrors;
    this.requestId = body.requestId;
  }

  /** Messages the server gave for one request field (dotted path for nested fields). */
  messagesFor(field: string): string[] {
    return this.fieldErrors?.[field] ?? [];
  }
}

export interface RequestOptions {
  /** JSON body; serialised here. */
  body?: unknown;
  /**
   * The request signs someone in or out, so the session (and the CSRF token bound to it) changes:
   * a fresh token is fetched once it succeeds.
   */
  renewsSession?: boolean;
  signal?: AbortSignal;
  /** Extra request headers, e.g. the send queue's Idempotency-Key. */
  headers?: Record<string, string>;
}

/**
 * Keeps the last answers of chosen GET routes on the device, to answer them while there is no network
 * (see offline-reads.ts). API answers stay `no-store` for the browser's HTTP cache.
 */
export interface ReadCache {
  keeps(path: string): boolean;
  save(path: string, data: unknown): Promise<void>;
  /** The kept answer, or undefined. */
  load(path: string): Promise<unknown>;
}

type FetchLike = typeof fetch;

/**
 * The one HTTP client of the front end: same-origin fetch with the session cookie, the CSRF header
 * on every state-changing request (refetched once and retried when the server answers
 * 403 "csrf_invalid"), and every failure turned into an {@link ApiRequestError}.
 */
export class ApiClient {
  private csrfToken: Promise<string> | null = null;

  constructor(
    private readonly fetchImpl: FetchLike = (...args) => globalThis.fetch(...args),
    private readonly base = API_BASE,
  ) {}

  private readCache: ReadCache | null = null;

  /** Answer kept GET routes from the device when the server cannot be reached. */
  useReadCache(cache: ReadCache | null): void {
    this.readCache = cache;
  }

  async get<T>(path: string, options: Omit<RequestOptions, 'body'> = {}): Promise<T> {
    const cache = this.readCache?.keeps(path) ? this.readCache : null;
    if (!cache) return this.request<T>('GET', path, options);
    try {
      const data = await this.request<T>('GET', path, options);
      // Keeping a copy must never fail the read itself (storage full, private mode).
      await cache.save(path, data).catch(() => undefined);
      return data;
    } catch (error) {
      if (!isApiError(error, 0)) throw error;
      const kept = await cache.load(path).catch(() => undefined);
      if (kept === undefined) throw error;
      return kept as T;
    }
  }
  /** A GET of a paged list: its rows and the X-Total-Count the server sends beside them. */
  async getPage<T>(path: string): Promise<{ items: T[]; total: number }> {
    const response = await this.send('GET', path, {}, null);
    if (!response.ok) throw new ApiRequestError(await readError(response));
    const items = (await readBody(response)) as T[];
    const total = Number(response.headers.get('X-Total-Count') ?? items.length);
    return { items, total: Number.isFinite(total) ? total : items.length };
  }
  post<T>(path: string, body?: unknown, options: Omit<RequestOptions, 'body'> = {}): Promise<T> {
    return this.request<T>('POST', path, { ...options, body });
  }
  patch<T>(path: string, body?: unknown, options: Omit<RequestOptions, 'body'> = {}): Promise<T> {
    return this.request<T>('PATCH', path, { ...options, body });
  }
  delete<T = void>(path: string, options: Omit<RequestOptions, 'body'> = {}): Promise<T> {
    return this.request<T>('DELETE', path, options);
  }

  /** Fetch a CSRF token now (called at start, and after the session changes). */
  refreshCsrfToken(): Promise<string> {
    const pending = this.get<{ csrfToken: string }>('/auth/csrf').then((r) => r.csrfToken);
    this.csrfToken = pending;
    // A failed fetch must not stick: the next write tries again.
    pending.catch(() => {
      if (this.csrfToken === pending) this.csrfToken = null;
    });
    return pending;
  }

  /** Drop the cached token; the next write fetches a new one. */
  forgetCsrfToken(): void {
    this.csrfToken = null;
  }

  async request<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
    const unsafe = UNSAFE_METHODS.has(method);
    let response = await this.send(method, path, options, unsafe ? await this.currentToken() : null);
    if (unsafe && response.status === 403) {
      const failure = await readError(response.clone());
      if (failure.code === 'csrf_invalid') {
        response = await this.send(method, path, options, await this.refreshCsrfToken());
      }
    }
    if (!response.ok) throw new ApiRequestError(await readError(response));
    const result = (await readBody(response)) as T;
    if (options.renewsSession) {
      // The new session needs its own token; a failure here surfaces on the next write instead.
      await this.refreshCsrfToken().catch(() => undefined);
    }
    return result;
  }

  private currentToken(): Promise<string> {
    return this.csrfToken ?? this.refreshCsrfToken();
  }

  private async send(method: string, path: string, options: RequestOptions, token: string | null): Promise<Response> {
    const headers: Record<string, string> = { Accept: 'application/json', ...options.headers };
    if (options.body !== undefined) headers['Content-Type'] = 'application/json';
    if (token) headers[CSRF_HEADER] = token;
    try {
      return await this.fetchImpl(`${this.base}${path}`, {
        method,
        headers,
        credentials: 'include',
        body: options.body === undefined ? undefined : JSON.stringify(options.body),
        signal: options.signal,
      });
    } catch (cause) {
      if (options.signal?.aborted) throw cause;
      throw new ApiRequestError({
        statusCode: 0,
        error: 'Network Error',
        message: 'Shoalbook could not reach its server. Check the connection and try again.',
      });
    }
  }
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  return JSON.parse(text);
}

/** Read an error answer; anything not in the contract's shape (a proxy's HTML page, say) gets a plain message. */
async function readError(response: Response): Promise<ApiError> {
  const fallback: ApiError = {
    statusCode: response.status,
    error: response.statusText || 'Error',
    message: `The server answered with status ${response.status}. Please try again in a moment.`,
  };
  let parsed: unknown;
  try {
    parsed = JSON.parse(await response.text());
  } catch {
    return fallback;
  }
  if (!parsed || typeof parsed !== 'object') return fallback;
  const body = parsed as Partial<ApiError>;
  return {
    statusCode: typeof body.statusCode === 'number' ? body.statusCode : response.status,
    error: typeof body.error === 'string' ? body.error : fallback.error,
    message: typeof body.message === 'string' && body.message ? body.message : fallback.message,
    code: typeof body.code === 'string' ? body.code : undefined,
    fieldErrors: isFieldErrors(body.fieldErrors) ? body.fieldErrors : undefined,
    requestId: typeof body.requestId === 'string' ? body.requestId : undefined,
  };
}

function isFieldErrors(value: unknown): value is Record<string, string[]> {
  if (!value || typeof value !== 'object') return false;
  return Object.values(value).every((v) => Array.isArray(v) && v.every((m) => typeof m === 'string'));
}

/** True when `error` is an API answer with this status (and, if given, this code). */
export function isApiError(error: unknown, statusCode?: number, code?: string): error is ApiRequestError {
  if (!(error instanceof ApiRequestError)) return false;
  if (statusCode !== undefined && error.statusCode !== statusCode) return false;
  return code === undefined || error.code === code;
}

/** The app's single client instance. */
export const api = new ApiClient();
