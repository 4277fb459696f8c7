import type { INestApplication } from '@nestjs/common';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuthToken } from '../src/auth/auth-token.entity';
import { Session } from '../src/auth/session.entity';
import { Crew } from '../src/crews/crew.entity';
import { crewScopedTables } from '../src/crews/crew-removal.service';
import { Membership } from '../src/crews/membership.entity';
import { Photo } from '../src/photos/photo.entity';
import { JournalProjector } from '../src/projections/journal-projector.service';
import { StorageService } from '../src/storage/storage.service';
import { User } from '../src/users/user.entity';
import { competitionDays, createEvent, createLake, expectOk, upload } from './journal-fixtures';
import { addMember, ApiClient, crewWithMembers, type CrewFixture, newUser } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

/** Rows per crew_id table (read models included) for one crew. */
async function rowsOf(app: INestApplication, crewId: string): Promise<Record<string, number>> {
  const em = testEm(app);
  const out: Record<string, number> = {};
  for (const table of await crewScopedTables(em)) {
    const [row] = (await em.execute(`SELECT COUNT(*) AS n FROM \`${table}\` WHERE crew_id = ?`, [crewId])) as {
      n: unknown;
    }[];
    out[table] = Number(row!.n);
  }
  return out;
}

const total = (rows: Record<string, number>) => Object.values(rows).reduce((a, b) => a + b, 0);

/** A crew journal touching every kind of record, a photo file and an invite; read models caught up. */
async function fillJournal(app: INestApplication, owner: ApiClient, crewId: string): Promise<{ photoKey: string }> {
  const base = `/api/crews/${crewId}`;
  const lake = await createLake(owner, crewId);
  const event = await createEvent(owner, crewId, lake.id);
  const [day] = await competitionDays(owner, crewId, event.id);
  const jpeg = await sharp({ create: { width: 16, height: 16, channels: 3, background: { r: 10, g: 90, b: 60 } } })
    .jpeg()
    .toBuffer();
  const photo = await upload(owner, `${base}/photos`, jpeg, 'find.jpg');
  expectOk(photo, 201);
  const find = await owner.post(`${base}/finds`, {
    lakeId: lake.id,
    eventId: event.id,
    practiceDate: '2024-04-10',
    name: 'Shell bar',
    lat: 32.951,
    lon: -96.201,
    kind: 'hard-bottom',
    subKind: 'shell',
    photoId: photo.body.id,
  });
  expectOk(find, 201);
  expectOk(
    await owner.post(`${base}/catches`, {
      competitionDayId: day!.id,
      caughtAt: '08:15',
      findId: find.body.id,
      species: 'largemouth',
      weightLb: 3.4,
      lengthIn: 18,
      fate: 'weighed',
      photoId: photo.body.id,
    }),
    201,
  );
  expectOk(await owner.send('put', `${base}/competition-days/${day!.id}/weigh-in`, { officialLb: 3.4 }));
  expectOk(
    await owner.post(`${base}/invites`, { email: `invitee-${crewId.slice(0, 6)}@example.test`, role: 'viewer' }),
    201,
  );
  await app.get(JournalProjector).requestCatchUp();
  const stored = await testEm(app).findOneOrFail(Photo, { id: photo.body.id });
  return { photoKey: stored.storageKey };
}

describe('deleting a crew (owner, confirmed by its name)', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let other: CrewFixture;
  let photoKey: string;
  let otherPhotoKey: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Crew To Remove');
    other = await crewWithMembers(app, 'Crew To Keep');
    ({ photoKey } = await fillJournal(app, crew.owner, crew.crewId));
    ({ photoKey: otherPhotoKey } = await fillJournal(app, other.owner, other.crewId));
  });
  afterAll(async () => {
    await app.close();
  });

  it('has data in the journal, read-model and photo storage to remove', async () => {
    const rows = await rowsOf(app, crew.crewId);
    for (const table of [
      'lakes',
      'events',
      'practice_days',
      'competition_days',
      'finds',
      'catches',
      'weigh_ins',
      'photos',
      'journal_event',
      'memberships',
      'invites',
    ]) {
      expect(rows[table], table).toBeGreaterThan(0);
    }
    // The read models are someone else's tables: found by their crew_id column, not by name.
    expect(Object.keys(rows).filter((t) => t.startsWith('rm_') && rows[t]! > 0).length).toBeGreaterThan(2);
    expect(await app.get(StorageService).get(photoKey)).not.toBeNull();
  });

  it('refuses anglers and viewers (403) and non-members (404), and changes nothing', async () => {
    const before = await rowsOf(app, crew.crewId);
    const body = { confirmName: 'Crew To Remove' };
    expect((await crew.angler.delete(`/api/crews/${crew.crewId}`, body)).status).toBe(403);
    expect((await crew.viewer.delete(`/api/crews/${crew.crewId}`, body)).status).toBe(403);
    expect((await other.owner.delete(`/api/crews/${crew.crewId}`, body)).status).toBe(404);
    expect(await rowsOf(app, crew.crewId)).toEqual(before);
  });

  it('refuses a missing or wrong confirmation (400 beside confirmName), and changes nothing', async () => {
    const before = await rowsOf(app, crew.crewId);
    for (const body of [
      undefined,
      {},
      { confirmName: 'crew to remove' },
      { confirmName: 'Crew To Keep' },
      { confirmName: 42 },
      { confirmName: 'Crew To Remove', extra: true },
    ]) {
      const res = await crew.owner.delete(`/api/crews/${crew.crewId}`, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.statusCode).toBe(400);
    }
    const wrong = await crew.owner.delete(`/api/crews/${crew.crewId}`, { confirmName: 'Crew To Rem0ve' });
    expect(wrong.body.fieldErrors).toHaveProperty('confirmName');
    expect(await rowsOf(app, crew.crewId)).toEqual(before);
    expect(await app.get(StorageService).get(photoKey)).not.toBeNull();
  });

  it('removes the crew with all its rows and photo files; the other crew keeps everything', async () => {
    const otherBefore = await rowsOf(app, other.crewId);
    const res = await crew.owner.delete(`/api/crews/${crew.crewId}`, { confirmName: '  Crew To Remove ' });
    expect(res.status, JSON.stringify(res.body)).toBe(204);

    const after = await rowsOf(app, crew.crewId);
    expect(total(after), JSON.stringify(after)).toBe(0);
    expect(await testEm(app).count(Crew, { id: crew.crewId })).toBe(0);
    expect(await app.get(StorageService).get(photoKey)).toBeNull();
    for (const member of [crew.owner, crew.angler, crew.viewer]) {
      expect((await member.get(`/api/crews/${crew.crewId}`)).status).toBe(404);
      expect((await member.get('/api/auth/me')).body.crews).toEqual([]);
    }
    // A later projection pass brings nothing back.
    await app.get(JournalProjector).requestCatchUp();
    expect(total(await rowsOf(app, crew.crewId))).toBe(0);

    expect(await rowsOf(app, other.crewId)).toEqual(otherBefore);
    expect(await app.get(StorageService).get(otherPhotoKey)).not.toBeNull();
    expect((await other.owner.get(`/api/crews/${other.crewId}/finds`)).body).toHaveLength(1);
  });
});

describe('deleting one’s own account (confirmed by the password)', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  async function accountRows(userId: string) {
    const em = testEm(app);
    return {
      users: await em.count(User, { id: userId }),
      memberships: await em.count(Membership, { user: userId }),
      sessions: await em.count(Session, { user: userId }),
      tokens: await em.count(AuthToken, { user: userId }),
    };
  }

  it('refuses a wrong or missing password (400) and changes nothing', async () => {
    const crew = await crewWithMembers(app, 'Password Crew');
    const before = await accountRows(crew.angler.userId);
    const wrong = await crew.angler.delete('/api/auth/me', { password: 'not my password at all' });
    expect(wrong.status).toBe(400);
    expect(wrong.body).toMatchObject({ code: 'wrong_password', fieldErrors: { password: expect.any(Array) } });
    expect((await crew.angler.delete('/api/auth/me')).status).toBe(400);
    expect(
      (await crew.angler.delete('/api/auth/me', { password: crew.angler.password, id: crew.owner.userId })).status,
    ).toBe(400);
    expect(await accountRows(crew.angler.userId)).toEqual(before);
    expect((await crew.angler.get('/api/auth/me')).status).toBe(200);
  });

  it('refuses the last owner of a crew with other members (409 last_owner) until another owner exists', async () => {
    const crew = await crewWithMembers(app, 'Last Owner Crew');
    const before = await accountRows(crew.owner.userId);
    const crewRowsBefore = await rowsOf(app, crew.crewId);
    const refused = await crew.owner.delete('/api/auth/me', { password: crew.owner.password });
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ statusCode: 409, code: 'last_owner' });
    expect(refused.body.message).toContain('Last Owner Crew');
    expect(await accountRows(crew.owner.userId)).toEqual(before);
    expect(await rowsOf(app, crew.crewId)).toEqual(crewRowsBefore);

    expectOk(await crew.owner.patch(`/api/crews/${crew.crewId}/members/${crew.angler.userId}`, { role: 'owner' }));
    const gone = await crew.owner.delete('/api/auth/me', { password: crew.owner.password });
    expect(gone.status, JSON.stringify(gone.body)).toBe(204);
    expect(await accountRows(crew.owner.userId)).toEqual({ users: 0, memberships: 0, sessions: 0, tokens: 0 });
    // The crew stays with its remaining members.
    const members = await crew.angler.get(`/api/crews/${crew.crewId}/members`);
    expectOk(members);
    expect((members.body as { userId: string }[]).map((m) => m.userId).sort()).toEqual(
      [crew.angler.userId, crew.viewer.userId].sort(),
    );
  });

  it('ends every session, forgets the address, and removes crews where the user was the only member', async () => {
    const user = await newUser(app, 'leaver');
    const second = new ApiClient(app);
    expectOk(await second.signIn(user.email, user.password));
    expectOk(await user.post('/api/auth/password-reset/request', { email: user.email }), 202);
    await expect.poll(async () => testEm(app).count(AuthToken, { user: user.userId })).toBe(1);

    const solo = await user.post('/api/crews', { name: 'Solo Crew' });
    expectOk(solo, 201);
    await fillJournal(app, user, solo.body.id);
    const shared = await crewWithMembers(app, 'Shared Crew');
    await addMember(app, shared.crewId, user.userId, 'angler');
    const sharedBefore = await rowsOf(app, shared.crewId);

    const res = await user.delete('/api/auth/me', { password: user.password });
    expect(res.status, JSON.stringify(res.body)).toBe(204);
    expect(([] as string[]).concat(res.headers['set-cookie'] ?? []).some((c) => c.startsWith('sb_session=;'))).toBe(
      true,
    );

    expect(await accountRows(user.userId)).toEqual({ users: 0, memberships: 0, sessions: 0, tokens: 0 });
    expect(await testEm(app).count(User, { email: user.email })).toBe(0);
    expect(total(await rowsOf(app, solo.body.id))).toBe(0);
    expect(await testEm(app).count(Crew, { id: solo.body.id })).toBe(0);
    // Only the membership left the shared crew.
    expect(await rowsOf(app, shared.crewId)).toEqual({ ...sharedBefore, memberships: sharedBefore.memberships! - 1 });
    expect((await second.get('/api/auth/me')).status).toBe(401);
    expect((await new ApiClient(app).signIn(user.email, user.password)).status).toBe(401);
    // The address is free again: a new account under it signs in as a new user.
    const again = await new ApiClient(app).signUp(user.email, 'a different passphrase', 'Back again');
    expect(again.me!.user.displayName).toBe('Back again');
    expect(again.userId).not.toBe(user.userId);
  });
});
