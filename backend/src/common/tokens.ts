import { createHash, randomBytes } from 'node:crypto';

/** A random URL-safe token of `bytes` bytes (32 bytes = 256 bits). */
export function randomToken(bytes = 32): string {
  return randomBytes(bytes).toString('base64url');
}

/**
 * Hex SHA-256 of a token. The tokens are random and long, so a fast hash is enough: we store this,
 * never the token itself.
 */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
