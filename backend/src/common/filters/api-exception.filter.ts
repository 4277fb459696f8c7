import { ConnectionException, DriverException, OptimisticLockError } from '@mikro-orm/core';
import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { STATUS_CODES } from 'node:http';
import type { Request, Response } from 'express';
import type { ApiError } from '@shoalbook/shared';
import { ErrorCode } from '../errors/api-errors';

const DEFAULT_CODES: Record<number, string> = {
  400: ErrorCode.validation,
  401: ErrorCode.unauthenticated,
  403: ErrorCode.forbidden,
  404: ErrorCode.notFound,
  429: ErrorCode.rateLimited,
};

/**
 * Error codes that mean "the database is not there right now" (connection refused, dropped, timed out,
 * server shutting down), from Node's sockets, the mariadb connector and the server itself.
 */
const UNREACHABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'PROTOCOL_CONNECTION_LOST',
  'ER_SOCKET',
  'ER_SOCKET_UNEXPECTED_CLOSE',
  'ER_SOCKET_TIMEOUT',
  'ER_CONNECTION_ALREADY_CLOSED',
  'ER_CMD_CONNECTION_CLOSED',
  'ER_GET_CONNECTION_TIMEOUT',
  'ER_CONNECTION_TIMEOUT',
  'ER_POOL_NO_CONNECTION',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
]);

/** Seconds a client should wait before retrying while the database is away (RFC 9110 §10.2.3 Retry-After). */
export const DB_RETRY_AFTER_SECONDS = 5;

/**
 * A MikroORM driver error, the mariadb connector's own SqlError (raw connection calls), or the bare socket
 * error a transaction's COMMIT fails with when the server vanishes (knex only prefixes its message).
 */
function isDriverError(e: unknown): e is { code?: unknown; cause?: unknown; previous?: unknown } {
  return (
    e instanceof DriverException ||
    (e instanceof Error && (e.name === 'SqlError' || typeof (e as { syscall?: unknown }).syscall === 'string'))
  );
}

/** The driver error, or one it wraps (MikroORM keeps the connector's error as `previous` or `cause`). */
function isDatabaseUnreachable(e: unknown, depth = 0): boolean {
  if (e instanceof ConnectionException) return true;
  if (!isDriverError(e) || depth > 3) return false;
  if (UNREACHABLE_CODES.has(String(e.code))) return true;
  // knex's answer for a statement on a transaction whose connection the server has just dropped.
  if (/^Transaction query already complete/.test((e as Error).message)) return true;
  return isDatabaseUnreachable(e.cause, depth + 1) || isDatabaseUnreachable(e.previous, depth + 1);
}

/** Turn anything thrown into the one ApiError shape: a readable message, never a stack trace or SQL. */
export function toApiError(exception: unknown): Omit<ApiError, 'requestId'> {
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    const body = exception.getResponse();
    let message = exception.message;
    let code: string | undefined;
    let fieldErrors: Record<string, string[]> | undefined;
    if (typeof body === 'string') message = body;
    else if (body && typeof body === 'object') {
      const b = body as { message?: unknown; code?: unknown; fieldErrors?: unknown };
      if (typeof b.message === 'string') message = b.message;
      else if (Array.isArray(b.message)) message = b.message.join('; ');
      if (typeof b.code === 'string') code = b.code;
      if (b.fieldErrors && typeof b.fieldErrors === 'object') fieldErrors = b.fieldErrors as Record<string, string[]>;
    }
    if (statusCode === 429) message = 'Too many attempts. Wait a minute, then try again.';
    const error: Omit<ApiError, 'requestId'> = { statusCode, error: STATUS_CODES[statusCode] ?? 'Error', message };
    const finalCode = code ?? DEFAULT_CODES[statusCode];
    if (finalCode) error.code = finalCode;
    if (fieldErrors) error.fieldErrors = fieldErrors;
    return error;
  }
  // Two writers passed the version check at once; the second UPDATE matched no row.
  if (exception instanceof OptimisticLockError) {
    return {
      statusCode: 409,
      error: STATUS_CODES[409]!,
      message: 'This record was changed by someone else a moment ago. Reload it and apply your change again.',
      code: 'stale_version',
    };
  }
  if (isDatabaseUnreachable(exception)) {
    return {
      statusCode: 503,
      error: STATUS_CODES[503]!,
      message: 'The database is not answering. Try again in a moment.',
      code: ErrorCode.dbUnavailable,
    };
  }
  return {
    statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
    error: STATUS_CODES[500]!,
    message: 'Something went wrong on our side. Quote the request id if you report it.',
    code: ErrorCode.internal,
  };
}

const logger = new Logger('HTTP');

/** Log `exception` (details only in the log) and answer with the ApiError shape. */
export function sendApiError(req: Request, res: Response, exception: unknown): void {
  const error: ApiError = { ...toApiError(exception), requestId: req.id };
  const where = `${req.method} ${req.originalUrl} → ${error.statusCode} [${req.id}]`;
  if (error.statusCode >= 500) {
    logger.error(
      `${where}: ${exception instanceof Error ? exception.message : String(exception)}`,
      exception instanceof Error ? exception.stack : undefined,
    );
  } else {
    logger.verbose(`${where}: ${error.message}`);
  }
  if (res.headersSent) return;
  if (error.statusCode === 503) res.setHeader('Retry-After', String(DB_RETRY_AFTER_SECONDS));
  res.status(error.statusCode).json(error);
}

/**
 * The single global filter: every 4xx/5xx answer of a route goes through here. Plain middleware answers
 * its own errors with sendApiError instead of next(err): with the front end served, serve-static turns
 * every error passed along under /api into a 404.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  catch(exception: unknown, host: ArgumentsHost): void {
    const ctx = host.switchToHttp();
    sendApiError(ctx.getRequest<Request>(), ctx.getResponse<Response>(), exception);
  }
}
