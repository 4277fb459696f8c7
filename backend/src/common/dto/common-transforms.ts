import { Transform } from 'class-transformer';
import { canonicalEmail } from '../canonical-email';

/** E-mail addresses in their canonical form before validation, so no spelling makes a second account. */
export const NormaliseEmail = (): PropertyDecorator =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? canonicalEmail(value) : value));

/** Trim free text (names) before validation. */
export const Trim = (): PropertyDecorator =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
