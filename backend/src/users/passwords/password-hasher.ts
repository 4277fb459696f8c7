import { Algorithm, hash, verify } from '@node-rs/argon2';

/**
 * argon2id parameters: OWASP Password Storage Cheat Sheet's minimum is m=19 MiB (19456 KiB), t=2, p=1;
 * we use that memory with one more pass.
 */
export const ARGON2_OPTIONS = {
  algorithm: Algorithm.Argon2id,
  memoryCost: 19456,
  timeCost: 3,
  parallelism: 1,
} as const;

/** Hash a password into a PHC string (`$argon2id$v=19$m=19456,t=3,p=1$…`). */
export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

/** Constant-work check of a password against a stored PHC string; false on any malformed hash. */
export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let decoy: Promise<string> | undefined;
/**
 * A hash to verify against when the e-mail is unknown, so a sign-in for a missing account costs the
 * same time as one for a real account (no enumeration by timing).
 */
export function decoyHash(): Promise<string> {
  decoy ??= hashPassword('decoy-password-for-unknown-accounts');
  return decoy;
}
