import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';
import type { Fate, Species } from '@shoalbook/shared';

/**
 * Read model: one catch with what the timing reports need, derived once in the lake's zone: wall-clock
 * minutes after local midnight, minutes from sunrise and the solunar period (@shoalbook/analytics).
 * `weightUlb` is the weight in micro-pounds (integer), so sums are exact whatever order rows are added in.
 */
@Entity({ tableName: 'rm_catch_fact' })
// Covers the projector's per-event catch-grouping sums (Migration20261221000000, Migration20261230000000).
@Index({
  name: 'rm_catch_fact_event_groups_index',
  properties: ['eventId', 'solunarPeriod', 'timeOfDay', 'bagCounted', 'weightUlb'],
})
@Index({ name: 'rm_catch_fact_find_index', properties: ['findId'] })
@Index({ name: 'rm_catch_fact_crew_lake_index', properties: ['crewId', 'lakeId'] })
export class RmCatchFact {
  @PrimaryKey({ type: 'uuid' })
  id: string;

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  @Property({ type: 'uuid' })
  competitionDayId: string;

  /** The competition day's lake-local date. */
  @Property({ type: 'string', columnType: 'char(10)' })
  dayDate: string;

  @Property({ type: 'uuid', nullable: true })
  findId: string | null = null;

  @Property({ type: 'datetime', length: 3 })
  caughtAt: Date;

  @Property({ type: 'double' })
  weightLb: number;

  @Property({ type: 'bigint' })
  weightUlb: number;

  @Property({ type: 'double', nullable: true })
  lengthIn: number | null = null;

  @Property({ type: 'string', length: 12 })
  species: Species;

  @Property({ type: 'string', length: 10 })
  fate: Fate;

  @Property({ type: 'string', length: 120 })
  lure: string = '';

  @Property({ type: 'double', nullable: true })
  lat: number | null = null;

  @Property({ type: 'double', nullable: true })
  lon: number | null = null;

  @Property({ type: 'smallint' })
  localMinutes: number;

  @Property({ type: 'smallint', nullable: true })
  minutesFromSunrise: number | null = null;

  /** 'major' | 'minor' | 'none'. */
  @Property({ type: 'string', length: 5 })
  solunarPeriod: string;

  /** early | morning | midday | afternoon | late (TIME_OF_DAY_BANDS). */
  @Property({ type: 'string', length: 10 })
  timeOfDay: string;

  /** The crew member who logged it (an individual event's bag is per angler). */
  @Property({ type: 'uuid', nullable: true })
  loggedBy: string | null = null;

  /** The fish's state under the day's bag rule (analytics dayBag): counted, culled, released, short or dead. */
  @Property({ type: 'string', length: 10 })
  bagState: string = '';

  /** In the day's counted bag (a counted dead fish too). */
  @Property({ type: 'boolean' })
  bagCounted: boolean = false;
}
