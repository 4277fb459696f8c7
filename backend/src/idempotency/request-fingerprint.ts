import { createHash } from 'node:crypto';
import type { Request } from 'express';

/** JSON with object keys sorted at every level, so `{a,b}` and `{b,a}` are the same body. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)))
      : v,
  );
}

/**
 * The request fingerprint of draft-ietf-httpapi-idempotency-key-header §2.4: method, path with query, the
 * parsed JSON body and any uploaded file. Whitespace or key order in the JSON does not change it.
 */
export function requestFingerprint(req: Pick<Request, 'method' | 'originalUrl' | 'body' | 'file'>): string {
  const hash = createHash('sha256');
  hash.update(`${req.method} ${req.originalUrl}\n`);
  hash.update(canonicalJson(req.body ?? null) ?? 'null');
  if (req.file) hash.update('\nfile:').update(req.file.buffer);
  return hash.digest('hex');
}
