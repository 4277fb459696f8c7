import type { SiteRole } from '@shoalbook/shared';
import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryString } from '../../../lib/journal-keys';

/** One account as the site admin sees it (GET /api/admin/users). */
export interface AdminAccountRow {
  id: string;
  email: string;
  displayName: string;
  siteRole: SiteRole;
  disabled: boolean;
  createdAt: string;
}

/** Accounts per page of the admin screen. */
export const ACCOUNTS_PAGE = 50;

/** GET /api/admin/users (site admins only; 403 for everyone else): newest first, `q` in e-mail or name. */
export const accountsQuery = (q: string, offset: number) =>
  queryOptions({
    queryKey: ['admin', 'users', { q, offset }],
    queryFn: () =>
      api.getPage<AdminAccountRow>(`/admin/users${queryString({ q: q.trim(), limit: ACCOUNTS_PAGE, offset })}`),
    placeholderData: keepPreviousData,
  });

/** PATCH /api/admin/users/:userId: disabling ends that person's sessions at once. */
export function updateAccountStatus(
  userId: string,
  body: { disabled?: boolean; siteRole?: SiteRole },
): Promise<AdminAccountRow> {
  return api.patch<AdminAccountRow>(`/admin/users/${encodeURIComponent(userId)}`, body);
}
