import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import { recordNotFound } from '../journal/journal-errors';
import { Lake } from './lake.entity';

/** Reads of a crew's lakes, always scoped by the crew in the query. */
@Injectable()
export class LakesService {
  constructor(private readonly em: EntityManager) {}

  list(crewId: string): Promise<Lake[]> {
    return this.em.find(Lake, { crewId }, { orderBy: { name: 'asc' } });
  }

  async get(crewId: string, lakeId: string, em: EntityManager = this.em): Promise<Lake> {
    const lake = await em.findOne(Lake, { id: lakeId, crewId });
    if (!lake) throw recordNotFound('lake');
    return lake;
  }
}
