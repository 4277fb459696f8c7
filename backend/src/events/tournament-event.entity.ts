import { randomUUID } from 'node:crypto';
import type { EventFormat } from '@shoalbook/shared';
import { Entity, OptionalProps, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * A tournament ("event" in the API) on a lake, with its own rules. Named TournamentEvent in code so it
 * never shadows Node's global `Event`. The rule defaults are common practice, not law.
 */
@Entity({ tableName: 'events' })
@Index({ name: 'events_crew_lake_index', properties: ['crewId', 'lakeId'] })
export class TournamentEvent {
  [OptionalProps]?:
    | 'organiser'
    | 'practiceDates'
    | 'competitionDates'
    | 'fishPerDay'
    | 'minLengthIn'
    | 'deadFishPenaltyLb'
    | 'shortFishPenaltyLb'
    | 'latePenaltyLbPerMinute'
    | 'entryFee'
    | 'payout'
    | 'finalPlace'
    | 'format'
    | 'fieldSize'
    | 'winningLb'
    | 'cutLb'
    | 'rampLat'
    | 'rampLon'
    | 'notes'
    | 'version'
    | 'createdAt'
    | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'string', length: 160 })
  name: string;

  @Property({ type: 'string', length: 160 })
  organiser: string = '';

  /** Local calendar dates (YYYY-MM-DD), ascending. */
  @Property({ type: 'json' })
  practiceDates: string[] = [];

  @Property({ type: 'json' })
  competitionDates: string[] = [];

  @Property({ type: 'integer' })
  fishPerDay: number = 5;

  @Property({ type: 'double', nullable: true })
  minLengthIn: number | null = 12;

  @Property({ type: 'double' })
  deadFishPenaltyLb: number = 0.25;

  @Property({ type: 'double' })
  shortFishPenaltyLb: number = 1;

  @Property({ type: 'double' })
  latePenaltyLbPerMinute: number = 1;

  /** Team (one bag per boat) or individual (a bag per angler): part of the event's rules. */
  @Property({ type: 'string', length: 10 })
  format: EventFormat = 'team';

  @Property({ type: 'double', nullable: true })
  entryFee: number | null = null;

  @Property({ type: 'double', nullable: true })
  payout: number | null = null;

  @Property({ type: 'integer', nullable: true })
  finalPlace: number | null = null;

  /** The event's field from the results sheet: its size, the winning and the cut weight (lb). */
  @Property({ type: 'integer', nullable: true })
  fieldSize: number | null = null;

  @Property({ type: 'double', nullable: true })
  winningLb: number | null = null;

  @Property({ type: 'double', nullable: true })
  cutLb: number | null = null;

  /** The launch and check-in ramp (WGS 84): both set or both null, so the run back has an end point. */
  @Property({ type: 'double', nullable: true })
  rampLat: number | null = null;

  @Property({ type: 'double', nullable: true })
  rampLon: number | null = null;

  @Property({ type: 'text' })
  notes: string = '';

  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
