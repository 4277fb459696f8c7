import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, Index, PrimaryKey, Property } from '@mikro-orm/core';
import type { FindKind, FindSource, FoundHow, VegetationDensity } from '@shoalbook/shared';

/**
 * A practice find: a place read on the sonar and marked as a waypoint. Canonical units (ft, °F) beside
 * exactly what the angler typed (`*Value` + `*Unit`).
 */
@Entity({ tableName: 'finds' })
@Index({ name: 'finds_crew_lake_index', properties: ['crewId', 'lakeId'] })
@Index({ name: 'finds_crew_event_index', properties: ['crewId', 'eventId'] })
export class Find {
  [OptionalProps]?:
    | 'eventId'
    | 'practiceDayId'
    | 'markedAt'
    | 'depthFt'
    | 'depthValue'
    | 'depthUnit'
    | 'subKind'
    | 'hardness'
    | 'vegetationDensity'
    | 'baitSeen'
    | 'fishMarked'
    | 'frequencyKhz'
    | 'foundHow'
    | 'waterTempF'
    | 'waterTempValue'
    | 'waterTempUnit'
    | 'notes'
    | 'photoId'
    | 'source'
    | 'version'
    | 'createdAt'
    | 'updatedAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid' })
  crewId: string;

  @Property({ type: 'uuid' })
  lakeId: string;

  @Property({ type: 'uuid', nullable: true })
  eventId: string | null = null;

  @Property({ type: 'uuid', nullable: true })
  practiceDayId: string | null = null;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Property({ type: 'datetime', length: 3, nullable: true })
  markedAt: Date | null = null;

  @Property({ type: 'double' })
  lat: number;

  @Property({ type: 'double' })
  lon: number;

  @Property({ type: 'double', nullable: true })
  depthFt: number | null = null;

  @Property({ type: 'double', nullable: true })
  depthValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  depthUnit: string | null = null;

  @Property({ type: 'string', length: 20 })
  kind: FindKind;

  @Property({ type: 'string', length: 40 })
  subKind: string = '';

  @Property({ type: 'tinyint', nullable: true })
  hardness: number | null = null;

  @Property({ type: 'string', length: 10, nullable: true })
  vegetationDensity: VegetationDensity | null = null;

  @Property({ type: 'boolean' })
  baitSeen: boolean = false;

  @Property({ type: 'integer', nullable: true })
  fishMarked: number | null = null;

  @Property({ type: 'double', nullable: true })
  frequencyKhz: number | null = null;

  @Property({ type: 'string', length: 10, nullable: true })
  foundHow: FoundHow | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempF: number | null = null;

  @Property({ type: 'double', nullable: true })
  waterTempValue: number | null = null;

  @Property({ type: 'string', length: 2, nullable: true })
  waterTempUnit: string | null = null;

  @Property({ type: 'text' })
  notes: string = '';

  @Property({ type: 'uuid', nullable: true })
  photoId: string | null = null;

  @Property({ type: 'string', length: 8 })
  source: FindSource = 'form';

  @Property({ type: 'integer', version: true })
  version: number = 1;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', length: 3, onUpdate: () => new Date() })
  updatedAt: Date = new Date();
}
