import { Transform } from 'class-transformer';

/** Trim and lower-case e-mail addresses before validation, so case never makes a second account. */
export const NormaliseEmail = (): PropertyDecorator =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value));

/** Trim free text (names) before validation. */
export const Trim = (): PropertyDecorator =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));
