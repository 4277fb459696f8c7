import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { CatchView, FindView, JournalExport } from '@shoalbook/shared';
import { Catch } from '../catches/catch.entity';
import { CatchesService } from '../catches/catches.service';
import type { CrewAccess } from '../crews/access/request-context';
import { CompetitionDay } from '../events/competition-day.entity';
import { competitionDayView, eventView, practiceDayView } from '../events/event-views';
import { PracticeDay } from '../events/practice-day.entity';
import { TournamentEvent } from '../events/tournament-event.entity';
import { Find } from '../finds/find.entity';
import { FindsService } from '../finds/finds.service';
import { Lake } from '../lakes/lake.entity';
import { lakeView } from '../lakes/lake-view';
import { WeighIn } from '../weigh-ins/weigh-in.entity';
import { officialOf } from '../weigh-ins/weigh-ins.service';
import { recordNotFound } from '../journal/journal-errors';
import { toCsv } from './csv';
import { findsToGpx } from './gpx-export';

export const EXPORT_NOTICE =
  'This file contains the exact positions of your finds and catches. Keep it private: anyone who has it can go to your places.';

/** Columns of the CSV export: one row per record, `record_type` says which kind. */
const CSV_COLUMNS = [
  'record_type',
  'id',
  'lake_id',
  'event_id',
  'day_id',
  'date',
  'name',
  'time',
  'lat',
  'lon',
  'kind',
  'sub_kind',
  'hardness',
  'vegetation_density',
  'bait_seen',
  'fish_marked',
  'frequency_khz',
  'found_how',
  'depth_ft',
  'water_temp_f',
  'find_id',
  'attribution_distance_m',
  'species',
  'length_in',
  'weight_lb',
  'weight_entered',
  'weight_flagged',
  'lure',
  'technique',
  'fate',
  'time_zone',
  'region',
  'organiser',
  'rules',
  'gross_lb',
  'penalty_lb',
  'official_lb',
  'day_place',
  'late_minutes',
  'notes',
] as const;
type Column = (typeof CSV_COLUMNS)[number];

/** The whole journal of a crew (owner or angler only: it carries positions). */
@Injectable()
export class JournalExportService {
  constructor(
    private readonly em: EntityManager,
    private readonly finds: FindsService,
    private readonly catches: CatchesService,
  ) {}

  async json(access: CrewAccess): Promise<JournalExport> {
    const crewId = access.crewId;
    const lakes = await this.em.find(Lake, { crewId }, { orderBy: { name: 'asc' } });
    const events = await this.em.find(TournamentEvent, { crewId }, { orderBy: { createdAt: 'asc' } });
    const practiceDays = await this.em.find(PracticeDay, { crewId }, { orderBy: { date: 'asc' } });
    const competitionDays = await this.em.find(CompetitionDay, { crewId }, { orderBy: { date: 'asc' } });
    const weighIns = await this.em.find(WeighIn, { crewId });
    const dayEvent = new Map(competitionDays.map((d) => [d.id, d.eventId]));
    const finds = await this.finds.views(
      access,
      await this.em.find(Find, { crewId }, { orderBy: { markedAt: 'asc', id: 'asc' } }),
    );
    const catches = await this.catches.views(
      access,
      await this.em.find(Catch, { crewId }, { orderBy: { caughtAt: 'asc', id: 'asc' } }),
    );
    return {
      format: 'shoalbook-journal',
      version: 1,
      exportedAt: new Date().toISOString(),
      crewId,
      notice: EXPORT_NOTICE,
      lakes: lakes.map(lakeView),
      events: events.map((e) => ({
        ...eventView(e),
        practiceDays: practiceDays.filter((d) => d.eventId === e.id).map(practiceDayView),
        competitionDays: competitionDays.filter((d) => d.eventId === e.id).map(competitionDayView),
        weighIns: weighIns
          .filter((w) => dayEvent.get(w.competitionDayId) === e.id)
          .map((w) => ({ competitionDayId: w.competitionDayId, ...officialOf(w)! })),
      })),
      finds,
      catches,
    };
  }

  /** One lake's finds as GPX, named after the lake and the day (ASCII only, so any browser keeps the name). */
  async lakeFindsGpx(access: CrewAccess, lakeId: string): Promise<{ fileName: string; gpx: string }> {
    const lake = await this.em.findOne(Lake, { id: lakeId, crewId: access.crewId });
    if (!lake) throw recordNotFound('lake');
    const finds = await this.em.find(
      Find,
      { crewId: access.crewId, lakeId },
      { orderBy: { markedAt: 'asc', id: 'asc' } },
    );
    const now = new Date();
    const slug =
      lake.name
        .normalize('NFKD')
        .replace(/[^A-Za-z0-9]+/g, '-')
        .replace(/^-|-$/g, '')
        .toLowerCase() || 'lake';
    return {
      fileName: `shoalbook-${slug}-finds-${now.toISOString().slice(0, 10)}.gpx`,
      gpx: findsToGpx(lake.name, finds, now),
    };
  }

  async csv(access: CrewAccess): Promise<string> {
    const j = await this.json(access);
    const rows: unknown[][] = [];
    const row = (values: Partial<Record<Column, unknown>>) => rows.push(CSV_COLUMNS.map((c) => values[c]));
    row({ record_type: 'notice', notes: j.notice });
    for (const l of j.lakes)
      row({
        record_type: 'lake',
        id: l.id,
        name: l.name,
        region: l.region,
        time_zone: l.timeZone,
        lat: l.lat,
        lon: l.lon,
        notes: l.notes,
      });
    for (const e of j.events) {
      row({
        record_type: 'event',
        id: e.id,
        lake_id: e.lakeId,
        name: e.name,
        organiser: e.organiser,
        rules: JSON.stringify(e.rules),
        notes: e.notes,
      });
      for (const d of e.practiceDays)
        row({
          record_type: 'practice_day',
          id: d.id,
          event_id: e.id,
          date: d.date,
          water_temp_f: d.waterTempF,
          notes: d.notes,
        });
      for (const d of e.competitionDays) {
        const w = e.weighIns.find((x) => x.competitionDayId === d.id);
        row({
          record_type: 'competition_day',
          id: d.id,
          event_id: e.id,
          date: d.date,
          time: d.startTime,
          water_temp_f: d.waterTempF,
          notes: d.weatherNotes,
          gross_lb: w?.grossLb,
          penalty_lb: w?.penaltyLb,
          official_lb: w?.officialLb,
          day_place: w?.dayPlace,
          late_minutes: w?.lateMinutes,
        });
      }
    }
    for (const f of j.finds) row(findRow(f));
    for (const c of j.catches) row(catchRow(c));
    return toCsv(CSV_COLUMNS, rows);
  }
}

function findRow(f: FindView): Partial<Record<Column, unknown>> {
  return {
    record_type: 'find',
    id: f.id,
    lake_id: f.lakeId,
    event_id: f.eventId,
    date: f.practiceDate,
    name: f.name,
    time: f.markedAt,
    lat: f.lat,
    lon: f.lon,
    kind: f.kind,
    sub_kind: f.subKind,
    hardness: f.hardness,
    vegetation_density: f.vegetationDensity,
    bait_seen: f.baitSeen,
    fish_marked: f.fishMarked,
    frequency_khz: f.frequencyKhz,
    found_how: f.foundHow,
    depth_ft: f.depthFt,
    water_temp_f: f.waterTempF,
    notes: f.notes,
  };
}

function catchRow(c: CatchView): Partial<Record<Column, unknown>> {
  const w = c.entered?.weight;
  return {
    record_type: 'catch',
    id: c.id,
    event_id: c.eventId,
    day_id: c.competitionDayId,
    date: c.competitionDate,
    time: c.caughtAt,
    lat: c.lat,
    lon: c.lon,
    find_id: c.findId,
    attribution_distance_m: c.attributionDistanceM,
    species: c.species,
    length_in: c.lengthIn,
    weight_lb: c.weightLb,
    weight_entered: w ? (w.unit === 'lb-oz' ? `${w.value} lb ${w.ounces ?? 0} oz` : `${w.value} ${w.unit}`) : null,
    weight_flagged: c.weightFlagged,
    lure: c.lure,
    technique: c.technique,
    depth_ft: c.depthFt,
    water_temp_f: c.waterTempF,
    fate: c.fate,
    name: c.findName,
    notes: c.notes,
  };
}
