import type { EventRules, JournalEventType, Season } from '@shoalbook/shared';
import { catchTiming, type CatchTimingCalculator, UTC_PLACE } from './catch-timing';
import type { JournalRecord } from './journal-record';
import type { ProjectionState } from './projection-state';
import { type CatchRow, type DayRow, type EventRow, type FindRow, type LakeRow, type StopRow, toMicroLb } from './rows';

type Payload = Record<string, unknown>;
/** A catch as its journal event gives it, before the derived fields. */
type CatchBase = Omit<
  CatchRow,
  | 'lakeId'
  | 'dayDate'
  | 'localMinutes'
  | 'minutesFromSunrise'
  | 'solunarPeriod'
  | 'timeOfDay'
  | 'bagState'
  | 'bagCounted'
>;

const str = (v: unknown, fallback = ''): string => (typeof v === 'string' ? v : fallback);
const strOrNull = (v: unknown): string | null => (typeof v === 'string' && v !== '' ? v : null);
const num = (v: unknown): number | null =>
  typeof v === 'number' && Number.isFinite(v)
    ? v
    : typeof v === 'string' && v.trim() !== '' && Number.isFinite(Number(v))
      ? Number(v)
      : null;
const dates = (v: unknown): string[] =>
  Array.isArray(v) ? v.filter((d): d is string => typeof d === 'string').sort() : [];

/** Meteorological season of a lake-local date: Mar–May spring, Jun–Aug summer, Sep–Nov fall, Dec–Feb winter. */
export function seasonOf(date: string): Season {
  const month = Number(date.slice(5, 7));
  if (month >= 3 && month <= 5) return 'spring';
  if (month >= 6 && month <= 8) return 'summer';
  if (month >= 9 && month <= 11) return 'fall';
  return 'winter';
}

function lakeRow(crewId: string, p: Payload): LakeRow {
  return {
    id: str(p.id),
    crewId,
    name: str(p.name),
    timeZone: str(p.timeZone, 'UTC'),
    lat: num(p.lat) ?? 0,
    lon: num(p.lon) ?? 0,
  };
}

function eventRow(crewId: string, p: Payload): EventRow {
  const competitionDates = dates(p.competitionDates);
  const firstDate = competitionDates[0] ?? null;
  const rules: EventRules = {
    fishPerDay: num(p.fishPerDay) ?? 5,
    minLengthIn: num(p.minLengthIn),
    deadFishPenaltyLb: num(p.deadFishPenaltyLb) ?? 0,
    shortFishPenaltyLb: num(p.shortFishPenaltyLb) ?? 0,
    latePenaltyLbPerMinute: num(p.latePenaltyLbPerMinute) ?? 0,
    format: p.format === 'individual' ? 'individual' : 'team',
  };
  return {
    id: str(p.id),
    crewId,
    lakeId: str(p.lakeId),
    name: str(p.name),
    practiceDates: dates(p.practiceDates),
    competitionDates,
    firstDate,
    season: firstDate ? seasonOf(firstDate) : null,
    year: firstDate ? Number(firstDate.slice(0, 4)) : null,
    rules,
    finalPlace: num(p.finalPlace),
    fieldSize: num(p.fieldSize),
    winningLb: num(p.winningLb),
    cutLb: num(p.cutLb),
  };
}

function findRow(crewId: string, p: Payload): FindRow {
  return {
    id: str(p.id),
    crewId,
    lakeId: str(p.lakeId),
    eventId: strOrNull(p.eventId),
    name: str(p.name),
    kind: str(p.kind, 'other'),
    subKind: str(p.subKind),
    depthFt: num(p.depthFt),
    hardness: num(p.hardness),
    waterTempF: num(p.waterTempF),
    lat: num(p.lat) ?? 0,
    lon: num(p.lon) ?? 0,
  };
}

/**
 * Applies journal events, in seq order, to a ProjectionState. Each event carries its record's full new state (or
 * its id for a deletion), so applying one sets that record's row outright: applying the same event again, or
 * replaying the journal from the start, ends in the same rows. Derived rows (outcomes, group statistics) are only
 * marked dirty here and recomputed afterwards from the rows.
 */
export class JournalApplier {
  constructor(
    private readonly state: ProjectionState,
    private readonly timing: CatchTimingCalculator = catchTiming,
  ) {}

  apply(e: JournalRecord): void {
    const p = e.payload ?? {};
    const type = e.type as JournalEventType;
    switch (type) {
      case 'LakeCreated':
      case 'LakeUpdated':
        return this.putLake(lakeRow(e.crewId, { ...p, id: e.aggregateId }));
      case 'LakeDeleted':
        return this.state.lakes.delete(e.aggregateId);
      case 'EventCreated':
      case 'EventUpdated':
        return this.putEvent(e.crewId, { ...p, id: e.aggregateId });
      case 'EventDeleted':
        return this.deleteEvent(e.aggregateId);
      case 'FindAdded':
      case 'FindUpdated':
        return this.putFind(findRow(e.crewId, { ...p, id: e.aggregateId }));
      case 'FindDeleted':
        return this.deleteFind(e.aggregateId);
      case 'CatchLogged':
      case 'CatchUpdated':
        return this.putCatch(e.crewId, { ...p, id: e.aggregateId });
      case 'CatchDeleted':
        return this.deleteCatch(e.aggregateId);
      case 'WeighInRecorded':
        return this.putWeighIn(p);
      case 'StopLogged':
      case 'StopUpdated':
        return this.putStop(e.crewId, { ...p, id: e.aggregateId });
      case 'StopDeleted':
        return this.deleteStop(e.aggregateId);
      case 'PracticeDayUpdated':
      case 'CompetitionDayUpdated':
      case 'PhotoUploaded':
        // Day notes and photos: nothing the reports show.
        return;
      default: {
        // Every type in JOURNAL_EVENT_TYPES has its case above (the compiler checks); a type this version does not
        // know (written by a newer one) is left alone.
        const unknown: never = type;
        return void unknown;
      }
    }
  }

  private putLake(row: LakeRow): void {
    const before = this.state.lakes.get(row.id);
    this.state.lakes.put(row.id, row);
    if (before && (before.timeZone !== row.timeZone || before.lat !== row.lat || before.lon !== row.lon)) {
      // Timing is computed in the lake's zone at its reference point: recompute its catches.
      for (const c of [...this.state.catches.rows.values()])
        if (c.lakeId === row.id) this.putCatchRow(this.deriveCatch(c, c));
      // …and its events' stop time by period and band.
      for (const ev of this.state.events.rows.values()) if (ev.lakeId === row.id) this.state.dirtyEvents.add(ev.id);
    }
  }

  private putEvent(crewId: string, p: Payload): void {
    const row = eventRow(crewId, p);
    const before = this.state.events.get(row.id);
    this.state.events.put(row.id, row);
    this.state.dirtyEvents.add(row.id);
    // New rules recount every day of the event.
    const recount = !before || JSON.stringify(before.rules) !== JSON.stringify(row.rules);
    if (recount)
      for (const d of this.state.days.rows.values()) if (d.eventId === row.id) this.state.dirtyDays.add(d.id);
    if (!Array.isArray(p.competitionDays)) return;
    const kept = new Set<string>();
    for (const raw of p.competitionDays as Payload[]) {
      const id = str(raw.id);
      if (!id) continue;
      kept.add(id);
      if (recount) this.state.dirtyDays.add(id);
      const old = this.state.days.get(id);
      const day: DayRow = old
        ? { ...old, date: str(raw.date, old.date) }
        : {
            id,
            crewId,
            eventId: row.id,
            date: str(raw.date),
            hasOfficial: false,
            officialGrossLb: null,
            officialPenaltyLb: null,
            officialLb: null,
            dayPlace: null,
            lateMinutes: null,
            fieldSize: null,
            winningLb: null,
            cutLb: null,
          };
      this.state.days.put(id, day);
    }
    // Dropped dates lose their day and its weigh-in (the journal refuses to drop a day with catches).
    for (const d of [...this.state.days.rows.values()])
      if (d.eventId === row.id && !kept.has(d.id)) this.state.days.delete(d.id);
  }

  private deleteEvent(id: string): void {
    this.state.events.delete(id);
    for (const d of [...this.state.days.rows.values()]) if (d.eventId === id) this.state.days.delete(d.id);
    this.state.dirtyEvents.add(id);
  }

  private putFind(row: FindRow): void {
    const before = this.state.finds.get(row.id);
    if (before?.eventId) this.state.dirtyEvents.add(before.eventId);
    if (row.eventId) this.state.dirtyEvents.add(row.eventId);
    this.state.finds.put(row.id, row);
    this.state.dirtyFinds.add(row.id);
  }

  private deleteFind(id: string): void {
    const before = this.state.finds.get(id);
    if (before?.eventId) this.state.dirtyEvents.add(before.eventId);
    this.state.finds.delete(id);
    this.state.dirtyFinds.add(id);
  }

  private putCatch(crewId: string, p: Payload): void {
    const caughtAtMs = Date.parse(str(p.caughtAt));
    const weightLb = num(p.weightLb) ?? 0;
    const base: CatchBase = {
      id: str(p.id),
      crewId,
      eventId: str(p.eventId),
      competitionDayId: str(p.competitionDayId),
      findId: strOrNull(p.findId),
      caughtAtMs: Number.isFinite(caughtAtMs) ? caughtAtMs : 0,
      weightLb,
      weightUlb: toMicroLb(weightLb),
      lengthIn: num(p.lengthIn),
      species: str(p.species, 'other'),
      fate: str(p.fate, 'released'),
      lure: str(p.lure).slice(0, 120),
      lat: num(p.lat),
      lon: num(p.lon),
      loggedBy: strOrNull(p.loggedBy),
    };
    const before = this.state.catches.get(base.id);
    this.putCatchRow(this.deriveCatch(base, before));
  }

  /** The derived fields of a catch: its lake (through the event), its day's date and its timing. */
  private deriveCatch(c: CatchBase, before?: CatchRow): CatchRow {
    const event = this.state.events.get(c.eventId);
    const lakeId = event?.lakeId ?? before?.lakeId ?? '';
    const lake = this.state.lakes.get(lakeId);
    const t = this.timing.timing(c.caughtAtMs, lake ?? UTC_PLACE);
    const day = this.state.days.get(c.competitionDayId);
    // Built field by field (not spread): a rebuild derives a million of these.
    return {
      id: c.id,
      crewId: c.crewId,
      lakeId,
      eventId: c.eventId,
      competitionDayId: c.competitionDayId,
      dayDate: day?.date ?? t.localDate,
      findId: c.findId,
      caughtAtMs: c.caughtAtMs,
      weightLb: c.weightLb,
      weightUlb: c.weightUlb,
      lengthIn: c.lengthIn,
      species: c.species,
      fate: c.fate,
      lure: c.lure,
      lat: c.lat,
      lon: c.lon,
      localMinutes: t.localMinutes,
      minutesFromSunrise: t.minutesFromSunrise,
      solunarPeriod: t.solunarPeriod,
      timeOfDay: t.timeOfDay,
      loggedBy: c.loggedBy,
      // Set when the day is counted (bag-states.ts), after the batch; kept meanwhile so an unchanged day stays.
      bagState: before?.bagState ?? '',
      bagCounted: before?.bagCounted ?? false,
    };
  }

  private putCatchRow(row: CatchRow): void {
    const before = this.state.catches.get(row.id);
    if (before?.findId) this.state.dirtyFinds.add(before.findId);
    if (before) this.state.dirtyEvents.add(before.eventId);
    if (before) this.state.dirtyDays.add(before.competitionDayId);
    this.state.dirtyDays.add(row.competitionDayId);
    this.state.catches.put(row.id, row);
    if (row.findId) this.state.dirtyFinds.add(row.findId);
    this.state.dirtyEvents.add(row.eventId);
  }

  private deleteCatch(id: string): void {
    const before = this.state.catches.get(id);
    if (before?.findId) this.state.dirtyFinds.add(before.findId);
    if (before) this.state.dirtyEvents.add(before.eventId);
    if (before) this.state.dirtyDays.add(before.competitionDayId);
    this.state.catches.delete(id);
  }

  private putStop(crewId: string, p: Payload): void {
    const before = this.state.stops.get(str(p.id));
    const eventId = str(p.eventId);
    const arrivedAtMs = Date.parse(str(p.arrivedAt));
    const leftAtMs = Date.parse(str(p.leftAt));
    const arrived = Number.isFinite(arrivedAtMs) ? arrivedAtMs : 0;
    const left = Number.isFinite(leftAtMs) ? leftAtMs : null;
    const row: StopRow = {
      id: str(p.id),
      crewId,
      lakeId: this.state.events.get(eventId)?.lakeId ?? before?.lakeId ?? '',
      eventId,
      competitionDayId: str(p.competitionDayId),
      findId: strOrNull(p.findId),
      arrivedAtMs: arrived,
      leftAtMs: left,
      seconds: left === null ? 0 : Math.max(0, Math.floor(left / 1000) - Math.floor(arrived / 1000)),
    };
    this.markStop(before);
    this.state.stops.put(row.id, row);
    this.markStop(row);
  }

  private deleteStop(id: string): void {
    this.markStop(this.state.stops.get(id));
    this.state.stops.delete(id);
  }

  /** A stop counts toward its find's outcome in its event, and toward its event's statistics. */
  private markStop(stop: StopRow | undefined): void {
    if (!stop) return;
    if (stop.findId) this.state.dirtyFinds.add(stop.findId);
    this.state.dirtyEvents.add(stop.eventId);
  }

  private putWeighIn(p: Payload): void {
    const dayId = str(p.competitionDayId);
    const day = this.state.days.get(dayId);
    if (!day) return;
    this.state.days.put(dayId, {
      ...day,
      hasOfficial: true,
      officialGrossLb: num(p.grossLb),
      officialPenaltyLb: num(p.penaltyLb),
      officialLb: num(p.officialLb),
      dayPlace: num(p.dayPlace),
      lateMinutes: num(p.lateMinutes),
      fieldSize: num(p.fieldSize),
      winningLb: num(p.winningLb),
      cutLb: num(p.cutLb),
    });
  }
}
