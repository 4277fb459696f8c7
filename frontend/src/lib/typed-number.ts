/**
 * Numbers as people type them, read by the user's locale and never guessed. The locale's decimal and
 * group signs come from the platform (ECMA-402 `Intl.NumberFormat#formatToParts`, whose data is CLDR's),
 * so "3,45" is 3.45 in de-DE and refused in en-US, where the comma groups thousands. A lone "." or ","
 * followed by exactly three digits that the locale reads as a group sign ("18,500" in en-US, "18.500" in
 * de-DE) is refused as ambiguous: elsewhere the same text means 18.5, and a changed number must never be
 * stored silently.
 */

/** The locale the screens read and write numbers in: the browser's first language. */
export function userLocale(): string {
  if (typeof navigator === 'undefined') return 'en-US';
  return navigator.languages?.[0] ?? navigator.language ?? 'en-US';
}

export interface NumberSigns {
  decimal: string;
  group: string;
}

const signsCache = new Map<string, NumberSigns>();

/** The locale's decimal and group signs, in Latin digits (the digits on every keyboard). */
export function numberSigns(locale: string): NumberSigns {
  let signs = signsCache.get(locale);
  if (!signs) {
    // 1,234,567.5: big enough that every locale groups it (some group only from five digits).
    const parts = new Intl.NumberFormat(locale, { numberingSystem: 'latn' }).formatToParts(1234567.5);
    signs = {
      decimal: parts.find((p) => p.type === 'decimal')?.value ?? '.',
      group: parts.find((p) => p.type === 'group')?.value ?? ',',
    };
    signsCache.set(locale, signs);
  }
  return signs;
}

export type TypedNumber =
  | { ok: true; value: number }
  | { ok: false; reason: 'not-a-number' }
  /** A sign the locale reads otherwise, or one that could mean either; `decimalReading` is the text read with it as a decimal point. */
  | { ok: false; reason: 'wrong-sign'; decimalReading: number }
  /** Could be either: `groupReading` with the sign grouping thousands, `decimalReading` with it as a decimal point. */
  | { ok: false; reason: 'ambiguous'; decimalReading: number; groupReading: number };

const SPACES = /[\s\u00a0\u2009\u202f]/g;
const APOSTROPHES = /[’']/g;
const SEPARATORS = /[.,'’\s\u00a0\u2009\u202f]/;

/** One canonical spelling per sign, so a typed space matches a no-break space and ' matches ’. */
function canon(sign: string): string {
  return sign.replace(SPACES, ' ').replace(APOSTROPHES, "'");
}

/** The integer digits grouped the locale's own way, in canonical signs ("1234567" → "1,234,567"). */
function grouped(digits: string, locale: string): string {
  const formatted = new Intl.NumberFormat(locale, { numberingSystem: 'latn', maximumFractionDigits: 0 }).format(
    BigInt(digits),
  );
  return canon(formatted);
}

/** Read one typed number by the locale's signs: digits, an optional leading sign, groups and one decimal sign. */
export function readTypedNumber(text: string, locale: string = userLocale()): TypedNumber {
  const raw = canon(text.trim()).replace(/\u2212/g, '-');
  const match = /^([-+]?)(\d[\d.,' ]*)$|^([-+]?)([.,]\d+)$/.exec(raw);
  if (!match) return { ok: false, reason: 'not-a-number' };
  const sign = match[1] ?? match[3] ?? '';
  const body = match[2] ?? match[4]!;
  if (/[.,' ]$/.test(body) || /[.,' ]{2}/.test(body)) return { ok: false, reason: 'not-a-number' };
  const { decimal, group } = numberSigns(locale);
  const dec = canon(decimal);
  const grp = canon(group);
  const seps = [...body].filter((c) => SEPARATORS.test(c));
  const decimalReading = (): number => {
    // The text read with its last separator as a decimal point and the others dropped: the hint offered.
    const last = Math.max(body.lastIndexOf('.'), body.lastIndexOf(','));
    const intPart = body.slice(0, Math.max(last, 0)).replace(/[^\d]/g, '');
    return Number(`${sign}${intPart || '0'}.${body.slice(last + 1).replace(/[^\d]/g, '')}`);
  };
  if (seps.length === 0) return finite(Number(`${sign}${body}`));
  if (seps.some((s) => s !== dec && s !== grp)) {
    const lone = seps.length === 1 && (seps[0] === '.' || seps[0] === ',');
    return lone
      ? { ok: false, reason: 'wrong-sign', decimalReading: decimalReading() }
      : { ok: false, reason: 'not-a-number' };
  }
  const decimalAt = body.indexOf(dec);
  if (dec !== grp && decimalAt !== body.lastIndexOf(dec)) return { ok: false, reason: 'not-a-number' };
  const intText = decimalAt >= 0 ? body.slice(0, decimalAt) : body;
  const fraction = decimalAt >= 0 ? body.slice(decimalAt + 1) : '';
  if (fraction.includes(grp)) return { ok: false, reason: 'not-a-number' };
  if (intText.includes(grp)) {
    const digits = intText.split(grp).join('');
    if (grouped(digits, locale) !== intText) {
      // "3,45" in en-US: no grouping reads so; a lone comma or point is a decimal sign of another locale.
      const lone = seps.length === 1 && (grp === '.' || grp === ',');
      return lone
        ? { ok: false, reason: 'wrong-sign', decimalReading: decimalReading() }
        : { ok: false, reason: 'not-a-number' };
    }
    if (seps.length === 1 && (grp === '.' || grp === ','))
      return {
        ok: false,
        reason: 'ambiguous',
        decimalReading: decimalReading(),
        groupReading: Number(`${sign}${digits}`),
      };
    return finite(Number(`${sign}${digits}${fraction ? `.${fraction}` : ''}`));
  }
  return finite(Number(`${sign}${intText || '0'}.${fraction}`));
}

function finite(value: number): TypedNumber {
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, reason: 'not-a-number' };
}

/** A number written the locale's way with no grouping, for prefilled inputs ("3.45" → "3,45" in de-DE). */
export function typedDecimal(plain: string, locale: string = userLocale()): string {
  return plain.replace('.', numberSigns(locale).decimal);
}

/** A number for a hint in the locale's way, up to three decimals, no grouping. */
export function formatTypedNumber(value: number, locale: string = userLocale()): string {
  return new Intl.NumberFormat(locale, {
    numberingSystem: 'latn',
    maximumFractionDigits: 3,
    useGrouping: false,
  }).format(value);
}
