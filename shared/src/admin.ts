import type { SiteRole } from './roles.js';

/** GET /api/admin/users — one row per account. */
export interface AdminUserView {
  id: string;
  email: string;
  displayName: string;
  siteRole: SiteRole;
  disabled: boolean;
  /** ISO 8601 */
  createdAt: string;
}

/** PATCH /api/admin/users/:userId — disabling ends every session of the account. */
export interface AdminUpdateUserRequest {
  disabled?: boolean;
  siteRole?: SiteRole;
}
