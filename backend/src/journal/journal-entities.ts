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

/** The journal's entities, spread into the ORM's entity list. */
export const JOURNAL_ENTITIES = [
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
];
