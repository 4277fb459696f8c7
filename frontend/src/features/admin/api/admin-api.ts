import type { SiteRole } from '@shoalbook/shared';
import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** One account as the site admin sees it (GET /api/admin/users). */
export interface AdminAccountRow {
  id: string;
  email: string;
  displayName: string;
  siteRole: SiteRole;
  disabled: boolean;
  createdAt: string;
}

/** GET /api/admin/users (site admins only; 403 for everyone else). */
export const accountsQuery = queryOptions({
  queryKey: ['admin', 'users'],
  queryFn: () => api.get<AdminAccountRow[]>('/admin/users'),
});

/** PATCH /api/admin/users/:userId: disabling ends that person's sessions at once. */
export function updateAccountStatus(
  userId: string,
  body: { disabled?: boolean; siteRole?: SiteRole },
): Promise<AdminAccountRow> {
  return api.patch<AdminAccountRow>(`/admin/users/${encodeURIComponent(userId)}`, body);
}
