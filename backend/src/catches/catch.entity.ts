import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, Index, PrimaryKey, Property } from '@mikro-orm/core';
import type { Fate, Species } from '@shoalbook/shared';

/**
 * A fish caught on a competition day. Canonical units (lb, in, ft, °F) beside exactly what the angler
 * typed (`*Value` + `*Unit`; pounds–ounces keep the ounces in `weightOunces`).
 */
@Entity({ tableName: 'catches' })
@Index({ name: 'catches_crew_event_index', properties: ['crewId', 'eventId'] })
@Index({ name: 'catches_crew_day_index', properties: ['crewId', 'competitionDayId'] })
@Index({ name: 'catches_find_index', properties: ['findId'] })
export class Catch {
  [OptionalProps]?:
    | 'findId'
    | 'attributionDistanceM'
    | 'lat'
    | 'lon'
    | 'lengthIn'
    | 'lengthValue'
    | 'lengthUnit'
    | 'weightOunces'
    | 'weightFlagged'
    | 'lure'
    | 'technique'
    | 'depthFt'
    | 'depthValue'
    | 'depthUnit'
    | 'waterTempF'
    | 'waterTempValue'
    | 'waterTempUnit'
    | 'notes'
    | 'photoId'
    | 'loggedBy'
    | 'version'
    | 'createdAt'
    | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  eventId: string;

  @Property({ type: 'uuid' })
  competitionDayId: string;

  @Property({ type: 'datetime', length: 3 })
  caughtAt: Date;

  @Property({ type: 'uuid', nullable: true })
  findId: string | null = null;

  /** Set when the find was attributed from the catch's coordinates (m). */
  @Property({ type: 'double', nullable: true })
  attributionDistanceM: number | null = null;

  @Property({ type: 'double', nullable: true })
  lat: number | null = null;

  @Property({ type: 'double', nullable: true })
  lon: number | null = null;

  @Property({ type: 'string', length: 12 })
  species: Species;

  @Property({ type: 'double', nullable: true })
  lengthIn: number | null = null;

  @Property({ type: 'double', nullable: true })
  lengthValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  lengthUnit: string | null = null;

  @Property({ type: 'double' })
  weightLb: number;

  @Property({ type: 'double' })
  weightValue: number;

  @Property({ type: 'string', length: 5 })
  weightUnit: string;

  @Property({ type: 'double', nullable: true })
  weightOunces: number | null = null;

  @Property({ type: 'boolean' })
  weightFlagged: boolean = false;

  @Property({ type: 'string', length: 120 })
  lure: string = '';

  @Property({ type: 'string', length: 120 })
  technique: string = '';

  @Property({ type: 'double', nullable: true })
  depthFt: number | null = null;

  @Property({ type: 'double', nullable: true })
  depthValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  depthUnit: string | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  waterTempUnit: string | null = null;

  @Property({ type: 'string', length: 10 })
  fate: Fate;

  @Property({ type: 'text' })
  notes: string = '';

  @Property({ type: 'uuid', nullable: true })
  photoId: string | null = null;

  /** The crew member (user id) who logged the catch, from the session; null for catches from before it was kept. */
  @Property({ type: 'uuid', nullable: true })
  loggedBy: string | null = null;

  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
