import type { MeResponse, PasswordResetConfirm, SignInRequest, SignUpRequest } from '@shoalbook/shared';
import { api } from '../../../lib/api-client';

/** POST /api/auth/sign-in; the session cookie changes, so the CSRF token is renewed. */
export function signIn(body: SignInRequest): Promise<MeResponse> {
  return api.post<MeResponse>('/auth/sign-in', body, { renewsSession: true });
}

/** POST /api/auth/sign-up: creates the account and signs it in. */
export function signUp(body: SignUpRequest): Promise<MeResponse> {
  return api.post<MeResponse>('/auth/sign-up', body, { renewsSession: true });
}

/** POST /api/auth/sign-out. */
export function signOut(): Promise<void> {
  return api.post<void>('/auth/sign-out', undefined, { renewsSession: true });
}

/** POST /api/auth/password-reset/request: the same answer whether or not the address has an account. */
export function requestPasswordReset(email: string): Promise<{ message: string }> {
  return api.post<{ message: string }>('/auth/password-reset/request', { email });
}

/** POST /api/auth/password-reset/confirm: sets the new password and ends every session of that account. */
export function confirmPasswordReset(body: PasswordResetConfirm): Promise<void> {
  return api.post<void>('/auth/password-reset/confirm', body, { renewsSession: true });
}
