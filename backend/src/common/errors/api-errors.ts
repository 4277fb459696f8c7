import type { ApiErrorCode } from '@shoalbook/shared';
import { HttpException, HttpStatus } from '@nestjs/common';

/** Stable codes a client reacts to (the `code` of an ApiError). */
export const ErrorCode = {
  validation: 'validation_failed',
  invalidJson: 'invalid_json',
  csrfInvalid: 'csrf_invalid',
  unauthenticated: 'unauthenticated',
  wrongCredentials: 'wrong_credentials',
  accountDisabled: 'account_disabled',
  forbidden: 'forbidden',
  notFound: 'not_found',
  tokenInvalid: 'token_invalid',
  emailTaken: 'email_taken',
  lastOwner: 'last_owner',
  alreadyMember: 'already_member',
  inviteEmailMismatch: 'invite_email_mismatch',
  selfLockout: 'self_lockout',
  wrongPassword: 'wrong_password',
  rateLimited: 'rate_limited',
  mailFailed: 'mail_failed',
  dbUnavailable: 'db_unavailable',
  internal: 'internal_error',
} as const satisfies Record<string, ApiErrorCode>;

/** An HTTP error carrying the ApiError fields beyond status and message. */
export class ApiException extends HttpException {
  constructor(status: HttpStatus, message: string, code: string, fieldErrors?: Record<string, string[]>) {
    super({ message, code, fieldErrors }, status);
  }
}

/** 400 with messages beside named fields, like a failed DTO validation. */
export function fieldError(field: string, message: string, code: string = ErrorCode.validation): ApiException {
  return new ApiException(HttpStatus.BAD_REQUEST, message, code, { [field]: [message] });
}
