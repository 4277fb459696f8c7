import type { CreateInviteRequest, CrewRole, InviteView, MemberView } from '@shoalbook/shared';
import { queryOptions } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

const crewPath = (crewId: string) => `/crews/${encodeURIComponent(crewId)}`;

/** GET /api/crews/:crewId/members (any member). */
export const membersQuery = (crewId: string) =>
  queryOptions({
    queryKey: ['crews', crewId, 'members'],
    queryFn: () => api.get<MemberView[]>(`${crewPath(crewId)}/members`),
  });

/** GET /api/crews/:crewId/invites: pending invites (owners only). */
export const invitesQuery = (crewId: string) =>
  queryOptions({
    queryKey: ['crews', crewId, 'invites'],
    queryFn: () => api.get<InviteView[]>(`${crewPath(crewId)}/invites`),
  });

/** PATCH /api/crews/:crewId/members/:userId; demoting the last owner is refused (409 "last_owner"). */
export function changeMemberRole(crewId: string, userId: string, role: CrewRole): Promise<MemberView> {
  return api.patch<MemberView>(`${crewPath(crewId)}/members/${encodeURIComponent(userId)}`, { role });
}

/** DELETE /api/crews/:crewId/members/:userId (owners). */
export function removeMember(crewId: string, userId: string): Promise<void> {
  return api.delete(`${crewPath(crewId)}/members/${encodeURIComponent(userId)}`);
}

/** POST /api/crews/:crewId/invites: e-mails a single-use link. */
export function createInvite(crewId: string, body: CreateInviteRequest): Promise<InviteView> {
  return api.post<InviteView>(`${crewPath(crewId)}/invites`, body);
}

/** DELETE /api/crews/:crewId/invites/:inviteId: the link stops working. */
export function revokeInvite(crewId: string, inviteId: string): Promise<void> {
  return api.delete(`${crewPath(crewId)}/invites/${encodeURIComponent(inviteId)}`);
}

/** What the owner handing the crew over becomes. */
export type StayAs = 'angler' | 'viewer' | 'leave';

/** POST /api/crews/:crewId/hand-over (owners): the member becomes an owner and the caller steps down, in one step. */
export function handOverCrew(crewId: string, userId: string, stayAs: StayAs): Promise<MemberView[]> {
  return api.post<MemberView[]>(`${crewPath(crewId)}/hand-over`, { userId, stayAs });
}
