import { describe, expect, it } from 'vitest';
import { passwordProblem } from './password-policy';

describe('passwordProblem', () => {
  it('accepts a long uncommon passphrase', () => {
    expect(passwordProblem('weed line at nine feet')).toBeNull();
  });

  it('refuses passwords under 10 or over 128 characters (NIST SP 800-63B length rule)', () => {
    expect(passwordProblem('short1234')).toMatch(/at least 10/);
    expect(passwordProblem('x'.repeat(9) + 'y')).toBeNull();
    expect(passwordProblem('ab'.repeat(64))).toBeNull();
    expect(passwordProblem('ab'.repeat(64) + 'c')).toMatch(/at most 128/);
  });

  it('counts characters, not UTF-16 units', () => {
    expect(passwordProblem('🐟'.repeat(5) + 'abcde')).toBeNull();
  });

  it('refuses common passwords whatever their case', () => {
    expect(passwordProblem('password123')).toMatch(/too common/);
    expect(passwordProblem('QwertyUiop')).toMatch(/too common/);
    expect(passwordProblem('1234567890')).toMatch(/too common/);
  });

  it('refuses one repeated character and the account e-mail', () => {
    expect(passwordProblem('aaaaaaaaaaaa')).toMatch(/repeated/);
    expect(passwordProblem('Longname.Angler@example.test', { email: 'longname.angler@example.test' })).toMatch(
      /e-mail/,
    );
    expect(passwordProblem('longnameangler', { email: 'LongNameAngler@example.test' })).toMatch(/e-mail/);
  });
});
