import type { INestApplication } from '@nestjs/common';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FindImportPreview } from '@shoalbook/shared';
import { Catch } from '../src/catches/catch.entity';
import { Find } from '../src/finds/find.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk, gpxOf, journalCount, upload } from './journal-fixtures';

/** Metres → degrees of latitude on the mean sphere (R = 6,371,008.8 m). */
const mLat = (m: number) => m / ((6_371_008.8 * Math.PI) / 180);

describe('imports: GPX finds and CSV catches', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  let lakeId: string;
  let eventId: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Import Crew');
    base = `/api/crews/${crew.crewId}`;
    lakeId = (await createLake(crew.angler, crew.crewId)).id;
    eventId = (await createEvent(crew.angler, crew.crewId, lakeId)).id;
  });
  afterAll(async () => {
    await app.close();
  });

  const countFinds = () => testEm(app).count(Find, { crewId: crew.crewId });

  async function expectNothingWritten(
    run: () => Promise<{ status: number; body: { code?: string; message: string } }>,
    status: number,
    code: string,
  ) {
    const [finds, events] = [await countFinds(), await journalCount(app, crew.crewId)];
    const res = await run();
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    expect(res.body.code).toBe(code);
    expect(res.body.message.length).toBeGreaterThan(10);
    expect(await countFinds()).toBe(finds);
    expect(await journalCount(app, crew.crewId)).toBe(events);
  }

  describe('GPX', () => {
    it('previews without writing, flags duplicates within 15 m (existing find and same file) and per-row errors, then commits in one go', async () => {
      const existing = await crew.angler.post(`${base}/finds`, {
        lakeId,
        name: 'Old rock pile',
        lat: 32.96,
        lon: -96.21,
        kind: 'hard-bottom',
        subKind: 'rock',
      });
      expectOk(existing, 201);
      const gpx = gpxOf([
        { lat: 32.97, lon: -96.22, name: 'Grass edge', time: '2024-04-10T14:00:00Z', depthM: 3.048 },
        { lat: 32.96 + mLat(10), lon: -96.21, name: 'Near old pile' }, // 10 m from the existing find
        { lat: 32.97 + mLat(5), lon: -96.22, name: 'Same spot twice' }, // 5 m from row 0
        { lat: 32.98, lon: -96.23, name: 'Far enough' },
        { lat: 32.96 + mLat(20), lon: -96.21, name: 'Twenty metres off' }, // beyond 15 m
        { lat: 95, lon: -96.2, name: 'Bad latitude' },
        { lat: 'abc', lon: -96.2, name: 'Not a number' },
      ]);
      const before = await countFinds();
      const res = await upload(
        crew.angler,
        `${base}/finds/import/preview?lakeId=${lakeId}&eventId=${eventId}`,
        gpx,
        'practice.gpx',
      );
      expectOk(res);
      const preview = res.body as FindImportPreview;
      expect(preview).toMatchObject({ accepted: 5, rejected: 2, duplicates: 2 });
      expect(preview.rows[0]).toMatchObject({
        name: 'Grass edge',
        markedAt: '2024-04-10T14:00:00.000Z',
        error: null,
        duplicateOf: null,
      });
      expect(preview.rows[0]!.depthFt).toBeCloseTo(10, 9);
      expect(preview.rows[1]!.duplicateOf).toMatchObject({ findId: existing.body.id, name: 'Old rock pile' });
      expect(preview.rows[1]!.duplicateOf!.distanceM).toBeCloseTo(10, 0);
      expect(preview.rows[2]!.duplicateOf).toMatchObject({ findId: null, inFile: true, rowIndex: 0 });
      expect(preview.rows[4]!.duplicateOf).toBeNull();
      expect(preview.rows[5]!.error).toMatch(/lat 95 is out of range/);
      expect(preview.rows[6]!.error).toMatch(/not a number/);
      expect(await countFinds()).toBe(before);

      const journalBefore = await journalCount(app, crew.crewId);
      const commit = await upload(
        crew.angler,
        `${base}/finds/import?lakeId=${lakeId}&eventId=${eventId}`,
        gpx,
        'practice.gpx',
        { kind: 'vegetation', subKind: 'hydrilla' },
      );
      expectOk(commit, 201);
      expect(commit.body).toMatchObject({ imported: 3, skipped: 2 });
      expect(commit.body.errors.map((e: { index: number }) => e.index)).toEqual([5, 6]);
      expect(await countFinds()).toBe(before + 3);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore + 3);
      const list = await crew.angler.get(`${base}/finds?lakeId=${lakeId}&eventId=${eventId}`);
      const grass = list.body.find((f: { name: string }) => f.name === 'Grass edge');
      expect(grass).toMatchObject({
        kind: 'vegetation',
        subKind: 'hydrilla',
        source: 'gpx',
        practiceDate: '2024-04-10',
        entered: { depth: { value: 3.048, unit: 'm' } },
      });
    });

    it('refuses malformed XML, a DOCTYPE (XXE), non-GPX XML, a PNG renamed .gpx, and a file over 20 MB: clear errors, nothing written', async () => {
      const url = `${base}/finds/import?lakeId=${lakeId}`;
      await expectNothingWritten(
        () =>
          upload(
            crew.angler,
            url,
            '<gpx xmlns="http://www.topografix.com/GPX/1/1"><wpt lat="1" lon="1"><name>x</wpt></gpx>',
            'broken.gpx',
          ),
        400,
        'malformed_file',
      );
      const xxe = `<?xml version="1.0"?>\n<!DOCTYPE gpx [ <!ENTITY secret SYSTEM "file:///etc/passwd"> ]>\n<gpx version="1.1" xmlns="http://www.topografix.com/GPX/1/1"><wpt lat="32.9" lon="-96.2"><name>&secret;</name></wpt></gpx>`;
      await expectNothingWritten(() => upload(crew.angler, url, xxe, 'xxe.gpx'), 400, 'dtd_refused');
      await expectNothingWritten(
        () =>
          upload(
            crew.angler,
            url,
            '<?xml version="1.0"?><kml xmlns="http://www.opengis.net/kml/2.2"><Placemark/></kml>',
            'places.gpx',
          ),
        400,
        'wrong_file_type',
      );
      const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#336699' } })
        .png()
        .toBuffer();
      await expectNothingWritten(() => upload(crew.angler, url, png, 'waypoints.gpx'), 400, 'wrong_file_type');
      const huge = gpxOf([{ lat: 32.9, lon: -96.2, name: 'x'.repeat(100) }]).replace(
        '</gpx>',
        `<!--${'x'.repeat(21 * 1024 * 1024)}--></gpx>`,
      );
      await expectNothingWritten(() => upload(crew.angler, url, huge, 'huge.gpx'), 413, 'file_too_large');
      const preview = await upload(crew.angler, `${base}/finds/import/preview?lakeId=${lakeId}`, xxe, 'xxe.gpx');
      expect(preview.status).toBe(400);
      expect(JSON.stringify(preview.body)).not.toMatch(/root:|passwd:/);
    });

    it('needs a lake of this crew, and refuses viewers', async () => {
      const other = await crewWithMembers(app, 'Stranger Crew');
      const theirLake = await createLake(other.owner, other.crewId);
      const gpx = gpxOf([{ lat: 32.9, lon: -96.2, name: 'a' }]);
      const res = await upload(crew.angler, `${base}/finds/import?lakeId=${theirLake.id}`, gpx, 'a.gpx');
      expect(res.status).toBe(400);
      expect(res.body.fieldErrors.lakeId).toEqual(['No such lake in this crew.']);
      const viewer = await upload(crew.viewer, `${base}/finds/import?lakeId=${lakeId}`, gpx, 'a.gpx');
      expect(viewer.status).toBe(403);
    });

    it('imports a 10,000-waypoint GPX in one transaction (time logged, not asserted)', async () => {
      const big = await createLake(crew.angler, crew.crewId, { name: 'Big import lake', lat: 33.5, lon: -95.5 });
      const waypoints = Array.from({ length: 10_000 }, (_, k) => ({
        lat: 33.5 + Math.floor(k / 100) * mLat(40),
        lon: -95.5 + (k % 100) * 0.0005,
        name: `WP ${k + 1}`,
        time: new Date(Date.UTC(2024, 3, 10, 13) + k * 3000).toISOString(),
        depthM: 2 + (k % 20) * 0.5,
      }));
      const gpx = gpxOf(waypoints);
      const journalBefore = await journalCount(app, crew.crewId);
      const started = performance.now();
      const res = await upload(crew.angler, `${base}/finds/import?lakeId=${big.id}`, gpx, 'season.gpx', {
        kind: 'hard-bottom',
      });
      const seconds = (performance.now() - started) / 1000;
      expectOk(res, 201);
      expect(res.body).toMatchObject({ imported: 10_000, skipped: 0, errors: [] });
      process.stdout.write(
        `\n[journal] 10,000-waypoint GPX (${(Buffer.byteLength(gpx) / 1024 / 1024).toFixed(1)} MB) imported in ${seconds.toFixed(2)} s over HTTP\n`,
      );
      expect(await testEm(app).count(Find, { lakeId: big.id })).toBe(10_000);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore + 10_000);
    });
  });

  describe('CSV catches', () => {
    const header =
      'date,time,species,weight,weight_unit,weight_oz,length,length_unit,fate,lure,technique,find_name,lat,lon,notes';

    it('serves a template whose header the importer accepts', async () => {
      const res = await crew.viewer.get(`${base}/catches/import/template`);
      expectOk(res);
      expect(res.headers['content-type']).toMatch(/text\/csv/);
      expect(res.text.split('\r\n')[0]).toMatch(/^date,time,species,weight,weight_unit/);
    });

    it('previews per-row errors, refuses the whole file when any row is bad, and imports a clean file in one transaction', async () => {
      const find = await crew.angler.post(`${base}/finds`, {
        lakeId,
        name: 'CSV shell bed',
        lat: 32.9,
        lon: -96.3,
        kind: 'hard-bottom',
        subKind: 'shell',
      });
      expectOk(find, 201);
      const bad = [
        header,
        '2024-04-12,07:30,largemouth,3,lb-oz,4,18,in,weighed,jig,drag,CSV shell bed,,,first',
        '2024-04-15,08:00,largemouth,2,,,15,,weighed,,,,,,wrong day',
        '2024-04-12,08:10,catfish,2,,,15,,weighed,,,,,,bad species',
        '2024-04-12,08:20,spotted,-2,,,15,,weighed,,,,,,negative',
        '2024-04-12,08:30,smallmouth,1.2,kg,,380,mm,released,,,Nowhere,,,unknown find',
      ].join('\n');
      const before = await testEm(app).count(Catch, { crewId: crew.crewId });
      const preview = await upload(crew.angler, `${base}/catches/import/preview?eventId=${eventId}`, bad, 'day1.csv');
      expectOk(preview);
      expect(preview.body).toMatchObject({ accepted: 1, rejected: 4 });
      const rows = preview.body.rows as {
        line: number;
        errors: { field: string; message: string }[];
        weightLb: number | null;
        findId: string | null;
      }[];
      expect(rows[0]).toMatchObject({ line: 2, errors: [], weightLb: 3.25, findId: find.body.id });
      expect(rows[1]!.errors[0]).toMatchObject({ field: 'date' });
      expect(rows[2]!.errors[0]).toMatchObject({ field: 'species' });
      expect(rows[3]!.errors[0]).toMatchObject({ field: 'weight' });
      expect(rows[4]!.errors[0]).toMatchObject({ field: 'find_name' });

      const journalBefore = await journalCount(app, crew.crewId);
      const refused = await upload(crew.angler, `${base}/catches/import?eventId=${eventId}`, bad, 'day1.csv');
      expect(refused.status).toBe(400);
      expect(refused.body.code).toBe('import_refused');
      expect(Object.keys(refused.body.fieldErrors)).toEqual(
        expect.arrayContaining(['line 3: date', 'line 4: species', 'line 5: weight', 'line 6: find_name']),
      );
      expect(await testEm(app).count(Catch, { crewId: crew.crewId })).toBe(before);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore);

      const good = [
        header,
        '2024-04-12,07:30,largemouth,3,lb-oz,4,18,in,weighed,jig,drag,CSV shell bed,,,first',
        '2024-04-13,09:05,smallmouth,1.2,kg,,380,mm,released,tube,,,32.9,-96.3,by coordinates',
      ].join('\r\n');
      const ok = await upload(crew.angler, `${base}/catches/import?eventId=${eventId}`, good, 'days.csv');
      expectOk(ok, 201);
      expect(ok.body).toEqual({ imported: 2, skipped: 0, errors: [] });
      const list = await crew.angler.get(`${base}/catches?eventId=${eventId}`);
      const kg = list.body.find((c: { notes: string }) => c.notes === 'by coordinates');
      expect(kg).toMatchObject({
        findId: find.body.id,
        attributionDistanceM: 0,
        entered: { weight: { value: 1.2, unit: 'kg' }, length: { value: 380, unit: 'mm' } },
      });
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore + 2);
    });

    it('refuses a row timed before the day’s start or after its check-in, naming the line, and writes nothing', async () => {
      const timed = await createEvent(crew.angler, crew.crewId, lakeId, { name: 'Timed Open' });
      const [day] = await competitionDays(crew.angler, crew.crewId, timed.id);
      expectOk(
        await crew.angler.patch(`${base}/competition-days/${day!.id}`, {
          startTime: '06:30',
          checkInTime: '15:00',
          version: day!.version,
        }),
      );
      const file = [
        header,
        '2024-04-12,06:30,largemouth,3,,,18,,weighed,,,,,,at take-off',
        '2024-04-12,06:29,largemouth,2,,,15,,weighed,,,,,,a minute early',
        '2024-04-12,15:00,spotted,2,,,15,,weighed,,,,,,at check-in',
        '2024-04-12,15:20,spotted,2,,,15,,weighed,,,,,,after check-in',
        '2024-04-13,05:10,spotted,2,,,15,,weighed,,,,,,second day has no times',
      ].join('\n');
      const window =
        'Catches on 2024-04-12 count from the 06:30 start to the 15:00 check-in (lake time, America/Chicago)';

      const preview = await upload(
        crew.angler,
        `${base}/catches/import/preview?eventId=${timed.id}`,
        file,
        'timed.csv',
      );
      expectOk(preview);
      expect(preview.body).toMatchObject({ accepted: 3, rejected: 2 });
      const rows = preview.body.rows as {
        line: number;
        caughtAt: string | null;
        errors: { field: string; message: string }[];
      }[];
      expect(rows.map((r) => r.errors)).toEqual([
        [],
        [{ field: 'time', message: `${window}; 06:29 is before the start.` }],
        [],
        [{ field: 'time', message: `${window}; 15:20 is after check-in.` }],
        [],
      ]);
      expect(rows[0]!.caughtAt).toBe('2024-04-12T11:30:00.000Z'); // 06:30 CDT = UTC−5 (IANA tz database)

      const before = await testEm(app).count(Catch, { eventId: timed.id });
      const journalBefore = await journalCount(app, crew.crewId);
      const refused = await upload(crew.angler, `${base}/catches/import?eventId=${timed.id}`, file, 'timed.csv');
      expect(refused.status).toBe(400);
      expect(refused.body).toMatchObject({
        code: 'import_refused',
        fieldErrors: {
          'line 3: time': [`${window}; 06:29 is before the start.`],
          'line 5: time': [`${window}; 15:20 is after check-in.`],
        },
      });
      expect(Object.keys(refused.body.fieldErrors)).toHaveLength(2);
      expect(refused.body.message).toMatch(/2 of 5 row\(s\) have errors; nothing was imported/);
      expect(await testEm(app).count(Catch, { eventId: timed.id })).toBe(before);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore);

      const boundaries = [header, file.split('\n')[1], file.split('\n')[3]].join('\n');
      const ok = await upload(crew.angler, `${base}/catches/import?eventId=${timed.id}`, boundaries, 'timed.csv');
      expectOk(ok, 201);
      expect(ok.body).toEqual({ imported: 2, skipped: 0, errors: [] });
      expect(await testEm(app).count(Catch, { eventId: timed.id })).toBe(before + 2);
    });

    it('imports the same file twice as once: rows already logged (same day, minute, species, weight) or repeated in the file are skipped', async () => {
      const twice = await createEvent(crew.angler, crew.crewId, lakeId, { name: 'Twice Open' });
      const file = [
        header,
        '2024-04-12,07:30,largemouth,3,lb-oz,4,18,in,weighed,,,,,,first',
        '2024-04-12,07:30,largemouth,3.25,,,18,in,weighed,,,,,,the same fish typed in pounds',
        '2024-04-12,07:30,largemouth,3.5,,,18,in,weighed,,,,,,another fish that minute',
        '2024-04-13,07:30,largemouth,3.25,,,18,in,weighed,,,,,,the next day',
      ].join('\n');
      const first = await upload(crew.angler, `${base}/catches/import?eventId=${twice.id}`, file, 'twice.csv');
      expectOk(first, 201);
      expect(first.body).toEqual({ imported: 3, skipped: 1, errors: [] });
      expect(await testEm(app).count(Catch, { eventId: twice.id })).toBe(3);

      const preview = await upload(
        crew.angler,
        `${base}/catches/import/preview?eventId=${twice.id}`,
        file,
        'twice.csv',
      );
      expectOk(preview);
      expect(preview.body).toMatchObject({ accepted: 4, rejected: 0, duplicates: 4 });
      const logged = await testEm(app).find(Catch, { eventId: twice.id });
      const rows = preview.body.rows as { duplicateOf: { catchId: string | null; line?: number } | null }[];
      for (const r of rows) expect(logged.map((c) => c.id)).toContain(r.duplicateOf!.catchId);

      const journalBefore = await journalCount(app, crew.crewId);
      const again = await upload(crew.angler, `${base}/catches/import?eventId=${twice.id}`, file, 'twice.csv');
      expectOk(again, 201);
      expect(again.body).toEqual({ imported: 0, skipped: 4, errors: [] });
      expect(await testEm(app).count(Catch, { eventId: twice.id })).toBe(3);
      expect(await journalCount(app, crew.crewId)).toBe(journalBefore);
    });

    it('refuses unknown columns and binary files', async () => {
      const res = await upload(
        crew.angler,
        `${base}/catches/import?eventId=${eventId}`,
        'date,time,species,weight,fate,colour\n2024-04-12,07:00,largemouth,2,weighed,green',
        'x.csv',
      );
      expect(res.status).toBe(400);
      expect(res.body).toMatchObject({ code: 'malformed_file' });
      expect(res.body.message).toMatch(/Unknown column\(s\): colour/);
      const png = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#000' } })
        .png()
        .toBuffer();
      const bin = await upload(crew.angler, `${base}/catches/import?eventId=${eventId}`, png, 'catches.csv');
      expect(bin.body.code).toBe('wrong_file_type');
    });
  });

  it('attributes a catch to the nearest find within 50 m, says which and how far, and none beyond', async () => {
    const [day] = await competitionDays(crew.angler, crew.crewId, eventId);
    const a = await crew.angler.post(`${base}/finds`, {
      lakeId,
      name: 'Attr A',
      lat: 32.8,
      lon: -96.4,
      kind: 'contour',
      subKind: 'point',
    });
    const b = await crew.angler.post(`${base}/finds`, {
      lakeId,
      name: 'Attr B',
      lat: 32.8 + mLat(60),
      lon: -96.4,
      kind: 'contour',
      subKind: 'ledge',
    });
    expectOk(a, 201);
    expectOk(b, 201);
    const log = (lat: number) =>
      crew.angler.post(`${base}/catches`, {
        competitionDayId: day!.id,
        caughtAt: '11:00',
        lat,
        lon: -96.4,
        species: 'spotted',
        weightLb: 2,
        fate: 'weighed',
      });
    const near = await log(32.8 + mLat(20));
    expectOk(near, 201);
    expect(near.body).toMatchObject({ findId: a.body.id, findName: 'Attr A' });
    expect(near.body.attributionDistanceM).toBeCloseTo(20, 0);
    const nearerB = await log(32.8 + mLat(45));
    expect(nearerB.body).toMatchObject({ findId: b.body.id });
    expect(nearerB.body.attributionDistanceM).toBeCloseTo(15, 0);
    const none = await log(32.8 - mLat(55));
    expectOk(none, 201);
    expect(none.body).toMatchObject({ findId: null, attributionDistanceM: null });
  });
});
