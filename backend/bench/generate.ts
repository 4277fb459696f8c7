// Seeded generator of the benchmark crew: lakes, events with their days, finds and catches written straight into
// the write tables AND journal_event (payloads in the journal's own full-state shape), with multi-row INSERTs.
// Usage: node bench/dist/bench/generate.js <crewId> <actorId> [scale=1]   (DB_* from the environment)
import { randomUUID } from 'node:crypto';
import { createConnection, type Connection } from 'mariadb';
import { mulberry32 } from '@shoalbook/fixtures';
import { DateTime } from 'luxon';
import { insertSql, tableSpec, type ColumnKind, type TableSpec } from '../src/projections/sql-values';

const SEED = 20261220;
const LAKES = 10;
const KINDS: [string, number][] = [
  ['hard-bottom', 0.3],
  ['vegetation', 0.25],
  ['bait', 0.1],
  ['contour', 0.15],
  ['wood-brush', 0.1],
  ['man-made', 0.05],
  ['other', 0.05],
];
const SUB: Record<string, string[]> = {
  'hard-bottom': ['shell', 'rock', 'gravel', 'clay'],
  vegetation: ['eelgrass', 'hydrilla', 'milfoil'],
  bait: ['shad school'],
  contour: ['point', 'ledge', 'hump'],
  'wood-brush': ['brush pile', 'laydown'],
  'man-made': ['riprap', 'bridge'],
  other: ['other'],
};
const FATES: [string, number][] = [
  ['weighed', 0.3],
  ['culled', 0.2],
  ['released', 0.45],
  ['dead', 0.05],
];
const ZONE = 'America/Chicago';

type Row = Record<string, unknown>;
const spec = (table: string, cols: Record<string, ColumnKind>) =>
  tableSpec<Row>(table, ['id'], cols as Record<string, ColumnKind>);

const LAKE = spec('lakes', {
  id: 'str',
  crewId: 'str',
  name: 'str',
  region: 'str',
  timeZone: 'str',
  lat: 'num',
  lon: 'num',
  areaAcres: 'num',
  notes: 'str',
  version: 'num',
  createdAtMs: 'instant',
  updatedAtMs: 'instant',
});
const EVENT = spec('events', {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  name: 'str',
  organiser: 'str',
  practiceDates: 'json',
  competitionDates: 'json',
  fishPerDay: 'num',
  minLengthIn: 'num',
  deadFishPenaltyLb: 'num',
  shortFishPenaltyLb: 'num',
  latePenaltyLbPerMinute: 'num',
  entryFee: 'num',
  payout: 'num',
  finalPlace: 'num',
  notes: 'str',
  version: 'num',
  createdAtMs: 'instant',
  updatedAtMs: 'instant',
});
const PDAY = spec('practice_days', {
  id: 'str',
  crewId: 'str',
  eventId: 'str',
  date: 'str',
  notes: 'str',
  waterTempF: 'num',
  waterTempValue: 'num',
  waterTempUnit: 'str',
  version: 'num',
});
const CDAY = spec('competition_days', {
  id: 'str',
  crewId: 'str',
  eventId: 'str',
  date: 'str',
  startTime: 'str',
  checkInTime: 'str',
  weatherNotes: 'str',
  waterTempF: 'num',
  waterTempValue: 'num',
  waterTempUnit: 'str',
  version: 'num',
});
const FIND = spec('finds', {
  id: 'str',
  crewId: 'str',
  lakeId: 'str',
  eventId: 'str',
  practiceDayId: 'str',
  name: 'str',
  markedAtMs: 'instant',
  lat: 'num',
  lon: 'num',
  depthFt: 'num',
  depthValue: 'num',
  depthUnit: 'str',
  kind: 'str',
  subKind: 'str',
  hardness: 'num',
  vegetationDensity: 'str',
  baitSeen: 'bool',
  fishMarked: 'num',
  frequencyKhz: 'num',
  foundHow: 'str',
  waterTempF: 'num',
  waterTempValue: 'num',
  waterTempUnit: 'str',
  notes: 'str',
  photoId: 'str',
  source: 'str',
  version: 'num',
  createdAtMs: 'instant',
  updatedAtMs: 'instant',
});
const CATCH = spec('catches', {
  id: 'str',
  crewId: 'str',
  eventId: 'str',
  competitionDayId: 'str',
  caughtAtMs: 'instant',
  findId: 'str',
  attributionDistanceM: 'num',
  lat: 'num',
  lon: 'num',
  species: 'str',
  lengthIn: 'num',
  lengthValue: 'num',
  lengthUnit: 'str',
  weightLb: 'num',
  weightValue: 'num',
  weightUnit: 'str',
  weightOunces: 'num',
  weightFlagged: 'bool',
  lure: 'str',
  technique: 'str',
  depthFt: 'num',
  depthValue: 'num',
  depthUnit: 'str',
  waterTempF: 'num',
  waterTempValue: 'num',
  waterTempUnit: 'str',
  fate: 'str',
  notes: 'str',
  photoId: 'str',
  version: 'num',
  createdAtMs: 'instant',
  updatedAtMs: 'instant',
});
const JOURNAL = tableSpec<Row>('journal_event', ['crewId'], {
  crewId: 'str',
  type: 'str',
  aggregateType: 'str',
  aggregateId: 'str',
  payload: 'json',
  actorId: 'str',
  occurredAtMs: 'instant',
});

/** The journal's payload shape: entity property names, instants as ISO strings. */
function state(row: Row): Row {
  const out: Row = {};
  for (const [k, v] of Object.entries(row)) {
    if (k.endsWith('Ms') && typeof v === 'number') out[k.slice(0, -2)] = new Date(v).toISOString();
    else out[k] = v;
  }
  return out;
}

/** Batches rows per table and keeps a couple of INSERTs in flight, so MariaDB works while the next batch is built. */
class BulkWriter {
  private buffers = new Map<TableSpec<Row>, Row[]>();
  private inFlight: Promise<unknown>[] = [];
  rows = 0;
  constructor(
    private readonly conn: Connection,
    private readonly batch = 2000,
  ) {}
  async add(spec: TableSpec<Row>, row: Row): Promise<void> {
    let list = this.buffers.get(spec);
    if (!list) this.buffers.set(spec, (list = []));
    list.push(row);
    if (list.length >= this.batch) await this.flushTable(spec);
  }
  async flushTable(spec: TableSpec<Row>): Promise<void> {
    const list = this.buffers.get(spec);
    if (!list?.length) return;
    this.buffers.set(spec, []);
    this.rows += list.length;
    this.inFlight.push(this.conn.query(insertSql(spec, list)));
    if (this.inFlight.length >= 2) await this.inFlight.shift();
  }
  /** Flush in table order (parents before children). */
  async flushAll(order: TableSpec<Row>[]): Promise<void> {
    for (const s of order) await this.flushTable(s);
    await Promise.all(this.inFlight);
    this.inFlight = [];
  }
}

async function main(): Promise<void> {
  const [crewId, actorId, scaleArg] = process.argv.slice(2);
  if (!crewId || !actorId) throw new Error('usage: generate.js <crewId> <actorId> [scale]');
  const scale = Number(scaleArg ?? 1);
  const events = Math.round(200 * scale);
  const findsPerEvent = 100;
  const catchesPerEvent = 5000;
  const random = mulberry32(SEED);
  const conn = await createConnection({
    host: process.env.DB_HOST,
    port: Number(process.env.DB_PORT),
    user: process.env.DB_USER,
    password: process.env.DB_PASSWORD,
    database: process.env.DB_NAME,
    timezone: '+00:00',
  });
  await conn.query('SET SESSION foreign_key_checks = 0, unique_checks = 0');
  // One connection for the journal, so seq follows the order events are generated in.
  const journalConn = await createConnection({
    host: process.env.DB_HOST,
    port: Number(process.env.DB_PORT),
    user: process.env.DB_USER,
    password: process.env.DB_PASSWORD,
    database: process.env.DB_NAME,
    timezone: '+00:00',
  });
  const tables = new BulkWriter(conn);
  const journal = new BulkWriter(journalConn);
  const ORDER = [LAKE, EVENT, PDAY, CDAY, FIND, CATCH];
  const started = Date.now();
  let occurred = Date.UTC(2016, 0, 1);
  const log = async (type: string, aggregateType: string, row: Row, extra: Row = {}) => {
    occurred += 1000;
    await journal.add(JOURNAL, {
      crewId,
      type,
      aggregateType,
      aggregateId: row.id,
      payload: { ...state(row), ...extra },
      actorId,
      occurredAtMs: occurred,
    });
  };
  const now = Date.UTC(2026, 11, 1);

  const lakes: Row[] = [];
  for (let l = 0; l < LAKES; l++) {
    const lake = {
      id: randomUUID(),
      crewId,
      name: `Bench Reservoir ${l + 1}`,
      region: 'Bench County',
      timeZone: ZONE,
      lat: 30 + l * 0.7,
      lon: -97 + l * 0.5,
      areaAcres: 5000 + l * 100,
      notes: '',
      version: 1,
      createdAtMs: now,
      updatedAtMs: now,
    };
    lakes.push(lake);
    await tables.add(LAKE, lake);
    await log('LakeCreated', 'lake', lake);
  }
  await tables.flushAll(ORDER);
  await journal.flushAll([JOURNAL]);

  const lakeFinds = new Map<string, string[]>();
  let catches = 0;
  for (let e = 0; e < events; e++) {
    const lake = lakes[e % LAKES]!;
    const start = DateTime.fromISO('2016-03-05', { zone: ZONE }).plus({
      days: Math.floor(e / LAKES) * 182 + (e % LAKES) * 3,
    });
    const practiceDates = [0, 1].map((d) => start.plus({ days: d }).toISODate()!);
    const competitionDates = [2, 3, 4].map((d) => start.plus({ days: d }).toISODate()!);
    const event = {
      id: randomUUID(),
      crewId,
      lakeId: lake.id,
      name: `Bench Open ${e + 1}`,
      organiser: 'Bench Trail',
      practiceDates,
      competitionDates,
      fishPerDay: 5,
      minLengthIn: 12,
      deadFishPenaltyLb: 0.25,
      shortFishPenaltyLb: 1,
      latePenaltyLbPerMinute: 1,
      entryFee: null,
      payout: null,
      finalPlace: random.int(1, 60),
      notes: '',
      version: 1,
      createdAtMs: now,
      updatedAtMs: now,
    };
    const pdays = practiceDates.map((date) => ({
      id: randomUUID(),
      crewId,
      eventId: event.id,
      date,
      notes: '',
      waterTempF: null,
      waterTempValue: null,
      waterTempUnit: null,
      version: 1,
    }));
    const cdays = competitionDates.map((date) => ({
      id: randomUUID(),
      crewId,
      eventId: event.id,
      date,
      startTime: '06:00',
      checkInTime: '17:00',
      weatherNotes: '',
      waterTempF: null,
      waterTempValue: null,
      waterTempUnit: null,
      version: 1,
    }));
    await tables.add(EVENT, event);
    for (const d of pdays) await tables.add(PDAY, d);
    for (const d of cdays) await tables.add(CDAY, d);
    await log('EventCreated', 'event', event, { practiceDays: pdays, competitionDays: cdays });

    const finds: string[] = [];
    for (let f = 0; f < findsPerEvent; f++) {
      const kind = random.weighted(KINDS);
      const depthFt = Math.round(random.between(4, 38) * 10) / 10;
      const find = {
        id: randomUUID(),
        crewId,
        lakeId: lake.id,
        eventId: event.id,
        practiceDayId: pdays[f % 2]!.id,
        name: `Mark ${e + 1}-${f + 1}`,
        markedAtMs: start.plus({ days: f % 2, hours: 7 + (f % 9) }).toMillis(),
        lat: (lake.lat as number) + random.between(-0.03, 0.03),
        lon: (lake.lon as number) + random.between(-0.03, 0.03),
        depthFt,
        depthValue: depthFt,
        depthUnit: 'ft',
        kind,
        subKind: random.pick(SUB[kind]!),
        hardness: kind === 'hard-bottom' ? random.int(1, 5) : null,
        vegetationDensity: null,
        baitSeen: random.chance(0.3),
        fishMarked: random.int(0, 6),
        frequencyKhz: 240,
        foundHow: 'on-plane',
        waterTempF: Math.round(random.between(48, 86)),
        waterTempValue: null,
        waterTempUnit: null,
        notes: '',
        photoId: null,
        source: 'gpx',
        version: 1,
        createdAtMs: now,
        updatedAtMs: now,
      };
      finds.push(find.id);
      await tables.add(FIND, find);
      await log('FindAdded', 'find', find);
    }
    const older = lakeFinds.get(lake.id as string) ?? [];
    lakeFinds.set(lake.id as string, [...older, ...finds].slice(-500));

    for (let c = 0; c < catchesPerEvent; c++) {
      const day = c % 3;
      const dayStart = start.plus({ days: 2 + day, hours: 6 }).toMillis();
      const caughtAtMs = dayStart + Math.floor(random.next() * 11 * 3_600_000);
      const r = random.next();
      const findId =
        r < 0.8
          ? finds[Math.floor(random.next() * finds.length)]!
          : r < 0.9 && older.length
            ? older[Math.floor(random.next() * older.length)]!
            : null;
      const weightLb = Math.round(random.between(0.6, 7.5) * 100) / 100;
      const row = {
        id: randomUUID(),
        crewId,
        eventId: event.id,
        competitionDayId: cdays[day]!.id,
        caughtAtMs,
        findId,
        attributionDistanceM: null,
        lat: null,
        lon: null,
        species: 'largemouth',
        lengthIn: null,
        lengthValue: null,
        lengthUnit: null,
        weightLb,
        weightValue: weightLb,
        weightUnit: 'lb',
        weightOunces: null,
        weightFlagged: false,
        lure: 'jig',
        technique: 'drag',
        depthFt: null,
        depthValue: null,
        depthUnit: null,
        waterTempF: null,
        waterTempValue: null,
        waterTempUnit: null,
        fate: random.weighted(FATES),
        notes: '',
        photoId: null,
        version: 1,
        createdAtMs: now,
        updatedAtMs: now,
      };
      await tables.add(CATCH, row);
      await log('CatchLogged', 'catch', row);
      catches++;
    }
    if ((e + 1) % 10 === 0)
      process.stderr.write(
        `\r  generated ${e + 1}/${events} events, ${catches} catches (${Math.round((Date.now() - started) / 1000)} s)`,
      );
    // Parents first: flush the write tables in order before children of the next event can reference them.
    await tables.flushAll(ORDER);
  }
  await tables.flushAll(ORDER);
  await journal.flushAll([JOURNAL]);
  process.stderr.write('\n');
  await conn.end();
  await journalConn.end();
  process.stdout.write(
    JSON.stringify({
      lakes: LAKES,
      events,
      finds: events * findsPerEvent,
      catches,
      journalEvents: journal.rows,
      rows: tables.rows,
      seconds: (Date.now() - started) / 1000,
    }) + '\n',
  );
}

main().catch((e: unknown) => {
  process.stderr.write(`generate failed: ${e instanceof Error ? e.stack : String(e)}\n`);
  process.exit(1);
});
