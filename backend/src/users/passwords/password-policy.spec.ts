import { describe, expect, it } from 'vitest';
import { passwordProblem } from './password-policy';

describe('passwordProblem', () => {
  it('accepts a long uncommon passphrase', () => {
    expect(passwordProblem('weed line at nine feet')).toBeNull();
  });

  it('refuses passwords under 10 or over 128 characters (NIST SP 800-63B length rule)', () => {
    expect(passwordProblem('short1234')).toMatch(/at least 10/);
    expect(passwordProblem('Tq8#vL2pWx')).toBeNull();
    const long = 'Tq8#vL2pWx'.repeat(12) + 'Tq8#vL2p';
    expect(long).toHaveLength(128);
    expect(passwordProblem(long)).toBeNull();
    expect(passwordProblem(long + 'c')).toMatch(/at most 128/);
  });

  it('counts characters, not UTF-16 units', () => {
    expect(passwordProblem('🐟🐟Tq8#vL2p')).toBeNull(); // 10 code points, 12 UTF-16 units
    expect(passwordProblem('🐟🐟Tq8#vL2')).toMatch(/at least 10/); // 9 code points, 11 UTF-16 units
  });

  // Reference: zxcvbn-ts (npm @zxcvbn-ts/core with @zxcvbn-ts/language-common, whose passwords-common list is
  // drawn from published breach corpora); the refused ones below are at the top of such lists.
  it('refuses common passwords, keyboard walks and their simple variants whatever their case', () => {
    expect(passwordProblem('password123')).toMatch(/too common/);
    expect(passwordProblem('QwertyUiop')).toMatch(/too common/);
    expect(passwordProblem('1234567890')).toMatch(/too common/);
    expect(passwordProblem('iloveyou12')).toMatch(/too common/);
    expect(passwordProblem('asdfghjkl;')).toMatch(/too common/);
  });

  it('accepts uncommon passwords that are not on any list', () => {
    expect(passwordProblem('shoal-ridge-at-dawn')).toBeNull();
    expect(passwordProblem('Tq8#vL2pWx')).toBeNull();
  });

  it('refuses one repeated character and the account e-mail', () => {
    expect(passwordProblem('aaaaaaaaaaaa')).toMatch(/repeated/);
    expect(passwordProblem('Longname.Angler@example.test', { email: 'longname.angler@example.test' })).toMatch(
      /e-mail/,
    );
    expect(passwordProblem('longnameangler', { email: 'LongNameAngler@example.test' })).toMatch(/e-mail/);
  });
});
