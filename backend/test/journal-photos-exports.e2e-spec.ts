import type { INestApplication } from '@nestjs/common';
import Papa from 'papaparse';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Photo } from '../src/photos/photo.entity';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk, upload } from './journal-fixtures';

describe('photos and exports', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Photo Crew');
    base = `/api/crews/${crew.crewId}`;
  });
  afterAll(async () => {
    await app.close();
  });

  it('strips EXIF with a GPS position from an uploaded JPEG; only crew members get the image', async () => {
    const jpeg = await sharp({ create: { width: 120, height: 80, channels: 3, background: { r: 20, g: 80, b: 110 } } })
      .jpeg()
      .withExif({
        IFD0: { Make: 'LeakyCam' },
        IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '30/1 0/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '95/1 30/1 0/1' },
      })
      .toBuffer();
    expect((await sharp(jpeg).metadata()).exif).toBeDefined();
    const res = await upload(crew.angler, `${base}/photos`, jpeg, 'catch-with-gps.jpg');
    expectOk(res, 201);
    expect(res.body).toMatchObject({ contentType: 'image/jpeg', width: 120, height: 80 });
    const stored = await testEm(app).findOneOrFail(Photo, { id: res.body.id });
    expect(stored.storageKey).not.toContain('catch-with-gps');

    const served = await crew.viewer.agent
      .get(`${base}/photos/${res.body.id}`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    const meta = await sharp(served.body as Buffer).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect((served.body as Buffer).includes(Buffer.from('LeakyCam'))).toBe(false);

    const rival = await crewWithMembers(app, 'Rival Photo Crew');
    expect((await rival.owner.get(`${base}/photos/${res.body.id}`)).status).toBe(404);
    expect((await rival.owner.get(`/api/crews/${rival.crewId}/photos/${res.body.id}`)).status).toBe(404);

    const find = await crew.angler.post(`${base}/finds`, {
      lakeId: (await createLake(crew.angler, crew.crewId)).id,
      name: 'With photo',
      lat: 1,
      lon: 1,
      kind: 'other',
      photoId: res.body.id,
    });
    expectOk(find, 201);
    expect(find.body.photoId).toBe(res.body.id);
  });

  it('refuses a non-image (by content) and an image over 8 MB', async () => {
    const before = await testEm(app).count(Photo, { crewId: crew.crewId });
    const fake = await upload(crew.angler, `${base}/photos`, Buffer.from('<gpx></gpx>'), 'photo.jpg');
    expect(fake.status).toBe(400);
    expect(fake.body.code).toBe('wrong_file_type');
    const big = await upload(crew.angler, `${base}/photos`, Buffer.alloc(8 * 1024 * 1024 + 10, 0xff), 'big.jpg');
    expect(big.status).toBe(413);
    expect(big.body.code).toBe('file_too_large');
    expect(await testEm(app).count(Photo, { crewId: crew.crewId })).toBe(before);
  });

  it('exports the whole journal as JSON and CSV, with positions, a notice, and formula cells neutralised', async () => {
    const lake = await createLake(crew.angler, crew.crewId, { name: '=HYPERLINK("http://evil.test","lake")' });
    const event = await createEvent(crew.angler, crew.crewId, lake.id, { name: '+Spring', notes: '@SUM(A1:A9)' });
    const [day] = await competitionDays(crew.angler, crew.crewId, event.id);
    const find = await crew.angler.post(`${base}/finds`, {
      lakeId: lake.id,
      name: '-2+3',
      notes: '\tTAB lead',
      lat: 32.91,
      lon: -96.21,
      kind: 'wood-brush',
    });
    expectOk(find, 201);
    const c = await crew.angler.post(`${base}/catches`, {
      competitionDayId: day!.id,
      caughtAt: '08:00',
      findId: find.body.id,
      species: 'largemouth',
      weight: { value: 2, unit: 'lb-oz', ounces: 8 },
      fate: 'weighed',
      lure: '=cmd|" /C calc"!A0',
      // Past the plain lead characters: leading spaces before =, and a full-width ＋ (OWASP CSV Injection).
      technique: '  =1+1',
      notes: '＋HYPERLINK("http://evil.test")',
    });
    expectOk(c, 201);

    const json = await crew.angler.get(`${base}/export.json`);
    expectOk(json);
    expect(json.headers['content-disposition']).toMatch(/attachment/);
    expect(json.body.notice).toMatch(/exact positions/);
    expect(json.body.finds.find((f: { id: string }) => f.id === find.body.id)).toMatchObject({
      lat: 32.91,
      lon: -96.21,
    });
    expect(json.body.catches.find((x: { id: string }) => x.id === c.body.id)).toMatchObject({
      weightLb: 2.5,
      entered: { weight: { value: 2, unit: 'lb-oz', ounces: 8 } },
    });
    expect(json.body.events.find((e: { id: string }) => e.id === event.id).competitionDays).toHaveLength(2);

    const csv = await crew.owner.get(`${base}/export.csv`);
    expectOk(csv);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const rows = Papa.parse<Record<string, string>>(csv.text, { header: true, skipEmptyLines: true }).data;
    expect(rows[0]).toMatchObject({ record_type: 'notice' });
    expect(rows[0]!.notes).toMatch(/exact positions/);
    const cells = rows.flatMap((r) => Object.values(r));
    // OWASP "CSV Injection": no cell may start (after whitespace) with a formula sign, ASCII or full-width.
    for (const cell of cells) expect(cell).not.toMatch(/^(?:[\t\r]|\s*[=+@\uFF1D\uFF0B\uFF0D\uFF20])/u);
    for (const cell of cells) if (cell.startsWith('-')) expect(cell).toMatch(/^-\d+(\.\d+)?(e-?\d+)?$/); // negative numbers only
    expect(rows.find((r) => r.record_type === 'lake' && r.id === lake.id)!.name).toBe(
      `'=HYPERLINK("http://evil.test","lake")`,
    );
    expect(rows.find((r) => r.record_type === 'find' && r.id === find.body.id)).toMatchObject({
      name: "'-2+3",
      notes: "'\tTAB lead",
      lat: '32.91',
      lon: '-96.21',
    });
    expect(rows.find((r) => r.record_type === 'catch')).toMatchObject({
      lure: `'=cmd|" /C calc"!A0`,
      technique: "'  =1+1",
      notes: `'＋HYPERLINK("http://evil.test")`,
      weight_entered: '2 lb 8 oz',
    });
  });

  it('exports a lake’s finds as GPX 1.1 that the import reads back into a second lake unchanged (owner or angler only)', async () => {
    const lake = await createLake(crew.angler, crew.crewId, { name: 'Round Trip Reservoir' });
    const added = [
      {
        name: 'Rock & ridge',
        lat: 32.9112,
        lon: -96.2113,
        kind: 'hard-bottom',
        subKind: 'rock',
        depthFt: 18,
        notes: 'North lip',
      },
      { name: 'Milfoil edge', lat: 32.9201, lon: -96.2301, kind: 'vegetation', subKind: 'milfoil', notes: '' },
    ];
    for (const f of added) expectOk(await crew.angler.post(`${base}/finds`, { lakeId: lake.id, ...f }), 201);

    const gpx = await crew.angler.agent.get(`${base}/lakes/${lake.id}/finds.gpx`).buffer(true);
    expectOk(gpx);
    expect(gpx.headers['content-type']).toMatch(/^application\/gpx\+xml/);
    expect(gpx.headers['content-disposition']).toMatch(
      /attachment; filename="shoalbook-round-trip-reservoir-finds-\d{4}-\d{2}-\d{2}\.gpx"/,
    );
    expect(gpx.headers['x-shoalbook-notice']).toMatch(/exact positions/);
    expect((await crew.viewer.get(`${base}/lakes/${lake.id}/finds.gpx`)).status).toBe(403);
    expect((await crew.angler.get(`${base}/lakes/00000000-0000-7000-8000-000000000000/finds.gpx`)).status).toBe(404);

    // The import's own kind is 'other': every waypoint keeps the kind the file names.
    const copy = await createLake(crew.angler, crew.crewId, { name: 'Copy Reservoir' });
    const imported = await upload(
      crew.angler,
      `${base}/finds/import?lakeId=${copy.id}&kind=other`,
      gpx.text,
      'finds.gpx',
    );
    expectOk(imported, 201);
    expect(imported.body).toMatchObject({ imported: 2, skipped: 0, errors: [] });
    const listed = await crew.angler.get(`${base}/finds?lakeId=${copy.id}`);
    expectOk(listed);
    const items = (listed.body.items ?? listed.body) as Record<string, unknown>[];
    const pick = (f: Record<string, unknown>) => ({
      name: f.name,
      lat: f.lat,
      lon: f.lon,
      kind: f.kind,
      subKind: f.subKind,
      notes: f.notes,
      depthFt: f.depthFt == null ? null : Math.round((f.depthFt as number) * 1000) / 1000,
    });
    expect(items.map(pick).sort((a, b) => String(a.name).localeCompare(String(b.name)))).toEqual(
      added
        .map((f) => ({ depthFt: undefined, ...f }))
        .map(pick)
        .sort((a, b) => String(a.name).localeCompare(String(b.name))),
    );
  });
});
