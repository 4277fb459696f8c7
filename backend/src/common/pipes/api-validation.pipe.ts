import { type ArgumentMetadata, HttpStatus, ValidationPipe, type ValidationError } from '@nestjs/common';
import { ApiException, ErrorCode } from '../errors/api-errors';

/**
 * class-validator's own messages start with the property ("startTime must be a string"); a message shown
 * beside a field under its label reads better without it ("Must be a string").
 */
export function withoutFieldName(message: string, property: string): string {
  if (!message.startsWith(`${property} `)) return message;
  const rest = message.slice(property.length + 1);
  return rest.charAt(0).toUpperCase() + rest.slice(1);
}

/** Flatten class-validator errors into `{ "units.weight": ["…"] }`, with readable words for unknown fields. */
export function toFieldErrors(errors: ValidationError[], prefix = ''): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const e of errors) {
    const path = prefix ? `${prefix}.${e.property}` : e.property;
    const constraints = e.constraints ?? {};
    const messages = Object.entries(constraints).map(([name, msg]) =>
      name === 'whitelistValidation' ? 'This field is not accepted.' : withoutFieldName(msg, e.property),
    );
    if (messages.length) out[path] = messages;
    if (e.children?.length) Object.assign(out, toFieldErrors(e.children, path));
  }
  return out;
}

/** The global pipe: whitelist DTO fields, refuse unknown ones, convert types, one error shape. */
export class ApiValidationPipe extends ValidationPipe {
  constructor() {
    super({
      whitelist: true,
      forbidNonWhitelisted: true,
      transform: true,
      forbidUnknownValues: true,
      validationError: { target: false, value: false },
      exceptionFactory: (errors) => {
        const fieldErrors = toFieldErrors(errors);
        const fields = Object.keys(fieldErrors);
        const message =
          fields.length === 1
            ? `Check the field "${fields[0]}": ${fieldErrors[fields[0]!]![0]}`
            : `Check these fields: ${fields.join(', ')}.`;
        return new ApiException(HttpStatus.BAD_REQUEST, message, ErrorCode.validation, fieldErrors);
      },
    });
  }

  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (
      metadata.type === 'body' &&
      value !== undefined &&
      (value === null || typeof value !== 'object' || Array.isArray(value))
    ) {
      throw new ApiException(HttpStatus.BAD_REQUEST, 'The request body must be a JSON object.', ErrorCode.validation);
    }
    return super.transform(value, metadata);
  }
}
