import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * Read model: a find's outcome in one event, recomputed from rm_catch_fact whenever its catches or the find
 * change. One row per find and event it was marked in (in the event's practice), stopped at or caught on.
 * Group keys are '' when not recorded.
 */
@Entity({ tableName: 'rm_find_outcome' })
@Index({ name: 'rm_find_outcome_crew_event_index', properties: ['crewId', 'eventId'] })
@Index({ name: 'rm_find_outcome_crew_lake_index', properties: ['crewId', 'lakeId'] })
export class RmFindOutcome {
  @PrimaryKey({ type: 'uuid' })
  findId: string;

  @PrimaryKey({ type: 'uuid' })
  eventId: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'string', length: 20 })
  kind: string;

  @Property({ type: 'string', length: 40 })
  subKind: string;

  @Property({ type: 'string', length: 16 })
  depthBand: string;

  @Property({ type: 'string', length: 2 })
  hardness: string;

  @Property({ type: 'string', length: 16 })
  temperatureBand: string;

  /** Marked in this event's practice. */
  @Property({ type: 'boolean' })
  practiced: boolean;

  @Property({ type: 'boolean' })
  fished: boolean;

  @Property({ type: 'integer' })
  fishCount: number;

  @Property({ type: 'integer' })
  weighedCount: number;

  @Property({ type: 'bigint' })
  weightUlb: number;

  @Property({ type: 'bigint' })
  weighedWeightUlb: number;

  /** Stops on the find on this event's competition days. */
  @Property({ type: 'integer' })
  stopCount: number = 0;

  /** Time on the find over those stops (whole seconds). */
  @Property({ type: 'bigint' })
  secondsFished: number = 0;

  @Property({ type: 'datetime', length: 3, nullable: true })
  firstBiteAt: Date | null = null;
}
