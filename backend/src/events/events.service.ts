import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import { recordNotFound } from '../journal/journal-errors';
import { CompetitionDay } from './competition-day.entity';
import { PracticeDay } from './practice-day.entity';
import { TournamentEvent } from './tournament-event.entity';

/** Reads of a crew's events and their days, always scoped by the crew in the query. */
@Injectable()
export class EventsService {
  constructor(private readonly em: EntityManager) {}

  list(crewId: string, lakeId?: string): Promise<TournamentEvent[]> {
    return this.em.find(TournamentEvent, { crewId, ...(lakeId ? { lakeId } : {}) }, { orderBy: { createdAt: 'asc' } });
  }

  async get(crewId: string, eventId: string, em: EntityManager = this.em): Promise<TournamentEvent> {
    const event = await em.findOne(TournamentEvent, { id: eventId, crewId });
    if (!event) throw recordNotFound('event');
    return event;
  }

  practiceDays(crewId: string, eventId: string): Promise<PracticeDay[]> {
    return this.em.find(PracticeDay, { crewId, eventId }, { orderBy: { date: 'asc' } });
  }

  competitionDays(crewId: string, eventId: string, em: EntityManager = this.em): Promise<CompetitionDay[]> {
    return em.find(CompetitionDay, { crewId, eventId }, { orderBy: { date: 'asc' } });
  }
}
