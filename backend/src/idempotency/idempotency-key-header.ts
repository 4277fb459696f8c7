import { invalidKey } from './idempotent-write';

export const MAX_IDEMPOTENCY_KEY_LENGTH = 255;

/**
 * Read the Idempotency-Key header. The draft defines it as a Structured Field sf-string (RFC 8941 §3.3.3:
 * `"…"` with `\"` and `\\` escapes, printable ASCII); a bare value of printable ASCII is accepted as well,
 * since many clients send the UUID without quotes.
 */
export function parseIdempotencyKey(raw: string | string[]): string {
  if (Array.isArray(raw)) throw invalidKey('Send one Idempotency-Key header, not several.');
  const value = raw.trim();
  let key: string;
  if (value.startsWith('"')) {
    const m = /^"((?:[\x20\x21\x23-\x5b\x5d-\x7e]|\\["\\])*)"$/.exec(value);
    if (!m) throw invalidKey('The Idempotency-Key is not a valid quoted string.');
    key = m[1]!.replace(/\\(["\\])/g, '$1');
  } else {
    if (!/^[\x21-\x7e]*$/.test(value))
      throw invalidKey('The Idempotency-Key may hold printable ASCII characters only (a UUID, for example).');
    key = value;
  }
  if (key.length === 0) throw invalidKey('The Idempotency-Key is empty.');
  if (key.length > MAX_IDEMPOTENCY_KEY_LENGTH)
    throw invalidKey(`The Idempotency-Key is longer than ${MAX_IDEMPOTENCY_KEY_LENGTH} characters.`);
  return key;
}
