import type { MeResponse, PasswordResetConfirm, SignInRequest, SignUpRequest } from '@shoalbook/shared';
import { api, isApiError } from '../../../lib/api-client';

/** POST /api/auth/sign-in; the session cookie changes, so the CSRF token is renewed. */
export function signIn(body: SignInRequest): Promise<MeResponse> {
  return api.post<MeResponse>('/auth/sign-in', body, { renewsSession: true });
}

/**
 * POST /api/auth/sign-up, then sign in with the same address and password. The sign-up answer is the same
 * whether or not the address was free (no account enumeration); if signing in then fails, the address had an
 * account already and its owner has been e-mailed, so the person is pointed to their inbox.
 */
export async function signUp(body: SignUpRequest): Promise<{ signedIn: MeResponse } | { checkMail: string }> {
  const { message } = await api.post<{ message: string }>('/auth/sign-up', body);
  try {
    return { signedIn: await signIn({ email: body.email, password: body.password }) };
  } catch (e) {
    if (isApiError(e, 401)) return { checkMail: message };
    throw e;
  }
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
