import { CSRF_HEADER, type ApiError } from '@shoalbook/shared';
import { API_BASE, ApiRequestError, api } from './api-client';

/** How far an upload has come: bytes sent, then the server working on the whole file. */
export interface UploadProgress {
  phase: 'uploading' | 'processing';
  /** 0–100; during 'processing' the bytes are all sent and the server is reading the file. */
  percent: number;
}

export interface UploadOptions {
  /** Multipart field name; the journal routes use `file`. */
  field?: string;
  /** Extra multipart text fields sent before the file. */
  fields?: Record<string, string>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

/**
 * POST one file as multipart/form-data, reporting progress. XMLHttpRequest rather than fetch because
 * only XHR reports upload progress, which matters for a 10,000-waypoint GPX file on a slow connection.
 * Same rules as the JSON client: session cookie, CSRF header (renewed once on "csrf_invalid"), and every
 * failure as an {@link ApiRequestError} in the contract's shape.
 */
export async function uploadFile<T>(path: string, file: File, options: UploadOptions = {}): Promise<T> {
  const attempt = async (token: string) => send<T>(path, file, token, options);
  try {
    return await attempt(await api.refreshCsrfToken());
  } catch (error) {
    if (error instanceof ApiRequestError && error.statusCode === 403 && error.code === 'csrf_invalid') {
      return attempt(await api.refreshCsrfToken());
    }
    throw error;
  }
}

function send<T>(path: string, file: File, token: string, options: UploadOptions): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${API_BASE}${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(CSRF_HEADER, token);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable)
        options.onProgress?.({ phase: 'uploading', percent: Math.round((event.loaded / event.total) * 100) });
    };
    xhr.upload.onload = () => options.onProgress?.({ phase: 'processing', percent: 100 });
    xhr.onload = () => {
      const body = parse(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else reject(new ApiRequestError(asApiError(body, xhr.status, xhr.statusText)));
    };
    xhr.onerror = () =>
      reject(
        new ApiRequestError({
          statusCode: 0,
          error: 'Network Error',
          message:
            'The file could not be sent: Shoalbook could not reach its server. Check the connection and try again.',
        }),
      );
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    const form = new FormData();
    for (const [name, value] of Object.entries(options.fields ?? {})) form.append(name, value);
    form.append(options.field ?? 'file', file, file.name);
    options.onProgress?.({ phase: 'uploading', percent: 0 });
    xhr.send(form);
  });
}

function parse(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function asApiError(body: unknown, status: number, statusText: string): ApiError {
  const b = (body && typeof body === 'object' ? body : {}) as Partial<ApiError>;
  return {
    statusCode: typeof b.statusCode === 'number' ? b.statusCode : status,
    error: typeof b.error === 'string' ? b.error : statusText || 'Error',
    message: typeof b.message === 'string' && b.message ? b.message : `The server answered with status ${status}.`,
    code: typeof b.code === 'string' ? b.code : undefined,
    fieldErrors: b.fieldErrors && typeof b.fieldErrors === 'object' ? b.fieldErrors : undefined,
    requestId: typeof b.requestId === 'string' ? b.requestId : undefined,
  };
}
