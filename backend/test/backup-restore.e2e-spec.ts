import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Find } from '../src/finds/find.entity';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { Lake } from '../src/lakes/lake.entity';
import { Photo } from '../src/photos/photo.entity';
import { User } from '../src/users/user.entity';
import { createLake, expectOk, upload } from './journal-fixtures';
import { crewWithMembers, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

const ROOT = resolve(__dirname, '..', '..');
/** The test profile's photo folder, as the app under test uses it (vitest.config.mts sets UPLOAD_DIR). */
const UPLOAD_DIR = process.env.UPLOAD_DIR!;

/** Run the backup script on the test profile (SHOALBOOK_TEST_PROFILE passes through the environment). */
function backup(cmd: 'dump' | 'restore', file: string) {
  const r = spawnSync(process.execPath, [join(ROOT, 'scripts', 'backup.mjs'), cmd, 'test', file], {
    cwd: ROOT,
    encoding: 'utf8',
    env: process.env,
    timeout: 120_000,
  });
  return { status: r.status, output: `${r.stdout}\n${r.stderr}` };
}

function tar(args: string[]): string {
  // The dump of a whole test run's database is several megabytes: room for it on stdout.
  const r = spawnSync('tar', args, { encoding: 'utf8', maxBuffer: 512 * 1024 * 1024 });
  if (r.status !== 0) throw new Error(`tar ${args.join(' ')}: ${r.error?.message ?? r.stderr}`);
  return r.stdout;
}

/** Every photo file under the upload folder, as storage keys ("ab/ab…"). */
function storedKeys(): string[] {
  if (!existsSync(UPLOAD_DIR)) return [];
  return readdirSync(UPLOAD_DIR, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => join(e.parentPath, e.name).slice(UPLOAD_DIR.length + 1))
    .sort();
}

describe('backup and restore round trip: database (mariadb-dump --single-transaction) and photo files in one archive', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let dir: string;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Backup Crew');
    base = `/api/crews/${crew.crewId}`;
    dir = mkdtempSync(join(tmpdir(), 'shoalbook-backup-'));
  });
  afterAll(async () => {
    await app.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const image = (r: number) =>
    sharp({ create: { width: 40, height: 30, channels: 3, background: { r, g: 90, b: 120 } } })
      .png()
      .toBuffer();
  const photoBytes = async (id: string) => {
    const res = await crew.viewer.agent
      .get(`${base}/photos/${id}`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    return { status: res.status, body: res.body as Buffer };
  };

  it('restores exactly the data and the photo files of the backup, undoing later changes', async () => {
    const lake = await createLake(crew.owner, crew.crewId, { name: 'Backup Lake' });
    const photo = await upload(crew.angler, `${base}/photos`, await image(30), 'shell-bed.png');
    expectOk(photo, 201);
    const find = await crew.owner.post(`${base}/finds`, {
      lakeId: lake.id,
      name: 'Rock pile',
      lat: 32.9501,
      lon: -96.2002,
      kind: 'hard-bottom',
      subKind: 'rock',
      depthFt: 14,
      photoId: photo.body.id,
    });
    expectOk(find, 201);
    const journalBefore = await testEm(app).count(JournalEvent, { crewId: crew.crewId });
    const photoBefore = await photoBytes(photo.body.id);
    expect(photoBefore.status).toBe(200);
    const { storageKey } = await testEm(app).findOneOrFail(Photo, { id: photo.body.id });
    const keysBefore = storedKeys();
    expect(keysBefore).toContain(storageKey);

    const file = join(dir, 'journal.tar');
    const dumped = backup('dump', file);
    expect(dumped.status, dumped.output).toBe(0);
    expect(dumped.output).toMatch(new RegExp(`and ${keysBefore.length} photo file\\(s\\)`));
    const members = tar(['--list', `--file=${file}`]).split('\n');
    expect(members).toContain('database.sql');
    expect(members).toContain(`uploads/${storageKey}`);
    const sql = tar(['--extract', '--to-stdout', `--file=${file}`, 'database.sql']);
    expect(sql).toContain('Backup Lake');
    expect(sql).toMatch(/-- Dump completed/);

    // Changes after the backup: a rename, a deletion, a new record and photo, a new account, a lost photo file.
    expectOk(await crew.owner.patch(`${base}/lakes/${lake.id}`, { name: 'Renamed Lake', version: lake.version }));
    expect((await crew.owner.delete(`${base}/finds/${find.body.id}`)).status).toBe(204);
    const extra = await createLake(crew.owner, crew.crewId, { name: 'Lake Added Later' });
    const later = await crewWithMembers(app, 'Crew Made Later');
    const laterPhoto = await upload(crew.angler, `${base}/photos`, await image(200), 'later.png');
    expectOk(laterPhoto, 201);
    const laterKey = (await testEm(app).findOneOrFail(Photo, { id: laterPhoto.body.id })).storageKey;
    rmSync(join(UPLOAD_DIR, storageKey));
    expect((await photoBytes(photo.body.id)).status).not.toBe(200);

    const restored = backup('restore', file);
    expect(restored.status, restored.output).toBe(0);
    expect(restored.output).toMatch(new RegExp(`and ${keysBefore.length} photo file\\(s\\) into`));

    const em = testEm(app);
    expect((await em.findOneOrFail(Lake, { id: lake.id })).name).toBe('Backup Lake');
    const back = await em.findOneOrFail(Find, { id: find.body.id });
    expect(back).toMatchObject({
      name: 'Rock pile',
      lat: 32.9501,
      lon: -96.2002,
      depthFt: 14,
      kind: 'hard-bottom',
      photoId: photo.body.id,
    });
    expect(await em.count(Lake, { id: extra.id })).toBe(0);
    expect(await em.count(User, { id: later.owner.userId })).toBe(0);
    expect(await em.count(Photo, { id: laterPhoto.body.id })).toBe(0);
    expect(await em.count(JournalEvent, { crewId: crew.crewId })).toBe(journalBefore);
    // The photo folder is the backup's: the lost file is back, byte for byte; the later one went with its row.
    expect(storedKeys()).toEqual(keysBefore);
    expect(storedKeys()).not.toContain(laterKey);
    const photoAfter = await photoBytes(photo.body.id);
    expect(photoAfter.status).toBe(200);
    expect(photoAfter.body.equals(photoBefore.body)).toBe(true);
    // The app reads the restored data through the API as before.
    const lakes = await crew.owner.get(`${base}/lakes`);
    expectOk(lakes);
    expect((lakes.body as { name: string }[]).map((l) => l.name)).toEqual(['Backup Lake']);
  });

  it('refuses a cut-off archive, a tar that is not a backup, a link inside it and a file that is no dump, changing nothing', async () => {
    const lakesBefore = await testEm(app).count(Lake, {});
    const keysBefore = storedKeys();
    const archive = readFileSync(join(dir, 'journal.tar'));
    const cut = join(dir, 'cut.tar');
    writeFileSync(cut, archive.subarray(0, Math.floor(archive.length / 2)));
    const cutRes = backup('restore', cut);
    expect(cutRes.status).not.toBe(0);
    expect(cutRes.output).toMatch(/cannot be unpacked .*nothing was restored/s);

    writeFileSync(join(dir, 'notes.txt'), 'not a backup');
    const other = join(dir, 'other.tar');
    tar(['--create', `--file=${other}`, '-C', dir, 'notes.txt']);
    expect(backup('restore', other).output).toMatch(
      /not a Shoalbook backup: it holds notes\.txt instead of database\.sql and uploads\/; nothing was restored/,
    );

    const linked = join(dir, 'linked');
    mkdirSync(join(linked, 'uploads'), { recursive: true });
    tar(['--extract', `--file=${join(dir, 'journal.tar')}`, '-C', linked, 'database.sql']);
    spawnSync('ln', ['-s', '/etc/hostname', join(linked, 'uploads', 'ab')]);
    const withLink = join(dir, 'with-link.tar');
    tar(['--create', `--file=${withLink}`, '-C', linked, 'database.sql', 'uploads']);
    expect(backup('restore', withLink).output).toMatch(
      /uploads\/ab is neither a file nor a folder; nothing was restored/,
    );

    const junk = join(dir, 'junk.sql');
    writeFileSync(junk, 'DROP TABLE lakes;\n');
    const junkRes = backup('restore', junk);
    expect(junkRes.status).not.toBe(0);
    expect(junkRes.output).toMatch(/neither a backup archive nor a complete mariadb-dump file/);

    expect(await testEm(app).count(Lake, {})).toBe(lakesBefore);
    expect(storedKeys()).toEqual(keysBefore);
    // No unpacked copy is left behind beside the upload folder.
    expect(readdirSync(resolve(UPLOAD_DIR, '..')).filter((n) => n.startsWith('.restore-'))).toEqual([]);
  });

  it('still restores a database-only SQL dump, leaving the photo files as they are', async () => {
    const sqlOnly = join(dir, 'database-only.sql');
    writeFileSync(sqlOnly, tar(['--extract', '--to-stdout', `--file=${join(dir, 'journal.tar')}`, 'database.sql']));
    const keysBefore = storedKeys();
    const added = await createLake(crew.owner, crew.crewId, { name: 'Lake After The Dump' });
    const res = backup('restore', sqlOnly);
    expect(res.status, res.output).toBe(0);
    expect(res.output).toMatch(/database-only dump .*photo files .* were left as they are/s);
    expect(await testEm(app).count(Lake, { id: added.id })).toBe(0);
    expect(storedKeys()).toEqual(keysBefore);
  });
});
