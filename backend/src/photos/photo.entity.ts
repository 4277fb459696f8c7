import { randomUUID } from 'node:crypto';
import { Entity, OptionalProps, PrimaryKey, Property } from '@mikro-orm/core';

/** A re-encoded photo or sonar screenshot (metadata stripped); the bytes live in the storage service. */
@Entity({ tableName: 'photos' })
export class Photo {
  [OptionalProps]?: 'createdAt';

  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'uuid', index: 'photos_crew_index' })
  crewId: string;

  /** Random storage key; never derived from the uploaded file's name. */
  @Property({ type: 'string', length: 80 })
  storageKey: string;

  @Property({ type: 'string', length: 40 })
  contentType: string;

  @Property({ type: 'integer' })
  width: number;

  @Property({ type: 'integer' })
  height: number;

  @Property({ type: 'integer' })
  byteSize: number;

  @Property({ type: 'uuid' })
  uploadedById: string;

  @Property({ type: 'datetime', length: 3 })
  createdAt: Date = new Date();
}
