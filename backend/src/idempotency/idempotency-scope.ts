import { AsyncLocalStorage } from 'node:async_hooks';

/** What the interceptor learned about a request that carries an Idempotency-Key. */
export interface IdempotentRequest {
  crewId: string;
  userId: string;
  key: string;
  /** The status the route answers with on success (201 for POST unless @HttpCode says otherwise). */
  statusCode: number;
  /** Computed when the key is claimed, after uploads and bodies are parsed. */
  fingerprint: () => string;
  /** Set once the first journal transaction of the request has claimed the key. */
  claimed: boolean;
}

/**
 * Carries the request's key from the interceptor to JournalEventsService.transaction, so the key is claimed
 * and answered inside the write's own transaction without every command passing it along.
 */
export const idempotencyScope = new AsyncLocalStorage<IdempotentRequest>();

/** Thrown inside the transaction when the key already holds an answer for the same request. */
export class IdempotentReplay extends Error {
  constructor(
    readonly statusCode: number,
    readonly body: unknown,
  ) {
    super('idempotent replay');
  }
}
