import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import { CATCH_HISTORY_FIELDS, type CatchHistoryField, type CatchView, type RecordChange } from '@shoalbook/shared';
import type { CrewAccess } from '../crews/access/request-context';
import { CompetitionDay } from '../events/competition-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import { RecordHistoryService } from '../journal-events/record-history.service';
import { recordNotFound, unknownReference } from '../journal/journal-errors';
import type { CatchIdentity } from '../imports/catch-duplicates';
import { canSeePositions } from '../journal/positions';
import { Lake } from '../lakes/lake.entity';
import { Photo } from '../photos/photo.entity';
import { SkyService } from '../sky/sky.service';
import { User } from '../users/user.entity';
import { Catch } from './catch.entity';
import type { CatchContext, ImportCatchContext } from './catch-input';
import { catchView } from './catch-view';
import { findsInDatabase, loadLakeFinds } from './find-lookup';

/** Reads of a crew's catches (scoped by crew in every query) and the context checks need. */
@Injectable()
export class CatchesService {
  constructor(
    private readonly em: EntityManager,
    private readonly sky: SkyService,
    private readonly history: RecordHistoryService,
  ) {}

  /** Every change to the catch's weight and length, as its journal kept them (a deleted catch's too). */
  async changes(access: CrewAccess, catchId: string): Promise<RecordChange<CatchHistoryField>[]> {
    const changes = await this.history.changes(access.crewId, 'catch', catchId, CATCH_HISTORY_FIELDS);
    if (!changes) throw recordNotFound('catch');
    return changes;
  }

  async list(
    access: CrewAccess,
    filter: { eventId?: string; competitionDayId?: string; limit?: number; offset?: number },
  ): Promise<{ views: CatchView[]; total: number }> {
    const where = {
      crewId: access.crewId,
      ...(filter.eventId ? { eventId: filter.eventId } : {}),
      ...(filter.competitionDayId ? { competitionDayId: filter.competitionDayId } : {}),
    };
    const [catches, total] = await this.em.findAndCount(Catch, where, {
      orderBy: { caughtAt: 'asc', id: 'asc' },
      limit: filter.limit ?? 10_000,
      offset: filter.offset ?? 0,
    });
    return { views: await this.views(access, catches), total };
  }

  async get(access: CrewAccess, catchId: string): Promise<CatchView> {
    const c = await this.em.findOne(Catch, { id: catchId, crewId: access.crewId });
    if (!c) throw recordNotFound('catch');
    return (await this.views(access, [c]))[0]!;
  }

  async views(access: CrewAccess, catches: Catch[], em: EntityManager = this.em): Promise<CatchView[]> {
    const crewId = access.crewId;
    const ids = <K extends keyof Catch>(k: K) =>
      [...new Set(catches.map((c) => c[k]).filter((v): v is NonNullable<Catch[K]> => !!v))] as string[];
    const days = new Map(
      (catches.length ? await em.find(CompetitionDay, { id: { $in: ids('competitionDayId') }, crewId }) : []).map(
        (d) => [d.id, d],
      ),
    );
    const findIds = ids('findId');
    const finds = new Map(
      (findIds.length ? await em.find(Find, { id: { $in: findIds }, crewId }, { fields: ['id', 'name'] }) : []).map(
        (f) => [f.id, f.name],
      ),
    );
    const events = new Map(
      (catches.length ? await em.find(TournamentEvent, { id: { $in: ids('eventId') }, crewId }) : []).map((e) => [
        e.id,
        e.lakeId,
      ]),
    );
    const lakeIds = [...new Set(events.values())];
    const lakes = new Map(
      (lakeIds.length ? await em.find(Lake, { id: { $in: lakeIds }, crewId }) : []).map((l) => [l.id, l]),
    );
    const names = await this.names(em, ids('loggedBy'));
    const showPositions = canSeePositions(access);
    return catches.map((c) => {
      const lake = lakes.get(events.get(c.eventId)!)!;
      return catchView(c, {
        showPositions,
        competitionDate: days.get(c.competitionDayId)!.date,
        findName: c.findId ? (finds.get(c.findId) ?? null) : null,
        sky: this.sky.at(lake, c.caughtAt),
        loggedByName: c.loggedBy ? (names.get(c.loggedBy) ?? null) : null,
      });
    });
  }

  /** Display names of crew members by user id. */
  private async names(em: EntityManager, userIds: string[]): Promise<Map<string, string>> {
    if (!userIds.length) return new Map();
    const users = await em.find(User, { id: { $in: userIds } }, { fields: ['id', 'displayName'] });
    return new Map(users.map((u) => [u.id, u.displayName]));
  }

  /** The view of a catch just checked in `ctx`: the day, lake and find are already at hand, so nothing is read again. */
  async viewInContext(access: CrewAccess, c: Catch, ctx: CatchContext): Promise<CatchView> {
    const find = c.findId ? await ctx.finds.byId(c.findId) : undefined;
    return catchView(c, {
      showPositions: canSeePositions(access),
      competitionDate: ctx.day.date,
      findName: find?.name ?? null,
      sky: this.sky.at(ctx.lake, c.caughtAt),
      loggedByName: c.loggedBy ? ((await this.names(this.em, [c.loggedBy])).get(c.loggedBy) ?? null) : null,
    });
  }

  /** The day, its event and lake, and the lake's finds looked up as needed: everything checking one catch on that day needs. */
  async context(em: EntityManager, crewId: string, dayId: string): Promise<CatchContext & { event: TournamentEvent }> {
    const day = await em.findOne(CompetitionDay, { id: dayId, crewId });
    if (!day) throw unknownReference('competitionDayId', 'competition day');
    const event = await em.findOneOrFail(TournamentEvent, { id: day.eventId, crewId });
    const lake = await em.findOneOrFail(Lake, { id: event.lakeId, crewId });
    return { lake, day, event, finds: findsInDatabase(em, crewId, lake.id), photoIds: this.photoIds(em, crewId) };
  }

  /** For an import's duplicate check: the event's catches already logged, only the fields that identify a fish. */
  async loggedCatchIdentities(em: EntityManager, crewId: string, eventId: string): Promise<CatchIdentity[]> {
    return em.find(
      Catch,
      { crewId, eventId },
      { fields: ['id', 'competitionDayId', 'caughtAt', 'species', 'weightLb'] },
    );
  }

  /** For an import: the event's lake and all its finds, loaded once for thousands of rows. */
  async lakeContext(em: EntityManager, crewId: string, event: TournamentEvent): Promise<ImportCatchContext> {
    const lake = await em.findOneOrFail(Lake, { id: event.lakeId, crewId });
    return { lake, finds: await loadLakeFinds(em, crewId, lake.id), photoIds: this.photoIds(em, crewId) };
  }

  private photoIds(em: EntityManager, crewId: string) {
    return async (id: string) => (await em.count(Photo, { id, crewId })) > 0;
  }
}
