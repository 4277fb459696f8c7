import { describe, expect, it } from 'vitest';
import { formatTypedNumber, numberSigns, readTypedNumber, typedDecimal } from './typed-number';

// Separators per locale are CLDR's (common/main/*.xml, <symbols numberSystem="latn">: <decimal>, <group>),
// reached through ECMA-402 Intl.NumberFormat#formatToParts: en-US "." and ",", de-DE "," and ".",
// fr-FR "," and U+202F NARROW NO-BREAK SPACE, de-CH "." and an apostrophe, en-IN "." and "," with the
// Indian 2-digit grouping above the thousands (12,34,567).

describe('the locale’s signs (CLDR through Intl.NumberFormat)', () => {
  it('reads the decimal and group signs of each locale', () => {
    expect(numberSigns('en-US')).toEqual({ decimal: '.', group: ',' });
    expect(numberSigns('de-DE')).toEqual({ decimal: ',', group: '.' });
    expect(numberSigns('fr-FR')).toEqual({ decimal: ',', group: '\u202f' });
    expect(numberSigns('de-CH').decimal).toBe('.');
    expect(numberSigns('de-CH').group).toMatch(/^['’]$/);
  });
});

describe('readTypedNumber', () => {
  const value = (text: string, locale: string) => {
    const r = readTypedNumber(text, locale);
    return r.ok ? r.value : r.reason;
  };

  it('reads the locale’s decimal sign', () => {
    expect(value('3.45', 'en-US')).toBe(3.45);
    expect(value('3,45', 'de-DE')).toBe(3.45);
    expect(value('3,45', 'fr-FR')).toBe(3.45);
    expect(value('3.45', 'de-CH')).toBe(3.45);
    expect(value(' 18.5 ', 'en-US')).toBe(18.5);
    expect(value('.5', 'en-US')).toBe(0.5);
    expect(value('-96.25', 'en-US')).toBe(-96.25);
    expect(value('\u221296,25', 'de-DE')).toBe(-96.25); // U+2212 MINUS SIGN, as some keyboards type it
    expect(value('7', 'fr-FR')).toBe(7);
  });

  it('reads groups where the locale writes them and nothing else could be meant', () => {
    expect(value('1,234.5', 'en-US')).toBe(1234.5);
    expect(value('1.234,5', 'de-DE')).toBe(1234.5);
    expect(value('1,234,567', 'en-US')).toBe(1234567);
    expect(value('12,34,567', 'en-IN')).toBe(1234567);
    expect(value('18 500', 'fr-FR')).toBe(18500); // a typed space stands for the no-break space
    expect(value('18\u202f500,5', 'fr-FR')).toBe(18500.5);
    expect(value("18'500", 'de-CH')).toBe(18500);
  });

  it('refuses a lone comma or point before three digits that the locale reads as a group: 18,500 may be 18.5', () => {
    expect(readTypedNumber('18,500', 'en-US')).toEqual({
      ok: false,
      reason: 'ambiguous',
      decimalReading: 18.5,
      groupReading: 18500,
    });
    expect(readTypedNumber('18.500', 'de-DE')).toEqual({
      ok: false,
      reason: 'ambiguous',
      decimalReading: 18.5,
      groupReading: 18500,
    });
  });

  it('refuses another locale’s decimal sign, offering the decimal reading as a hint only', () => {
    expect(readTypedNumber('3,45', 'en-US')).toEqual({ ok: false, reason: 'wrong-sign', decimalReading: 3.45 });
    expect(readTypedNumber('3.45', 'de-DE')).toEqual({ ok: false, reason: 'wrong-sign', decimalReading: 3.45 });
    expect(readTypedNumber('3.45', 'fr-FR')).toEqual({ ok: false, reason: 'wrong-sign', decimalReading: 3.45 });
  });

  it('refuses what is not one number', () => {
    for (const text of ['', 'heavy', '3.4.5', '1,23,4', '3.', '1.234,5', '3 lb', '0x10', '1e3', '--3', 'Infinity'])
      expect(value(text, 'en-US')).toBe('not-a-number');
    expect(value('1,2345', 'en-US')).toBe('wrong-sign');
  });
});

describe('writing numbers back', () => {
  it('prefills inputs and hints with the locale’s decimal sign, so they read back unchanged', () => {
    expect(typedDecimal('3.45', 'de-DE')).toBe('3,45');
    expect(typedDecimal('3.45', 'en-US')).toBe('3.45');
    expect(formatTypedNumber(18.5, 'fr-FR')).toBe('18,5');
    expect(formatTypedNumber(1234.5, 'en-US')).toBe('1234.5');
    for (const locale of ['en-US', 'de-DE', 'fr-FR', 'de-CH', 'en-IN'])
      expect(readTypedNumber(formatTypedNumber(2.125, locale), locale)).toEqual({ ok: true, value: 2.125 });
  });
});
