import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import { HTTP_CODE_METADATA } from '@nestjs/common/constants';
import { Reflector } from '@nestjs/core';
import type { Request, Response } from 'express';
import { catchError, Observable, of, throwError } from 'rxjs';
import { parseIdempotencyKey } from './idempotency-key-header';
import { idempotencyScope, type IdempotentRequest, IdempotentReplay } from './idempotency-scope';
import { requestFingerprint } from './request-fingerprint';

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Marks an answer that was replayed from a stored key rather than produced again. */
export const IDEMPOTENT_REPLAY_HEADER = 'Idempotent-Replayed';

/**
 * Honours `Idempotency-Key` on crew write routes. The key is claimed, and the answer stored, by the first
 * journal transaction the request runs (JournalEventsService.transaction); a replay of a finished request
 * is answered here with the stored status and body, and nothing is written again.
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  constructor(private readonly reflector: Reflector) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const http = context.switchToHttp();
    const req = http.getRequest<Request>();
    const raw = req.headers['idempotency-key'];
    if (raw === undefined || !WRITE_METHODS.has(req.method) || !req.crewAccess) return next.handle();
    const scope: IdempotentRequest = {
      crewId: req.crewAccess.crewId,
      userId: req.crewAccess.userId,
      key: parseIdempotencyKey(raw),
      statusCode:
        this.reflector.get<number | undefined>(HTTP_CODE_METADATA, context.getHandler()) ??
        (req.method === 'POST' ? 201 : 200),
      fingerprint: () => requestFingerprint(req),
      claimed: false,
    };
    const res = http.getResponse<Response>();
    return new Observable((subscriber) =>
      idempotencyScope.run(scope, () =>
        next
          .handle()
          .pipe(
            catchError((e: unknown) => {
              if (!(e instanceof IdempotentReplay)) return throwError(() => e);
              res.status(e.statusCode);
              res.setHeader(IDEMPOTENT_REPLAY_HEADER, 'true');
              return of(e.body);
            }),
          )
          .subscribe(subscriber),
      ),
    );
  }
}
