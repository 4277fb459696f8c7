import { AuthToken } from '../auth/auth-token.entity';
import { Session } from '../auth/session.entity';
import { Crew } from '../crews/crew.entity';
import { Invite } from '../crews/invite.entity';
import { Membership } from '../crews/membership.entity';
import { JOURNAL_ENTITIES } from '../journal/journal-entities';
import { User } from '../users/user.entity';
import { READ_MODEL_ENTITIES } from '../read-models';

/**
 * Every entity, listed once. Features add theirs here (discovery by reflect-metadata needs the classes,
 * not folder globs, so the same list works under tsc, vitest and the CLI).
 */
export const ENTITIES = [
  User,
  Session,
  AuthToken,
  Crew,
  Membership,
  Invite,
  ...JOURNAL_ENTITIES,
  ...READ_MODEL_ENTITIES,
];
