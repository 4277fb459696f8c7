import { AuthToken } from '../auth/auth-token.entity';
import { Catch } from '../catches/catch.entity';
import { CompetitionDay } from '../events/competition-day.entity';
import { PracticeDay } from '../events/practice-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import { IdempotencyKey } from '../idempotency/idempotency-key.entity';
import { JournalEvent } from '../journal-events/journal-event.entity';
import { Lake } from '../lakes/lake.entity';
import { Photo } from '../photos/photo.entity';
import { Stop } from '../stops/stop.entity';
import { WeighIn } from '../weigh-ins/weigh-in.entity';
import { Session } from '../auth/session.entity';
import { Crew } from '../crews/crew.entity';
import { Invite } from '../crews/invite.entity';
import { Membership } from '../crews/membership.entity';
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
  Lake,
  TournamentEvent,
  PracticeDay,
  CompetitionDay,
  Find,
  Catch,
  Stop,
  WeighIn,
  Photo,
  JournalEvent,
  IdempotencyKey,
  ...READ_MODEL_ENTITIES,
];
