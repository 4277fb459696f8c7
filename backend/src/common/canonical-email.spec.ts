import { describe, expect, it } from 'vitest';
import { canonicalEmail } from './canonical-email';

describe('canonicalEmail', () => {
  it('maps full-width letters to ASCII (Unicode NFKC: U+FF41 FULLWIDTH LATIN SMALL LETTER A decomposes to U+0061)', () => {
    expect(canonicalEmail('ｐｒｏｂｅ＠example.test')).toBe('probe@example.test');
  });

  it('trims spaces, also the ideographic space U+3000 (NFKC maps it to U+0020)', () => {
    expect(canonicalEmail(' \u3000Probe@Example.TEST \t')).toBe('probe@example.test');
  });

  it('case-folds beyond lower-casing: ß folds to ss (Unicode CaseFolding.txt, status F: 00DF; F; 0073 0073)', () => {
    expect(canonicalEmail('Straße@example.test')).toBe('strasse@example.test');
    expect(canonicalEmail('STRASSE@example.test')).toBe('strasse@example.test');
  });

  it('composes a decomposed accent (NFKC: o + U+0308 COMBINING DIAERESIS is U+00F6) but keeps accents', () => {
    expect(canonicalEmail('pro\u0308be@example.test')).toBe('pröbe@example.test');
    expect(canonicalEmail('pröbe@example.test')).not.toBe(canonicalEmail('probe@example.test'));
  });

  it('is idempotent', () => {
    for (const a of ['ＰＲÖＢＥ@Example.test', 'Straße@x.test', ' a@b.test '])
      expect(canonicalEmail(canonicalEmail(a))).toBe(canonicalEmail(a));
  });
});
