import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Injectable } from '@nestjs/common';
import type { CrewView, InvitePreview, InviteView, MemberView, UpdateCrewRequest } from '@shoalbook/shared';
import { ApiException, ErrorCode } from '../common/errors/api-errors';
import type { CrewAccess } from './access/request-context';
import { findUsableInvite, inviteInvalid } from './commands/accept-invite.handler';
import { toCrewView, toInviteView, toMemberView } from './crew-views';
import { Invite } from './invite.entity';
import { Membership } from './membership.entity';

/** Reads of crews, members and invites; every query names the crew it is scoped to. */
@Injectable()
export class CrewsService {
  constructor(private readonly em: EntityManager) {}

  async myCrews(userId: string): Promise<CrewView[]> {
    const memberships = await this.em.find(
      Membership,
      { user: userId },
      { populate: ['crew'], orderBy: { joinedAt: 'asc', id: 'asc' } },
    );
    return memberships.map((m) => toCrewView(m.crew, m.role));
  }

  async update(access: CrewAccess, changes: UpdateCrewRequest): Promise<CrewView> {
    const crew = access.crew;
    if (changes.name !== undefined) crew.name = changes.name;
    if (changes.viewersSeePositions !== undefined) crew.viewersSeePositions = changes.viewersSeePositions;
    await this.em.flush();
    return toCrewView(crew, access.role);
  }

  async members(crewId: string): Promise<MemberView[]> {
    const members = await this.em.find(
      Membership,
      { crew: crewId },
      { populate: ['user'], orderBy: { joinedAt: 'asc', id: 'asc' } },
    );
    return members.map(toMemberView);
  }

  async pendingInvites(crewId: string): Promise<InviteView[]> {
    const invites = await this.em.find(
      Invite,
      { crew: crewId, acceptedAt: null, expiresAt: { $gt: new Date() } },
      { orderBy: { createdAt: 'desc', id: 'asc' } },
    );
    return invites.map(toInviteView);
  }

  async revokeInvite(crewId: string, inviteId: string): Promise<void> {
    const deleted = await this.em.nativeDelete(Invite, { id: inviteId, crew: crewId, acceptedAt: null });
    if (deleted !== 1)
      throw new ApiException(HttpStatus.NOT_FOUND, 'No such pending invite in this crew.', ErrorCode.notFound);
  }

  /** What the invite page shows before accepting; 404 token_invalid when unusable. */
  async preview(token: string): Promise<InvitePreview> {
    const invite = await findUsableInvite(this.em, token);
    if (!invite) throw inviteInvalid();
    return {
      crewName: invite.crew.name,
      role: invite.role,
      email: invite.email,
      expiresAt: invite.expiresAt.toISOString(),
    };
  }
}
