import { randomUUID } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';

/** Give every request an id, echoed in the X-Request-Id header, error answers and log lines. */
export function requestIdMiddleware(req: Request, res: Response, next: NextFunction): void {
  req.id = randomUUID();
  res.setHeader('X-Request-Id', req.id);
  next();
}
