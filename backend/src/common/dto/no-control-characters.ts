import { ValidateBy, type ValidationArguments, type ValidationOptions } from 'class-validator';

/** Any Unicode control character (general category Cc: U+0000–U+001F and U+007F–U+009F). */
const ANY_CONTROL = /\p{Cc}/u;
/** The same, less the layout characters a multi-line note legitimately holds: tab, line feed, carriage return. */
const CONTROL_BUT_LAYOUT = /(?![\t\n\r])\p{Cc}/u;

/**
 * Refuse control characters in a name or free-text field (400 naming the field). CR, LF and NUL in a name end
 * up in CSV rows, e-mail subjects and log lines; OWASP ASVS 4.0.3 5.1.4 (structured data checked against
 * allowed characters). Single-line fields refuse every Cc character; `multiline` notes keep tab, LF and CR.
 */
export function NoControlCharacters(
  { multiline = false }: { multiline?: boolean } = {},
  validationOptions?: ValidationOptions,
): PropertyDecorator {
  const pattern = multiline ? CONTROL_BUT_LAYOUT : ANY_CONTROL;
  return ValidateBy(
    {
      name: 'noControlCharacters',
      validator: {
        validate: (value: unknown) => typeof value !== 'string' || !pattern.test(value),
        defaultMessage: (args?: ValidationArguments) => {
          const value = String(args?.value ?? '');
          const index = value.search(pattern);
          const code = value.codePointAt(index)!.toString(16).toUpperCase().padStart(4, '0');
          const allowed = multiline ? ' (tabs and line breaks are fine)' : '';
          return `Remove the control character U+${code} at position ${index + 1}${allowed}.`;
        },
      },
    },
    validationOptions,
  );
}
