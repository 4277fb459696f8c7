import { HttpStatus } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/mariadb';
import { ApiException } from '../common/errors/api-errors';
import { IDEMPOTENCY_KEY_LIFETIME_MS } from './idempotency-key.entity';
import { IdempotentReplay, type IdempotentRequest } from './idempotency-scope';

const DUPLICATE_KEY = 1062;
const LOCK_WAIT_TIMEOUT = 1205;

export const IdempotencyErrorCode = {
  invalid: 'idempotency_key_invalid',
  reused: 'idempotency_key_reused',
  inUse: 'idempotency_key_in_use',
} as const;

interface StoredKey {
  fingerprint: string;
  status_code: number | null;
  response_body: string | null;
  created_at: Date;
}

function errnoOf(e: unknown): number | undefined {
  const err = e as { errno?: unknown; previous?: { errno?: unknown } } | null;
  const errno = err?.errno ?? err?.previous?.errno;
  return typeof errno === 'number' ? errno : undefined;
}

/**
 * Claim the request's key as the transaction's first write. The insert does not wait for a lock: if another
 * transaction holds the same key uncommitted, the request is still running (409); if a committed row exists
 * the request is a replay (same fingerprint: IdempotentReplay with the first answer) or a reuse (422). A
 * rolled-back write releases its key, so a refused request can be corrected and sent again with it.
 */
export async function claimIdempotencyKey(tx: EntityManager, req: IdempotentRequest, now = new Date()): Promise<void> {
  const fingerprint = req.fingerprint();
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      await tx.execute(
        'set statement innodb_lock_wait_timeout = 0 for insert into `idempotency_keys` (`crew_id`, `user_id`, `idem_key`, `fingerprint`, `created_at`) values (?, ?, ?, ?, ?)',
        [req.crewId, req.userId, req.key, fingerprint, now],
      );
      return;
    } catch (e) {
      const errno = errnoOf(e);
      if (errno === LOCK_WAIT_TIMEOUT) throw keyInUse();
      if (errno !== DUPLICATE_KEY) throw e;
    }
    const [stored] = await tx.execute<StoredKey[]>(
      'select `fingerprint`, `status_code`, `response_body`, `created_at` from `idempotency_keys` where `crew_id` = ? and `user_id` = ? and `idem_key` = ?',
      [req.crewId, req.userId, req.key],
    );
    if (!stored) continue; // deleted by the expiry sweep in between: claim again
    if (now.getTime() - new Date(stored.created_at).getTime() > IDEMPOTENCY_KEY_LIFETIME_MS) {
      await tx.execute('delete from `idempotency_keys` where `crew_id` = ? and `user_id` = ? and `idem_key` = ?', [
        req.crewId,
        req.userId,
        req.key,
      ]);
      continue;
    }
    if (stored.fingerprint !== fingerprint) throw keyReused();
    const body = stored.response_body === null ? undefined : (JSON.parse(stored.response_body) as unknown);
    throw new IdempotentReplay(stored.status_code ?? req.statusCode, body);
  }
  throw keyInUse();
}

/** Keep the first answer beside the key, in the same transaction as the write and its journal events. */
export async function storeIdempotentAnswer(tx: EntityManager, req: IdempotentRequest, body: unknown): Promise<void> {
  await tx.execute(
    'update `idempotency_keys` set `status_code` = ?, `response_body` = ? where `crew_id` = ? and `user_id` = ? and `idem_key` = ?',
    [req.statusCode, body === undefined ? null : JSON.stringify(body), req.crewId, req.userId, req.key],
  );
}

function keyInUse(): ApiException {
  return new ApiException(
    HttpStatus.CONFLICT,
    'A request with this Idempotency-Key is still being processed. Wait for its answer, then retry with the same key.',
    IdempotencyErrorCode.inUse,
  );
}

function keyReused(): ApiException {
  return new ApiException(
    HttpStatus.UNPROCESSABLE_ENTITY,
    'This Idempotency-Key was already used for a different request (another body or address). Send a new key for a new change.',
    IdempotencyErrorCode.reused,
  );
}

/** 400 for a header the draft's grammar (a Structured Field sf-string) or our limits do not accept. */
export function invalidKey(message: string): ApiException {
  return new ApiException(HttpStatus.BAD_REQUEST, message, IdempotencyErrorCode.invalid, {
    'Idempotency-Key': [message],
  });
}
