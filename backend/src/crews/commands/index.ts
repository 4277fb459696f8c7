import { AcceptInviteHandler } from './accept-invite.handler';
import { ChangeMemberRoleHandler } from './change-member-role.handler';
import { CreateCrewHandler } from './create-crew.handler';
import { CreateInviteHandler } from './create-invite.handler';
import { DeleteCrewHandler } from './delete-crew.handler';
import { HandOverCrewHandler } from './hand-over-crew.handler';
import { RemoveMemberHandler } from './remove-member.handler';

export const CREW_COMMAND_HANDLERS = [
  CreateCrewHandler,
  ChangeMemberRoleHandler,
  RemoveMemberHandler,
  CreateInviteHandler,
  AcceptInviteHandler,
  DeleteCrewHandler,
  HandOverCrewHandler,
];
