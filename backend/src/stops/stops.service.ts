import { LockMode } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { StopView } from '@shoalbook/shared';
import { Catch } from '../catches/catch.entity';
import { findsInDatabase } from '../catches/find-lookup';
import type { CrewAccess } from '../crews/access/request-context';
import { CompetitionDay } from '../events/competition-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import { recordNotFound, unknownReference } from '../journal/journal-errors';
import { canSeePositions } from '../journal/positions';
import { Lake } from '../lakes/lake.entity';
import { User } from '../users/user.entity';
import { attributeCatches, type StopCatches } from './stop-attribution';
import type { StopContext } from './stop-input';
import { Stop } from './stop.entity';

const ids = <T>(rows: readonly T[], key: (r: T) => string | null) => [
  ...new Set(rows.map(key).filter((v): v is string => !!v)),
];

/** Reads of a crew's stops (scoped by crew in every query), with the catches their spans hold. */
@Injectable()
export class StopsService {
  constructor(private readonly em: EntityManager) {}

  async list(
    access: CrewAccess,
    filter: { eventId?: string; competitionDayId?: string; limit?: number; offset?: number },
  ): Promise<{ views: StopView[]; total: number }> {
    const where = {
      crewId: access.crewId,
      ...(filter.eventId ? { eventId: filter.eventId } : {}),
      ...(filter.competitionDayId ? { competitionDayId: filter.competitionDayId } : {}),
    };
    const [stops, total] = await this.em.findAndCount(Stop, where, {
      orderBy: { arrivedAt: 'asc', id: 'asc' },
      limit: filter.limit ?? 10_000,
      offset: filter.offset ?? 0,
    });
    return { views: await this.views(access, stops), total };
  }

  async get(access: CrewAccess, stopId: string): Promise<StopView> {
    const stop = await this.em.findOne(Stop, { id: stopId, crewId: access.crewId });
    if (!stop) throw recordNotFound('stop');
    return (await this.views(access, [stop]))[0]!;
  }

  /** The day's stops with the catches their spans hold, and the day's catches in no stop. */
  async attribution(
    em: EntityManager,
    crewId: string,
    dayIds: string[],
  ): Promise<{ byStop: Map<string, StopCatches>; unattached: string[] }> {
    if (!dayIds.length) return { byStop: new Map(), unattached: [] };
    const stops = await em.find(Stop, { crewId, competitionDayId: { $in: dayIds } });
    const catches = await em.find(
      Catch,
      { crewId, competitionDayId: { $in: dayIds } },
      { fields: ['id', 'caughtAt', 'lat', 'lon', 'competitionDayId'], orderBy: { caughtAt: 'asc', id: 'asc' } },
    );
    const findIds = ids(stops, (s) => s.findId);
    const finds = new Map(
      (findIds.length
        ? await em.find(Find, { id: { $in: findIds }, crewId }, { fields: ['id', 'lat', 'lon'] })
        : []
      ).map((f) => [f.id, { lat: f.lat, lon: f.lon }]),
    );
    const byStop = new Map<string, StopCatches>();
    const unattached: string[] = [];
    for (const dayId of dayIds) {
      const day = attributeCatches(
        stops
          .filter((s) => s.competitionDayId === dayId)
          .map((s) => ({ ...s, find: s.findId ? (finds.get(s.findId) ?? null) : null })),
        catches.filter((c) => c.competitionDayId === dayId),
      );
      for (const [k, v] of day.byStop) byStop.set(k, v);
      unattached.push(...day.unattached);
    }
    return { byStop, unattached };
  }

  async views(access: CrewAccess, stops: Stop[], em: EntityManager = this.em): Promise<StopView[]> {
    if (!stops.length) return [];
    const crewId = access.crewId;
    const dayIds = ids(stops, (s) => s.competitionDayId);
    const days = new Map((await em.find(CompetitionDay, { id: { $in: dayIds }, crewId })).map((d) => [d.id, d]));
    const findIds = ids(stops, (s) => s.findId);
    const findNames = new Map(
      (findIds.length ? await em.find(Find, { id: { $in: findIds }, crewId }, { fields: ['id', 'name'] }) : []).map(
        (f) => [f.id, f.name],
      ),
    );
    const userIds = ids(stops, (s) => s.loggedById);
    const users = new Map(
      (userIds.length ? await em.find(User, { id: { $in: userIds } }, { fields: ['id', 'displayName'] }) : []).map(
        (u) => [u.id, u.displayName],
      ),
    );
    const { byStop } = await this.attribution(em, crewId, dayIds);
    const showPositions = canSeePositions(access);
    return stops.map((s) => {
      const catches = byStop.get(s.id) ?? { catchIds: [], catchesToCheck: [] };
      return {
        id: s.id,
        eventId: s.eventId,
        competitionDayId: s.competitionDayId,
        competitionDate: days.get(s.competitionDayId)?.date ?? '',
        findId: s.findId,
        findName: s.findId ? (findNames.get(s.findId) ?? null) : null,
        lat: showPositions ? s.lat : null,
        lon: showPositions ? s.lon : null,
        arrivedAt: s.arrivedAt.toISOString(),
        leftAt: s.leftAt ? s.leftAt.toISOString() : null,
        minutes: s.leftAt ? Math.round((s.leftAt.getTime() - s.arrivedAt.getTime()) / 60_000) : null,
        waterTempF: s.waterTempF,
        lure: s.lure,
        technique: s.technique,
        notes: s.notes,
        loggedBy: s.loggedById
          ? { userId: s.loggedById, displayName: users.get(s.loggedById) ?? 'former member' }
          : null,
        catchIds: catches.catchIds,
        catchesToCheck: showPositions ? catches.catchesToCheck : [],
        version: s.version,
      };
    });
  }

  /**
   * The day, its event and lake, and the lake's finds: what checking a stop on that day needs. The day's row is
   * locked for the transaction, so stops of one day are written one at a time and overlaps cannot slip past.
   */
  async context(em: EntityManager, crewId: string, dayId: string): Promise<StopContext & { event: TournamentEvent }> {
    const day = await em.findOne(CompetitionDay, { id: dayId, crewId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (!day) throw unknownReference('competitionDayId', 'competition day');
    const event = await em.findOneOrFail(TournamentEvent, { id: day.eventId, crewId });
    const lake = await em.findOneOrFail(Lake, { id: event.lakeId, crewId });
    return { lake, day, event, finds: findsInDatabase(em, crewId, lake.id) };
  }
}
