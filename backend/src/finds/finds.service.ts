import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { FindView } from '@shoalbook/shared';
import type { CrewAccess } from '../crews/access/request-context';
import { PracticeDay } from '../events/practice-day.entity';
import { recordNotFound } from '../journal/journal-errors';
import { canSeePositions } from '../journal/positions';
import { Lake } from '../lakes/lake.entity';
import { SkyService } from '../sky/sky.service';
import { Find } from './find.entity';
import { findView } from './find-view';

/** Reads of a crew's finds, scoped by the crew in every query, with sky context and position privacy. */
@Injectable()
export class FindsService {
  constructor(
    private readonly em: EntityManager,
    private readonly sky: SkyService,
  ) {}

  async list(
    access: CrewAccess,
    filter: { lakeId?: string; eventId?: string; limit?: number; offset?: number },
  ): Promise<{ views: FindView[]; total: number }> {
    const where = {
      crewId: access.crewId,
      ...(filter.lakeId ? { lakeId: filter.lakeId } : {}),
      ...(filter.eventId ? { eventId: filter.eventId } : {}),
    };
    const [finds, total] = await this.em.findAndCount(Find, where, {
      orderBy: { markedAt: 'asc', createdAt: 'asc', id: 'asc' },
      limit: filter.limit ?? 10_000,
      offset: filter.offset ?? 0,
    });
    return { views: await this.views(access, finds), total };
  }

  async get(access: CrewAccess, findId: string): Promise<FindView> {
    const find = await this.em.findOne(Find, { id: findId, crewId: access.crewId });
    if (!find) throw recordNotFound('find');
    return (await this.views(access, [find]))[0]!;
  }

  /** Views of finds of one crew (lakes and practice days fetched in one query each). */
  async views(access: CrewAccess, finds: Find[], em: EntityManager = this.em): Promise<FindView[]> {
    const lakeIds = [...new Set(finds.map((f) => f.lakeId))];
    const dayIds = [...new Set(finds.map((f) => f.practiceDayId).filter((id): id is string => !!id))];
    const lakes = new Map(
      (lakeIds.length ? await em.find(Lake, { id: { $in: lakeIds }, crewId: access.crewId }) : []).map((l) => [
        l.id,
        l,
      ]),
    );
    const days = new Map(
      (dayIds.length ? await em.find(PracticeDay, { id: { $in: dayIds }, crewId: access.crewId }) : []).map((d) => [
        d.id,
        d.date,
      ]),
    );
    const showPositions = canSeePositions(access);
    return finds.map((f) => {
      const lake = lakes.get(f.lakeId)!;
      return findView(f, {
        showPositions,
        practiceDate: f.practiceDayId ? (days.get(f.practiceDayId) ?? null) : null,
        sky: f.markedAt ? this.sky.at(lake, f.markedAt) : null,
      });
    });
  }
}
