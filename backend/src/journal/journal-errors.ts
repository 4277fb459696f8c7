import { HttpStatus } from '@nestjs/common';
import { ApiException, ErrorCode, fieldError } from '../common/errors/api-errors';

/** Codes the journal adds to the foundation's ErrorCode list. */
export const JournalErrorCode = {
  staleVersion: 'stale_version',
  inUse: 'in_use',
  dayInUse: 'day_in_use',
  importRefused: 'import_refused',
  fileTooLarge: 'file_too_large',
  wrongFileType: 'wrong_file_type',
  malformedFile: 'malformed_file',
  idTaken: 'id_taken',
} as const;

/** 404 for a record that is missing or belongs to another crew: the two are indistinguishable. */
export function recordNotFound(what: string): ApiException {
  return new ApiException(HttpStatus.NOT_FOUND, `No such ${what}.`, ErrorCode.notFound);
}

/** A referenced record (in the body) that is missing or another crew's: 400 beside the field. */
export function unknownReference(field: string, what: string): ApiException {
  return fieldError(field, `No such ${what} in this crew.`);
}

/** 409 for a client-made id that a record already has (one of this crew's, or any other: ids are global). */
export function idTaken(what: string): ApiException {
  return new ApiException(
    HttpStatus.CONFLICT,
    `A ${what} with this id already exists. To retry a write safely, send it again with the same Idempotency-Key.`,
    JournalErrorCode.idTaken,
  );
}

export function staleVersion(what: string, current: number): ApiException {
  return new ApiException(
    HttpStatus.CONFLICT,
    `This ${what} was changed by someone else since you loaded it (now version ${current}). Reload it and apply your change again.`,
    JournalErrorCode.staleVersion,
  );
}

export function inUse(message: string, code: string = JournalErrorCode.inUse): ApiException {
  return new ApiException(HttpStatus.CONFLICT, message, code);
}

/** Several field messages at once. */
export function fieldErrors(errors: Record<string, string[]>): ApiException {
  const fields = Object.keys(errors);
  const message =
    fields.length === 1
      ? `Check the field "${fields[0]}": ${errors[fields[0]!]![0]}`
      : `Check these fields: ${fields.join(', ')}.`;
  return new ApiException(HttpStatus.BAD_REQUEST, message, ErrorCode.validation, errors);
}

/** Collects field problems and throws them together. */
export class FieldProblems {
  readonly errors: Record<string, string[]> = {};
  add(field: string, message: string): void {
    (this.errors[field] ??= []).push(message);
  }
  get empty(): boolean {
    return Object.keys(this.errors).length === 0;
  }
  throwIfAny(): void {
    if (!this.empty) throw fieldErrors(this.errors);
  }
}

/** Compare the version a PATCH was based on with the stored one. */
export function assertVersion(what: string, expected: number, current: number): void {
  if (expected !== current) throw staleVersion(what, current);
}
