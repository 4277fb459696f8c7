import { ForbiddenException } from '@nestjs/common';
import { doubleCsrf } from 'csrf-csrf';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { CSRF_HEADER } from '@shoalbook/shared';
import { cookieName, SESSION_COOKIE } from '../session-cookie';
import { ErrorCode } from '../errors/api-errors';
import { sendApiError } from '../filters/api-exception.filter';

export const CSRF_COOKIE = 'sb_csrf';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export interface CsrfProtection {
  /** Issue (or reuse) the token for this browser and session; sets the httpOnly csrf cookie. */
  issueToken(req: Request, res: Response): string;
  /** Refuses every state-changing request without a valid token (403 csrf_invalid). */
  middleware: RequestHandler;
}

/**
 * Signed double-submit tokens (OWASP CSRF cheat sheet), bound to the session cookie: a token fetched
 * before sign-in stops working after it, so the client fetches a fresh one when the session changes.
 */
export function createCsrfProtection(secret: string, secureCookies: boolean): CsrfProtection {
  const { generateCsrfToken, validateRequest } = doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: (req) =>
      (req.cookies?.[cookieName(SESSION_COOKIE, secureCookies)] as string | undefined) ?? '',
    cookieName: cookieName(CSRF_COOKIE, secureCookies),
    cookieOptions: { sameSite: 'lax', secure: secureCookies, httpOnly: true, path: '/' },
    size: 32,
    getCsrfTokenFromRequest: (req) => req.headers[CSRF_HEADER] as string | undefined,
  });
  return {
    issueToken: (req, res) => generateCsrfToken(req, res),
    middleware: (req: Request, res: Response, next: NextFunction) => {
      if (SAFE_METHODS.has(req.method) || validateRequest(req)) return next();
      sendApiError(
        req,
        res,
        new ForbiddenException({
          message: 'The security token is missing or out of date. Reload the page and try again.',
          code: ErrorCode.csrfInvalid,
        }),
      );
    },
  };
}
