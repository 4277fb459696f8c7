import { ProjectionCheckpoint } from './projection-checkpoint.entity';
import { RmCatchFact } from './rm-catch-fact.entity';
import { RmCompetitionDay } from './rm-competition-day.entity';
import { RmEvent } from './rm-event.entity';
import { RmFindOutcome } from './rm-find-outcome.entity';
import { RmFind } from './rm-find.entity';
import { RmGroupStats } from './rm-group-stats.entity';
import { RmLake } from './rm-lake.entity';
import { RmStop } from './rm-stop.entity';

export { ProjectionCheckpoint, RmCatchFact, RmCompetitionDay, RmEvent, RmFind, RmFindOutcome, RmGroupStats, RmLake, RmStop };

/** The read-model entities (written only by projections, read only by query handlers). */
export const READ_MODEL_ENTITIES = [
  RmLake,
  RmEvent,
  RmCompetitionDay,
  RmFind,
  RmCatchFact,
  RmStop,
  RmFindOutcome,
  RmGroupStats,
  ProjectionCheckpoint,
];

/** Tables a rebuild truncates and refills (the checkpoint is reset separately). */
export const READ_MODEL_TABLES = [
  'rm_lake',
  'rm_event',
  'rm_competition_day',
  'rm_find',
  'rm_catch_fact',
  'rm_stop',
  'rm_find_outcome',
  'rm_group_stats',
] as const;
