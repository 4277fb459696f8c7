import type { InvitePreview } from '@shoalbook/shared';
import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** GET /api/invites/:token (public): which crew and role the link offers; 404 "token_invalid" if it no longer works. */
export const invitePreviewQuery = (token: string) =>
  queryOptions({
    queryKey: ['invite-preview', token],
    queryFn: () => api.get<InvitePreview>(`/invites/${encodeURIComponent(token)}`),
  });

/** POST /api/invites/accept (signed in): joins the crew; the token cannot be used again. */
export function acceptInvite(token: string): Promise<{ crewId: string }> {
  return api.post<{ crewId: string }>('/invites/accept', { token });
}
