import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as zxcvbnCommon from '@zxcvbn-ts/language-common';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@shoalbook/shared';

/** zxcvbn-ts with its common-password and diceware dictionaries and keyboard graphs (built once). */
const strength = new ZxcvbnFactory({
  dictionary: { ...zxcvbnCommon.dictionary },
  graphs: zxcvbnCommon.adjacencyGraphs,
});

/**
 * zxcvbn's score 0–1 ("too guessable", under about 10^6 guesses): breach-list passwords, keyboard walks
 * and their simple variations. NIST SP 800-63B §5.1.1.2 asks verifiers to refuse commonly used passwords.
 */
const LOWEST_ACCEPTED_SCORE = 2;

/**
 * NIST SP 800-63B §5.1.1.2: a length rule, no composition rules, and a refusal of passwords that are
 * common or obviously tied to the account. Returns the reason a person can act on, or null when fine.
 */
export function passwordProblem(password: string, context: { email?: string } = {}): string | null {
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters.`;
  if (length > PASSWORD_MAX_LENGTH) return `Use at most ${PASSWORD_MAX_LENGTH} characters.`;
  const lower = password.toLowerCase();
  if (/^(.)\1*$/u.test(password)) return 'A password of one repeated character is too easy to guess.';
  const email = context.email?.trim().toLowerCase();
  if (email && (lower === email || lower === email.split('@')[0]))
    return 'Do not use your e-mail address as the password.';
  if (strength.check(password).score < LOWEST_ACCEPTED_SCORE) return 'This password is too common; choose another.';
  return null;
}
