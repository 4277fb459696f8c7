import type { CrewRole, CrewView, InviteView, MemberView } from '@shoalbook/shared';
import type { Crew } from './crew.entity';
import type { Invite } from './invite.entity';
import type { Membership } from './membership.entity';

export function toCrewView(crew: Crew, role: CrewRole): CrewView {
  return { id: crew.id, name: crew.name, role, viewersSeePositions: crew.viewersSeePositions };
}

/** Needs the membership's user loaded. */
export function toMemberView(m: Membership): MemberView {
  return {
    userId: m.user.id,
    email: m.user.email,
    displayName: m.user.displayName,
    role: m.role,
    joinedAt: m.joinedAt.toISOString(),
  };
}

export function toInviteView(i: Invite): InviteView {
  return {
    id: i.id,
    email: i.email,
    role: i.role,
    expiresAt: i.expiresAt.toISOString(),
    createdAt: i.createdAt.toISOString(),
  };
}
