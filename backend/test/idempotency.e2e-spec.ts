import type { INestApplication } from '@nestjs/common';
import { v4 as uuidv4, v7 as uuidv7 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CatchView, CompetitionDayView, LakeView } from '@shoalbook/shared';
import { Catch } from '../src/catches/catch.entity';
import { Find } from '../src/finds/find.entity';
import { IdempotencyKeyCleanup } from '../src/idempotency/idempotency-key-cleanup.service';
import { IdempotencyKey } from '../src/idempotency/idempotency-key.entity';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { addMember, crewWithMembers, newUser, type ApiClient, type CrewFixture } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';
import { competitionDays, createEvent, createLake, expectOk, journalCount, journalOf } from './journal-fixtures';

/*
 * Behaviour checked against the IETF HTTP API working group's draft "The Idempotency-Key HTTP Header Field"
 * (draft-ietf-httpapi-idempotency-key-header-07): §2.2 the key is an sf-string, §2.6 a repeated request with
 * the same key and payload gets the first answer, the same key with another payload is refused with 422, and a
 * request while the first with that key is still being processed gets 409. Client-made record ids are UUID
 * version 7 (RFC 9562 §5.7), made with the `uuid` package.
 */
describe('Idempotency-Key on journal writes: exactly once for any client', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let base: string;
  let lake: LakeView;
  let day: CompetitionDayView;

  const catchBody = (over: object = {}) => ({
    competitionDayId: day.id,
    caughtAt: '08:15',
    species: 'largemouth',
    weightLb: 3.4,
    fate: 'weighed',
    ...over,
  });
  const withKey = (key: string) => ({ 'Idempotency-Key': `"${key}"` });
  const catchRows = (id: string) => testEm(app).count(Catch, { id });
  const keyRows = (key: string) => testEm(app).count(IdempotencyKey, { key });

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Idempotency Crew');
    base = `/api/crews/${crew.crewId}`;
    lake = await createLake(crew.angler, crew.crewId);
    const event = await createEvent(crew.angler, crew.crewId, lake.id);
    [day] = await competitionDays(crew.angler, crew.crewId, event.id);
  });
  afterAll(async () => {
    await app.close();
  });

  it('answers a repeated log-catch with the first answer and writes one catch and one journal event', async () => {
    const id = uuidv7();
    const key = uuidv7();
    const first = await crew.angler.send('post', `${base}/catches`, catchBody({ id }), withKey(key));
    expectOk(first, 201);
    expect(first.body.id).toBe(id);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const again = await crew.angler.send('post', `${base}/catches`, catchBody({ id }), withKey(key));
    expectOk(again, 201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(await catchRows(id)).toBe(1);
    expect((await journalOf(app, id)).map((e) => e.type)).toEqual(['CatchLogged']);
    expect(await keyRows(key)).toBe(1);
  });

  it('replayed 50 times at once: one catch, one journal event; every answer is the first one or 409', async () => {
    const id = uuidv7();
    const key = uuidv7();
    const results = await Promise.all(
      Array.from({ length: 50 }, () =>
        crew.angler.send('post', `${base}/catches`, catchBody({ id, caughtAt: '09:05' }), withKey(key)),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.every((s) => s === 201 || s === 409)).toBe(true);
    const created = results.filter((r) => r.status === 201);
    expect(created.length).toBeGreaterThanOrEqual(1);
    for (const r of created) expect(r.body).toEqual(created[0]!.body);
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.code).toBe('idempotency_key_in_use');
    expect(await catchRows(id)).toBe(1);
    expect(await journalOf(app, id)).toHaveLength(1);
    // Once the first has finished, a retry always gets its answer.
    const retry = await crew.angler.send('post', `${base}/catches`, catchBody({ id, caughtAt: '09:05' }), withKey(key));
    expectOk(retry, 201);
    expect(retry.body).toEqual(created[0]!.body);
  });

  it('refuses the same key with a different body (422) and writes nothing', async () => {
    const key = uuidv7();
    const id = uuidv7();
    expectOk(await crew.angler.send('post', `${base}/catches`, catchBody({ id }), withKey(key)), 201);
    const eventsBefore = await journalCount(app, crew.crewId);
    const otherId = uuidv7();
    const res = await crew.angler.send(
      'post',
      `${base}/catches`,
      catchBody({ id: otherId, weightLb: 4.4 }),
      withKey(key),
    );
    expect(res.status).toBe(422);
    expect(res.body.code).toBe('idempotency_key_reused');
    expect(res.body.message).toMatch(/already used for a different request/);
    expect(await catchRows(otherId)).toBe(0);
    expect(await journalCount(app, crew.crewId)).toBe(eventsBefore);
    // The same body with its keys in another order is the same request, not a reuse.
    const { id: _id, ...rest } = catchBody({ id });
    const reordered = Object.fromEntries(Object.entries({ ...rest, id }).reverse());
    expectOk(await crew.angler.send('post', `${base}/catches`, reordered, withKey(key)), 201);
    // The same key on another route is another request too.
    const elsewhere = await crew.angler.send(
      'post',
      `${base}/finds`,
      { lakeId: lake.id, name: 'Rock pile', lat: 32.951, lon: -96.201, kind: 'hard-bottom' },
      withKey(key),
    );
    expect(elsewhere.status).toBe(422);
  });

  it('scopes keys per crew and per user: the same key elsewhere is a new request', async () => {
    const key = uuidv7();
    const a = await crew.angler.send('post', `${base}/catches`, catchBody(), withKey(key));
    expectOk(a, 201);
    // Another member of the same crew with the same key and body writes their own catch.
    const b = await crew.owner.send('post', `${base}/catches`, catchBody(), withKey(key));
    expectOk(b, 201);
    expect(b.body.id).not.toBe(a.body.id);
    // The same user in a second crew.
    const other = await crewWithMembers(app, 'Second Crew');
    await addMember(app, other.crewId, crew.angler.userId, 'angler');
    const otherLake = await createLake(other.owner, other.crewId);
    const otherEvent = await createEvent(other.owner, other.crewId, otherLake.id);
    const [otherDay] = await competitionDays(other.owner, other.crewId, otherEvent.id);
    const c = await crew.angler.send(
      'post',
      `/api/crews/${other.crewId}/catches`,
      catchBody({ competitionDayId: otherDay!.id }),
      withKey(key),
    );
    expectOk(c, 201);
    expect(await keyRows(key)).toBe(3);
  });

  it('releases the key of a refused request, so the corrected request can be sent with it', async () => {
    const key = uuidv7();
    const bad = await crew.angler.send('post', `${base}/catches`, catchBody({ caughtAt: '25:99' }), withKey(key));
    expect(bad.status).toBe(400);
    expect(await keyRows(key)).toBe(0);
    expectOk(await crew.angler.send('post', `${base}/catches`, catchBody(), withKey(key)), 201);
  });

  it('makes edits, finds, weigh-in figures and deletions exactly-once too', async () => {
    const logged = await crew.angler.post(`${base}/catches`, catchBody());
    expectOk(logged, 201);
    const c = logged.body as CatchView;
    const editKey = uuidv7();
    const edit = { version: c.version, weightLb: 3.9 };
    const e1 = await crew.angler.send('patch', `${base}/catches/${c.id}`, edit, withKey(editKey));
    expectOk(e1);
    // Without the key this repeat would be refused as stale (version 1 is gone); with it, the first answer.
    const e2 = await crew.angler.send('patch', `${base}/catches/${c.id}`, edit, withKey(editKey));
    expectOk(e2);
    expect(e2.body).toEqual(e1.body);
    expect((await journalOf(app, c.id)).map((e) => e.type)).toEqual(['CatchLogged', 'CatchUpdated']);

    const findId = uuidv7();
    const findKey = uuidv7();
    const find = { id: findId, lakeId: lake.id, name: 'Channel swing', lat: 32.952, lon: -96.202, kind: 'hard-bottom' };
    const f1 = await crew.angler.send('post', `${base}/finds`, find, withKey(findKey));
    expectOk(f1, 201);
    expect(f1.body.id).toBe(findId);
    expectOk(await crew.angler.send('post', `${base}/finds`, find, withKey(findKey)), 201);
    expect(await testEm(app).count(Find, { id: findId })).toBe(1);

    const weighKey = uuidv7();
    const figures = { grossLb: 14.2, penaltyLb: 0, officialLb: 14.2, dayPlace: 3 };
    const w1 = await crew.angler.send('put', `${base}/competition-days/${day.id}/weigh-in`, figures, withKey(weighKey));
    expectOk(w1);
    const w2 = await crew.angler.send('put', `${base}/competition-days/${day.id}/weigh-in`, figures, withKey(weighKey));
    expect(w2.body).toEqual(w1.body);
    expect(w2.headers['idempotent-replayed']).toBe('true');

    // Start a stop, then leave it: both exactly once (a replayed "leave" gets its first answer, not a 409).
    const stopId = uuidv7();
    const startKey = uuidv7();
    const start = { id: stopId, competitionDayId: day.id, lat: 32.953, lon: -96.203, arrivedAt: '10:00' };
    const s1 = await crew.angler.send('post', `${base}/stops`, start, withKey(startKey));
    expectOk(s1, 201);
    expect(s1.body.id).toBe(stopId);
    expectOk(await crew.angler.send('post', `${base}/stops`, start, withKey(startKey)), 201);
    const leave = { version: s1.body.version, leftAt: '10:40' };
    const leaveKey = uuidv7();
    const l1 = await crew.angler.send('patch', `${base}/stops/${stopId}`, leave, withKey(leaveKey));
    expectOk(l1);
    const l2 = await crew.angler.send('patch', `${base}/stops/${stopId}`, leave, withKey(leaveKey));
    expectOk(l2);
    expect(l2.body).toEqual(l1.body);
    expect((await journalOf(app, stopId)).map((e) => e.type)).toEqual(['StopLogged', 'StopUpdated']);

    const delKey = uuidv7();
    const d1 = await crew.angler.send('delete', `${base}/catches/${c.id}`, undefined, withKey(delKey));
    expect(d1.status).toBe(204);
    // A retried deletion gets 204 again, not 404.
    const d2 = await crew.angler.send('delete', `${base}/catches/${c.id}`, undefined, withKey(delKey));
    expect(d2.status).toBe(204);
    expect((await journalOf(app, c.id)).map((e) => e.type)).toEqual(['CatchLogged', 'CatchUpdated', 'CatchDeleted']);
  });

  it('refuses a malformed key (400 naming the header) and a client id that is taken or not a UUID v7', async () => {
    for (const bad of ['""', '"unterminated', 'tab\tinside', 'x'.repeat(256)]) {
      const res = await crew.angler.send('post', `${base}/catches`, catchBody(), { 'Idempotency-Key': bad });
      expect(res.status, bad).toBe(400);
      expect(res.body.code).toBe('idempotency_key_invalid');
      expect(res.body.fieldErrors['Idempotency-Key']).toHaveLength(1);
    }
    const bare = await crew.angler.send('post', `${base}/catches`, catchBody(), { 'Idempotency-Key': uuidv4() });
    expectOk(bare, 201);

    const id = uuidv7();
    expectOk(await crew.angler.post(`${base}/catches`, catchBody({ id })), 201);
    const taken = await crew.angler.post(`${base}/catches`, catchBody({ id }));
    expect(taken.status).toBe(409);
    expect(taken.body.code).toBe('id_taken');
    const v4 = await crew.angler.post(`${base}/catches`, catchBody({ id: uuidv4() }));
    expect(v4.status).toBe(400);
    expect(v4.body.fieldErrors.id).toBeDefined();
  });

  it('stores nothing for a caller the crew refuses', async () => {
    const key = uuidv7();
    const viewer = await crew.viewer.send('post', `${base}/catches`, catchBody(), withKey(key));
    expect(viewer.status).toBe(403);
    const outsider: ApiClient = await newUser(app, 'outsider');
    expect((await outsider.send('post', `${base}/catches`, catchBody(), withKey(key))).status).toBe(404);
    expect(await keyRows(key)).toBe(0);
  });

  it('honours a key for 30 days: an older key is replaced on use and removed by the sweep', async () => {
    const key = uuidv7();
    expectOk(await crew.angler.send('post', `${base}/catches`, catchBody(), withKey(key)), 201);
    const em = testEm(app);
    const aged = new Date(Date.now() - 31 * 24 * 3_600_000);
    await em.nativeUpdate(IdempotencyKey, { key }, { createdAt: aged });
    // After expiry the key means nothing: another body is a new request, not a reuse.
    const fresh = await crew.angler.send('post', `${base}/catches`, catchBody({ weightLb: 2.2 }), withKey(key));
    expectOk(fresh, 201);
    expect(fresh.headers['idempotent-replayed']).toBeUndefined();

    const oldKey = uuidv7();
    expectOk(await crew.angler.send('post', `${base}/catches`, catchBody(), withKey(oldKey)), 201);
    await em.nativeUpdate(IdempotencyKey, { key: oldKey }, { createdAt: aged });
    expect(await app.get(IdempotencyKeyCleanup).sweep()).toBeGreaterThanOrEqual(1);
    expect(await keyRows(oldKey)).toBe(0);
    expect(await keyRows(key)).toBe(1);
    expect(await testEm(app).count(JournalEvent, { crewId: crew.crewId })).toBeGreaterThan(0);
  });
});
