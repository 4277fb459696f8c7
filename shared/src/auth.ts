import type { CrewRole, SiteRole } from './roles.js';
import type { UnitPreferences } from './units.js';

/** Password rules (NIST SP 800-63B): length only, no composition rules; common passwords refused. */
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;

/** Name of the header that carries the CSRF token on every state-changing request. */
export const CSRF_HEADER = 'x-csrf-token';

export interface UserView {
  id: string;
  email: string;
  displayName: string;
  siteRole: SiteRole;
  units: UnitPreferences;
}

export interface MembershipView {
  crewId: string;
  crewName: string;
  role: CrewRole;
}

/** GET /api/auth/me */
export interface MeResponse {
  user: UserView;
  crews: MembershipView[];
}

export interface SignUpRequest {
  email: string;
  password: string;
  displayName: string;
}

export interface SignInRequest {
  email: string;
  password: string;
}

export interface PasswordResetRequest {
  email: string;
}

export interface PasswordResetConfirm {
  token: string;
  password: string;
}

/** GET /api/auth/csrf */
export interface CsrfResponse {
  csrfToken: string;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

export interface UpdateMeRequest {
  displayName?: string;
  /** Any subset; the other units stay as they are. */
  units?: Partial<UnitPreferences>;
}
