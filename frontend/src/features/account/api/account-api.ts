import type { MeResponse, UnitPreferences } from '@shoalbook/shared';
import { api } from '../../../lib/api-client';

/** PATCH /api/auth/me: display name and/or unit preferences. */
export function updateAccount(body: { displayName?: string; units?: UnitPreferences }): Promise<MeResponse> {
  return api.patch<MeResponse>('/auth/me', body);
}

/** POST /api/auth/change-password: other sessions of the account end. */
export function changePassword(body: { currentPassword: string; newPassword: string }): Promise<void> {
  return api.post<void>('/auth/change-password', body);
}
