import { describe, expect, it } from 'vitest';
import { parseIdempotencyKey } from './idempotency-key-header';
import { canonicalJson, requestFingerprint } from './request-fingerprint';

// The header's grammar is an RFC 8941 sf-string (draft-ietf-httpapi-idempotency-key-header-07 §2.1), e.g. the
// draft's own example `Idempotency-Key: "8e03978e-40d5-43e8-bc93-6894a57f9324"`.
describe('parseIdempotencyKey', () => {
  it("reads the draft's example and a bare UUID alike", () => {
    expect(parseIdempotencyKey('"8e03978e-40d5-43e8-bc93-6894a57f9324"')).toBe('8e03978e-40d5-43e8-bc93-6894a57f9324');
    expect(parseIdempotencyKey('8e03978e-40d5-43e8-bc93-6894a57f9324')).toBe('8e03978e-40d5-43e8-bc93-6894a57f9324');
  });
  it('unescapes \\" and \\\\ inside a quoted key (RFC 8941 §3.3.3)', () => {
    expect(parseIdempotencyKey('"a\\"b\\\\c"')).toBe('a"b\\c');
  });
  it('refuses empty, unterminated, non-ASCII, repeated and over-long keys', () => {
    for (const bad of ['""', '', '"abc', 'a b', 'é', '"a"b"'])
      expect(() => parseIdempotencyKey(bad), bad).toThrow(/Idempotency-Key/);
    expect(() => parseIdempotencyKey(['a', 'b'])).toThrow(/one Idempotency-Key/);
    expect(parseIdempotencyKey('k'.repeat(255))).toHaveLength(255);
    expect(() => parseIdempotencyKey('k'.repeat(256))).toThrow(/longer than 255/);
  });
});

describe('requestFingerprint', () => {
  const req = (body: unknown, originalUrl = '/api/crews/c/catches', method = 'POST') => ({ method, originalUrl, body });
  it('ignores key order but not values, method or address', () => {
    expect(canonicalJson({ b: 1, a: { d: [2, { f: 1, e: 0 }], c: null } })).toBe(
      '{"a":{"c":null,"d":[2,{"e":0,"f":1}]},"b":1}',
    );
    const base = requestFingerprint(req({ a: 1, b: 2 }));
    expect(requestFingerprint(req({ b: 2, a: 1 }))).toBe(base);
    expect(requestFingerprint(req({ a: 1, b: 3 }))).not.toBe(base);
    expect(requestFingerprint(req({ a: 1, b: 2 }, '/api/crews/c/finds'))).not.toBe(base);
    expect(requestFingerprint(req({ a: 1, b: 2 }, undefined, 'PATCH'))).not.toBe(base);
    expect(base).toMatch(/^[0-9a-f]{64}$/);
  });
});
