import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/core';
import type { EntityManager as SqlEntityManager } from '@mikro-orm/mariadb';
import { Seeder } from '@mikro-orm/seeder';
import { demoJournal } from '@shoalbook/fixtures';
import { Catch } from '../../catches/catch.entity';
import { flagWeight } from '../../catches/catch-input';
import { Crew } from '../../crews/crew.entity';
import { CompetitionDay } from '../../events/competition-day.entity';
import { PracticeDay } from '../../events/practice-day.entity';
import { TournamentEvent } from '../../events/tournament-event.entity';
import { Find } from '../../finds/find.entity';
import { insertRecordsBulk } from '../../imports/bulk-insert';
import { JournalRecorder } from '../../journal-events/journal-events.service';
import { recordState } from '../../journal-events/record-state';
import { Lake } from '../../lakes/lake.entity';
import { Stop } from '../../stops/stop.entity';
import { User } from '../../users/user.entity';
import { WeighIn } from '../../weigh-ins/weigh-in.entity';
import { DEMO_CREW_NAME } from './demo-accounts';
import type { DemoSeedContext } from './demo-seed-context';

/**
 * The demo journal from @shoalbook/fixtures (invented lakes, events, finds, catches, weigh-ins) for the
 * demo crew, when that crew has no lakes yet. Written through the same bulk path as the imports, with a
 * journal_event row per record (EventCreated carries its days), so the read model can be rebuilt from
 * the journal alone. One transaction: all or nothing.
 */
export class JournalDemoSeeder extends Seeder {
  async run(em: EntityManager, context?: Partial<DemoSeedContext>): Promise<void> {
    const sql = em as unknown as SqlEntityManager;
    const crew = context?.crews?.[DEMO_CREW_NAME] ?? (await sql.findOne(Crew, { name: DEMO_CREW_NAME }));
    if (!crew) return;
    if (await sql.count(Lake, { crewId: crew.id })) return;
    const owner = context?.users?.['owner@demo.test'] ?? (await sql.findOne(User, { email: 'owner@demo.test' }));
    const angler = context?.users?.['angler@demo.test'] ?? (await sql.findOne(User, { email: 'angler@demo.test' }));
    // The boat's two anglers: the demo's owner and angler accounts.
    const loggedBy = (who: 'owner' | 'angler' | undefined) => (who === 'angler' ? angler : owner)?.id ?? null;
    const j = demoJournal();
    // Fresh ids, so the demo can be loaded for more than one crew (tests) without key clashes.
    const ids = new Map<string, string>();
    const id = (fixtureId: string): string =>
      ids.get(fixtureId) ?? (ids.set(fixtureId, randomUUID()), ids.get(fixtureId)!);
    const idOrNull = (fixtureId: string | null): string | null => (fixtureId === null ? null : id(fixtureId));
    const now = new Date();
    const stamp = { createdAt: now, updatedAt: now };

    await sql.transactional(async (tx) => {
      const log = new JournalRecorder(tx, crew.id, owner?.id ?? null);
      const lakes = j.lakes.map((l) =>
        Object.assign(new Lake(), {
          ...stamp,
          id: id(l.id),
          crewId: crew.id,
          name: l.name,
          region: l.region,
          timeZone: l.timeZone,
          lat: l.lat,
          lon: l.lon,
          areaAcres: l.areaAcres,
          notes: l.notes,
        }),
      );
      await insertRecordsBulk(tx, log, 'Lake', lakes, (l) => ({
        type: 'LakeCreated',
        aggregateType: 'lake',
        aggregateId: l.id,
      }));

      const events = j.events.map((e) =>
        Object.assign(new TournamentEvent(), {
          ...stamp,
          id: id(e.id),
          crewId: crew.id,
          lakeId: id(e.lakeId),
          name: e.name,
          organiser: e.organiser,
          practiceDates: e.practiceDates,
          competitionDates: e.competitionDates,
          ...e.rules,
          entryFee: e.entryFee,
          payout: e.payout,
          finalPlace: e.finalPlace,
          fieldSize: e.field?.fieldSize ?? null,
          winningLb: e.field?.winningLb ?? null,
          cutLb: e.field?.cutLb ?? null,
          rampLat: e.ramp?.lat ?? null,
          rampLon: e.ramp?.lon ?? null,
          notes: e.notes,
        }),
      );
      const practiceDays = j.events.flatMap((e) =>
        e.practiceDates.map((date) => Object.assign(new PracticeDay(), { crewId: crew.id, eventId: id(e.id), date })),
      );
      const competitionDays = j.competitionDays.map((d) =>
        Object.assign(new CompetitionDay(), {
          id: id(d.id),
          crewId: crew.id,
          eventId: id(d.eventId),
          date: d.date,
          startTime: d.startLocal,
          checkInTime: d.checkInLocal,
          weatherNotes: d.weatherNotes,
          waterTempF: d.waterTempF,
          waterTempValue: d.waterTempF,
          waterTempUnit: 'F',
        }),
      );
      // Days belong to their event's EventCreated payload, so they are inserted without events of their own.
      await insertRecordsBulk(tx, log, 'TournamentEvent', events, (e) => ({
        type: 'EventCreated',
        aggregateType: 'event',
        aggregateId: e.id,
      }));
      await insertRecordsBulk(tx, log, 'PracticeDay', practiceDays, null);
      await insertRecordsBulk(tx, log, 'CompetitionDay', competitionDays, null);
      // Replace the event payloads queued above with ones that carry their days, like the API's EventCreated.
      log.replacePayloads('EventCreated', (aggregateId, payload) => ({
        ...payload,
        practiceDays: practiceDays
          .filter((d) => d.eventId === aggregateId)
          .map((d) => recordState(tx, 'PracticeDay', d)),
        competitionDays: competitionDays
          .filter((d) => d.eventId === aggregateId)
          .map((d) => recordState(tx, 'CompetitionDay', d)),
      }));

      const practiceDayId = new Map(practiceDays.map((d) => [`${d.eventId}|${d.date}`, d.id]));
      const finds = j.finds.map((f) =>
        Object.assign(new Find(), {
          ...stamp,
          id: id(f.id),
          crewId: crew.id,
          lakeId: id(f.lakeId),
          eventId: idOrNull(f.eventId),
          practiceDayId:
            f.eventId && f.practiceDate ? (practiceDayId.get(`${id(f.eventId)}|${f.practiceDate}`) ?? null) : null,
          name: f.name,
          markedAt: f.markedAt ? new Date(f.markedAt) : null,
          lat: f.lat,
          lon: f.lon,
          depthFt: f.depthFt,
          depthValue: f.depthFt,
          depthUnit: f.depthFt === null ? null : 'ft',
          kind: f.kind,
          subKind: f.subKind,
          hardness: f.hardness,
          vegetationDensity: f.vegetationDensity,
          baitSeen: f.baitSeen,
          fishMarked: f.fishMarked,
          frequencyKhz: f.frequencyKhz,
          foundHow: f.foundHow,
          waterTempF: f.waterTempF,
          waterTempValue: f.waterTempF,
          waterTempUnit: f.waterTempF === null ? null : 'F',
          notes: f.notes,
          source: 'demo',
        }),
      );
      await insertRecordsBulk(tx, log, 'Find', finds, (f) => ({
        type: 'FindAdded',
        aggregateType: 'find',
        aggregateId: f.id,
      }));

      const dayId = new Map(competitionDays.map((d) => [`${d.eventId}|${d.date}`, d.id]));
      const catches = j.catches.map((c) => {
        const row = Object.assign(new Catch(), {
          ...stamp,
          id: id(c.id),
          crewId: crew.id,
          eventId: id(c.eventId),
          competitionDayId: dayId.get(`${id(c.eventId)}|${c.competitionDate}`)!,
          caughtAt: new Date(c.caughtAt),
          findId: idOrNull(c.findId),
          attributionDistanceM: c.attributionDistanceM,
          lat: c.lat,
          lon: c.lon,
          species: c.species,
          lengthIn: c.lengthIn,
          lengthValue: c.lengthIn,
          lengthUnit: c.lengthIn === null ? null : 'in',
          weightLb: c.weightLb,
          weightValue: c.weightLb,
          weightUnit: 'lb',
          weightOunces: null,
          lure: c.lure,
          technique: c.technique,
          depthFt: c.depthFt,
          depthValue: c.depthFt,
          depthUnit: c.depthFt === null ? null : 'ft',
          waterTempF: c.waterTempF,
          waterTempValue: c.waterTempF,
          waterTempUnit: c.waterTempF === null ? null : 'F',
          fate: c.fate,
          notes: c.notes ?? '',
          loggedBy: loggedBy(c.angler),
        });
        row.weightFlagged = flagWeight(row);
        return row;
      });
      await insertRecordsBulk(tx, log, 'Catch', catches, (c) => ({
        type: 'CatchLogged',
        aggregateType: 'catch',
        aggregateId: c.id,
      }));

      const stops = j.stops.map((st) =>
        Object.assign(new Stop(), {
          ...stamp,
          id: id(st.id),
          crewId: crew.id,
          eventId: id(st.eventId),
          competitionDayId: id(st.competitionDayId),
          findId: idOrNull(st.findId),
          lat: st.lat,
          lon: st.lon,
          arrivedAt: new Date(st.arrivedAt),
          leftAt: new Date(st.leftAt),
          waterTempF: st.waterTempF,
          lure: st.lure,
          technique: st.technique,
          notes: '',
          loggedById: loggedBy(st.angler),
        }),
      );
      await insertRecordsBulk(tx, log, 'Stop', stops, (st) => ({
        type: 'StopLogged',
        aggregateType: 'stop',
        aggregateId: st.id,
      }));

      const weighIns = j.weighIns.map((w) =>
        Object.assign(new WeighIn(), {
          id: id(w.id),
          crewId: crew.id,
          competitionDayId: dayId.get(`${id(w.eventId)}|${w.competitionDate}`)!,
          grossLb: w.grossLb,
          penaltyLb: w.penaltiesLb,
          officialLb: w.officialLb,
          dayPlace: w.dayPlace,
          lateMinutes: w.lateMinutes,
          fieldSize: w.fieldSize,
          winningLb: w.winningLb ?? null,
          updatedAt: now,
        }),
      );
      await insertRecordsBulk(tx, log, 'WeighIn', weighIns, (w) => ({
        type: 'WeighInRecorded',
        aggregateType: 'weighIn',
        aggregateId: w.id,
      }));
      log.replacePayloads('WeighInRecorded', (aggregateId, payload) => {
        const w = weighIns.find((x) => x.id === aggregateId)!;
        const day = competitionDays.find((d) => d.id === w.competitionDayId)!;
        return { ...payload, eventId: day.eventId, date: day.date };
      });
      await log.writePending();
    });
  }
}
