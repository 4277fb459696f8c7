import type { NextFunction, Request, Response } from 'express';

/**
 * Every API answer is private to the person asking (sessions, finds with positions, reports), so no
 * browser or shared cache may keep it: OWASP ASVS 4.0.3 V8.2.1 (anti-caching headers for sensitive
 * data) and RFC 9111 §5.2.2.5 (no-store). `Vary: Cookie` tells any cache that ignores no-store that the
 * answer depends on who is signed in. Handlers may not loosen this.
 */
export function noStoreMiddleware(_req: Request, res: Response, next: NextFunction): void {
  res.setHeader('Cache-Control', 'no-store');
  res.setHeader('Vary', 'Cookie');
  next();
}
