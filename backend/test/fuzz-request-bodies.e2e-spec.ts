import { randomUUID } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '@shoalbook/shared';
import { SessionsService } from '../src/auth/sessions.service';
import { hashToken, randomToken } from '../src/common/tokens';
import { Crew } from '../src/crews/crew.entity';
import { Invite } from '../src/crews/invite.entity';
import { Find } from '../src/finds/find.entity';
import { User } from '../src/users/user.entity';
import type { CompetitionDayView, EventView, LakeView } from '@shoalbook/shared';
import { JournalEvent } from '../src/journal-events/journal-event.entity';
import { competitionDays, createEvent, createLake, expectFieldError, expectOk, journalCount } from './journal-fixtures';
import {
  addMember,
  ApiClient,
  type CrewFixture,
  crewWithMembers,
  makeAdmin,
  newUser,
  uniqueEmail,
} from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

// Property-based fuzzing of every JSON request body in the OpenAPI document (security.md): whatever the body
// (arbitrary JSON, wrong types, huge strings, unknown fields, nested junk, text that is not JSON), the API
// never answers 5xx, every refusal has the ApiError shape, and a refused request changes no row.

/** Runs per route; the routes are many, so the whole file stays around a minute. */
const RUNS_PER_ROUTE = 100;

/** Tables left out of the change check: projections written in the background, and sessions (touched on use). */
const UNCHECKED = (table: string) =>
  table.startsWith('rm_') || table === 'projection_checkpoint' || table === 'sessions';

/**
 * Stands for "the record's current version" in sample bodies: replaced at send time by the version the
 * last accepted answer of the route carried, so edits keep reaching the handler instead of 409s.
 */
const CURRENT_VERSION = -4242;

/** Routes reached without a session (a signed-in sign-in or sign-up would end the fuzzing session). */
const ANONYMOUS = new Set([
  'POST /api/auth/sign-up',
  'POST /api/auth/sign-in',
  'POST /api/auth/password-reset/request',
  'POST /api/auth/password-reset/confirm',
]);

interface Route {
  key: string;
  method: 'post' | 'put' | 'patch' | 'delete';
  url: string;
}

/** Strings that have broken parsers and validators elsewhere. */
const NASTY = [
  '',
  ' ',
  '\u0000',
  '\uFEFF',
  '__proto__',
  'constructor',
  'toString',
  'NaN',
  'Infinity',
  '-1',
  '1e309',
  '0x10',
  'null',
  'true',
  "'; DROP TABLE lakes; --",
  '<script>alert(1)</script>',
  '%s%n',
  '../../etc/passwd',
  '2024-02-30',
  '2024-04-12T25:61:00Z',
  '99:99',
  '07:45',
  '00000000-0000-0000-0000-000000000000',
  randomUUID(),
  'A'.repeat(300),
  'é'.repeat(5000),
  '😀'.repeat(100),
];

/** Strings around and far past the 64 kB JSON limit, cheap to build. */
const hugeString = fc
  .tuple(fc.constantFrom('x', 'é', '😀', '"\\'), fc.integer({ min: 1_000, max: 90_000 }))
  .map(([c, n]) => c.repeat(Math.ceil(n / c.length)));

const { junk } = fc.letrec((tie) => ({
  junk: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.constant(null),
    fc.boolean(),
    fc.integer(),
    fc.double(),
    fc.constantFrom(Number.MAX_SAFE_INTEGER + 2, -0, 1e308, 5e-324, -5e-324, 2 ** 31, -(2 ** 31) - 1),
    fc.string({ maxLength: 30 }),
    fc.constantFrom(...NASTY),
    hugeString,
    fc.array(tie('junk'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('__proto__', 'constructor', 'version', 'crewId', 'id')),
      tie('junk'),
      { maxKeys: 4 },
    ),
  ),
}));

/** Set an own property, even one named __proto__, the way JSON.parse would. */
function setOwn(o: Record<string, unknown>, key: string, value: unknown): void {
  Object.defineProperty(o, key, { value, enumerable: true, writable: true, configurable: true });
}

type Edit = { kind: 'set' | 'delete' | 'nest'; key: string; value: unknown };

/** A value of the same JSON type as `like` (or null), often at an edge: it passes the type check and tests the rules behind it. */
function plausible(like: unknown): fc.Arbitrary<unknown> {
  if (typeof like === 'number') {
    return fc.oneof(
      fc.constant(null),
      fc.integer({ min: -1000, max: 100_000 }),
      fc.double({ noNaN: true, noDefaultInfinity: true }),
      fc.constantFrom(0, -0, -1, 0.5, 90.000001, -180.5, 1e9, 1e308, 5e-324, like + 1, like - 1),
    );
  }
  if (typeof like === 'string')
    return fc.oneof(
      fc.constant(null),
      fc.string({ maxLength: 40 }),
      fc.constantFrom(...NASTY),
      fc.string({ minLength: 100, maxLength: 6000 }),
    );
  if (typeof like === 'boolean') return fc.constantFrom(null, true, false);
  if (Array.isArray(like))
    return fc.oneof(
      fc.constant(null),
      fc.array(fc.oneof(...like.map((v) => plausible(v)), fc.constantFrom(...NASTY)), { maxLength: 20 }),
    );
  if (like && typeof like === 'object') {
    const entries = Object.entries(like);
    return fc.oneof(fc.constant(null), ...entries.map(([k, v]) => plausible(v).map((nv) => ({ ...like, [k]: nv }))));
  }
  return junk;
}

type Body = { value: unknown } | { raw: string };

/** A body for a route: a valid one with random edits, arbitrary JSON, or text that is not JSON at all. */
function bodyFor(sample: Record<string, unknown>): fc.Arbitrary<Body> {
  const keys = Object.keys(sample);
  const key = keys.length
    ? fc.oneof(fc.constantFrom(...keys), fc.string({ maxLength: 12 }))
    : fc.string({ maxLength: 12 });
  const edit: fc.Arbitrary<Edit> = fc.record({
    kind: fc.constantFrom('set', 'set', 'delete', 'nest'),
    key,
    value: junk,
  }) as fc.Arbitrary<Edit>;
  const typed: fc.Arbitrary<Edit[]> = keys.length
    ? fc.array(
        fc
          .constantFrom(...keys)
          .chain((k) => plausible(sample[k]).map((value): Edit => ({ kind: 'set', key: k, value }))),
        { minLength: 1, maxLength: 2 },
      )
    : fc.constant([]);
  const edited = fc.oneof(fc.array(edit, { minLength: 1, maxLength: 4 }), typed, typed).map((edits) => {
    const body: Record<string, unknown> = structuredClone(sample);
    for (const e of edits) {
      if (e.kind === 'delete') delete body[e.key];
      else if (e.kind === 'nest') setOwn(body, e.key, { [e.key]: e.value, nested: [e.value, { deeper: e.value }] });
      else setOwn(body, e.key, e.value);
    }
    return { value: body };
  });
  return fc.oneof(
    { weight: 4, arbitrary: edited },
    { weight: 2, arbitrary: junk.map((value) => ({ value })) },
    { weight: 1, arbitrary: fc.string({ maxLength: 60 }).map((raw) => ({ raw })) },
    {
      weight: 1,
      arbitrary: fc
        .constantFrom(
          '{',
          '{"a":',
          '[1,2',
          '{"version":1,}',
          '{"__proto__":{"admin":true}}',
          '"just a string"',
          '1',
          'null',
          '[]',
          '{}',
          `{"a":${'['.repeat(5000)}`,
          `{"a":${'['.repeat(5000)}${']'.repeat(5000)}}`,
        )
        .map((raw) => ({ raw })),
    },
  );
}

/** JSON text of a body, with the current-version stand-in replaced (or dropped when there is no version yet). */
function serialise(value: unknown, current: number | undefined): string {
  if (
    value &&
    typeof value === 'object' &&
    !Array.isArray(value) &&
    (value as Record<string, unknown>).version === CURRENT_VERSION
  ) {
    const copy: Record<string, unknown> = { ...(value as Record<string, unknown>) };
    if (current === undefined) delete copy.version;
    else copy.version = current;
    return JSON.stringify(copy);
  }
  return JSON.stringify(value) ?? 'null';
}

/** The ApiError shape: status, name, readable message, request id; never a stack trace or driver detail. */
function apiErrorProblems(res: Response): string[] {
  const b = res.body as Record<string, unknown>;
  const problems: string[] = [];
  if (!String(res.headers['content-type'] ?? '').includes('application/json'))
    problems.push(`content-type ${res.headers['content-type']}`);
  if (b?.statusCode !== res.status) problems.push(`statusCode ${String(b?.statusCode)}`);
  if (typeof b?.error !== 'string') problems.push('no error name');
  if (typeof b?.message !== 'string' || b.message.length === 0) problems.push('no message');
  if (typeof b?.requestId !== 'string') problems.push('no requestId');
  if ('stack' in (b ?? {})) problems.push('a stack property');
  const text = JSON.stringify(b);
  if (/\n\s+at |ER_[A-Z_]+|sqlMessage|sqlState/.test(text)) problems.push('internal detail in the body');
  return problems;
}

describe('fuzzing every JSON request body (fast-check)', () => {
  let app: INestApplication;
  let routes: Route[];
  let samples: Record<string, Record<string, unknown>>;
  let owner: { cookie: string; csrf: string };
  let anonymous: { cookie: string; csrf: string };
  let watchedUsers: string[];
  let initialVersions: Record<string, number>;

  /** A CSRF pair for a session cookie (or none). */
  async function csrfFor(sessionCookie: string): Promise<{ cookie: string; csrf: string }> {
    const res = await request(app.getHttpServer()).get('/api/auth/csrf').set('Cookie', sessionCookie);
    const csrfCookie = ([] as string[])
      .concat(res.headers['set-cookie'] ?? [])
      .find((c) => c.startsWith('sb_csrf='))!
      .split(';')[0]!;
    return { cookie: [sessionCookie, csrfCookie].filter(Boolean).join('; '), csrf: res.body.csrfToken as string };
  }

  /** A checksum of every checked table plus the watched users' session count: any write shows. */
  async function snapshot(): Promise<string> {
    const em = testEm(app);
    const tables = (
      (await em.execute(
        `SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE'`,
      )) as { t: string }[]
    )
      .map((r) => r.t)
      .filter((t) => !UNCHECKED(t));
    const sums = (await em.execute(`CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')}`)) as {
      Table: string;
      Checksum: unknown;
    }[];
    const [sessions] = (await em.execute(
      `SELECT COUNT(*) AS n FROM sessions WHERE user_id IN (${watchedUsers.map(() => '?').join(',')})`,
      watchedUsers,
    )) as { n: unknown }[];
    return JSON.stringify([sums.map((s) => `${s.Table}=${String(s.Checksum)}`), Number(sessions!.n)]);
  }

  beforeAll(async () => {
    app = await createTestApp();
    const crew = await crewWithMembers(app, 'Fuzz Crew');
    // The owner is also the site admin, so admin routes get past authorisation and their validation is fuzzed too.
    await makeAdmin(app, crew.owner.userId);
    const target = await newUser(app, 'fuzz-target');
    await addMember(app, crew.crewId, target.userId, 'angler');
    // Crew deletion is fuzzed on a crew of its own, with a name no generated string will match.
    const doomedName = `Doomed ${randomUUID()}`;
    const doomed = await crew.owner.post('/api/crews', { name: doomedName.slice(0, 80) });
    expectOk(doomed, 201);

    const base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.owner, crew.crewId);
    const event = await createEvent(crew.owner, crew.crewId, lake.id);
    const practice = (await crew.owner.get(`${base}/events/${event.id}/practice-days`)).body as { id: string }[];
    const [day] = await competitionDays(crew.owner, crew.crewId, event.id);
    const find = await crew.owner.post(`${base}/finds`, {
      lakeId: lake.id,
      name: 'Fuzz point',
      lat: 32.95,
      lon: -96.2,
      kind: 'contour',
      subKind: 'point',
    });
    expectOk(find, 201);
    const caught = await crew.owner.post(`${base}/catches`, {
      competitionDayId: day!.id,
      caughtAt: '09:10',
      species: 'spotted',
      weightLb: 2.5,
      fate: 'weighed',
    });
    expectOk(caught, 201);
    const em = testEm(app);
    const invite = em.create(Invite, {
      crew: em.getReference(Crew, crew.crewId),
      email: 'fuzz-invitee@example.test',
      role: 'viewer',
      tokenHash: hashToken(randomToken()),
      invitedBy: em.getReference(User, crew.owner.userId),
      expiresAt: new Date(Date.now() + 86_400_000),
    });
    await em.flush();

    const sessionEm = testEm(app);
    owner = await csrfFor(
      `sb_session=${await app.get(SessionsService).create(sessionEm.getReference(User, crew.owner.userId), sessionEm)}`,
    );
    anonymous = await csrfFor('');
    watchedUsers = [crew.owner.userId, target.userId];

    const ids: Record<string, string> = {
      lakeId: lake.id,
      eventId: event.id,
      findId: find.body.id,
      catchId: caught.body.id,
      userId: target.userId,
      inviteId: invite.id,
      token: randomToken(),
    };
    const doc = (await request(app.getHttpServer()).get('/api/docs-json')).body as {
      paths: Record<string, Record<string, { requestBody?: { content?: Record<string, unknown> } }>>;
    };
    routes = Object.entries(doc.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([, op]) => op.requestBody?.content?.['application/json'])
        .map(([method]) => {
          const key = `${method.toUpperCase()} ${path}`;
          const url = path.replace(/\{(\w+)\}/g, (_m, name: string) => {
            if (name === 'crewId') return key === 'DELETE /api/crews/{crewId}' ? doomed.body.id : crew.crewId;
            if (name === 'dayId') return path.includes('practice-days') ? practice[0]!.id : day!.id;
            return ids[name] ?? randomUUID();
          });
          return { key, method: method as Route['method'], url };
        }),
    );
    initialVersions = {
      'PATCH /api/crews/{crewId}/lakes/{lakeId}': lake.version!,
      'PATCH /api/crews/{crewId}/events/{eventId}': event.version!,
      'PATCH /api/crews/{crewId}/practice-days/{dayId}': 1,
      'PATCH /api/crews/{crewId}/competition-days/{dayId}': 1,
      'PATCH /api/crews/{crewId}/finds/{findId}': find.body.version,
      'PATCH /api/crews/{crewId}/catches/{catchId}': caught.body.version,
    };
    // Valid bodies to start the edits from (others start from {}).
    samples = {
      'POST /api/auth/sign-up': {
        email: 'fuzz.new@example.test',
        password: 'a long enough passphrase',
        displayName: 'Fuzz',
      },
      'POST /api/auth/sign-in': { email: crew.owner.email, password: 'not the password at all' },
      'PATCH /api/auth/me': {
        displayName: 'Fuzz Owner',
        units: { weight: 'kg', length: 'mm', depth: 'm', temperature: 'C' },
      },
      'DELETE /api/auth/me': { password: 'not the password at all' },
      'POST /api/auth/change-password': {
        currentPassword: 'not the password at all',
        newPassword: 'another long passphrase',
      },
      'POST /api/auth/password-reset/request': { email: 'nobody@example.test' },
      'POST /api/auth/password-reset/confirm': { token: randomToken(), password: 'another long passphrase' },
      'POST /api/crews': { name: 'Fuzzed Crew' },
      'PATCH /api/crews/{crewId}': { name: 'Fuzz Crew', viewersSeePositions: false },
      'DELETE /api/crews/{crewId}': { confirmName: 'Not the crew name' },
      'PATCH /api/crews/{crewId}/members/{userId}': { role: 'viewer' },
      'POST /api/crews/{crewId}/invites': { email: 'fuzz-invite@example.test', role: 'viewer' },
      'POST /api/invites/accept': { token: randomToken() },
      'PATCH /api/admin/users/{userId}': { disabled: false },
      'POST /api/crews/{crewId}/lakes': {
        name: 'Fuzz Lake',
        region: 'Fuzz County',
        timeZone: 'America/Chicago',
        lat: 33,
        lon: -96,
        areaAcres: 1200,
        notes: '',
      },
      'PATCH /api/crews/{crewId}/lakes/{lakeId}': { name: 'Fuzz Lake 2', version: CURRENT_VERSION },
      'POST /api/crews/{crewId}/events': {
        lakeId: lake.id,
        name: 'Fuzz Open',
        practiceDates: ['2024-05-01'],
        competitionDates: ['2024-05-02'],
        rules: { fishPerDay: 5, minLengthIn: 12 },
      },
      'PATCH /api/crews/{crewId}/events/{eventId}': {
        name: 'Spring Open 2',
        version: CURRENT_VERSION,
        competitionDates: ['2024-04-12', '2024-04-13'],
      },
      'PATCH /api/crews/{crewId}/practice-days/{dayId}': {
        notes: 'fuzz',
        waterTemp: { value: 18, unit: 'C' },
        version: CURRENT_VERSION,
      },
      'PATCH /api/crews/{crewId}/competition-days/{dayId}': {
        startTime: '06:30',
        checkInTime: '15:00',
        weatherNotes: '',
        version: CURRENT_VERSION,
      },
      'POST /api/crews/{crewId}/finds': {
        lakeId: lake.id,
        eventId: event.id,
        name: 'Fuzz find',
        lat: 32.9,
        lon: -96.1,
        kind: 'vegetation',
        subKind: 'hydrilla',
        depth: { value: 3, unit: 'm' },
        hardness: 3,
      },
      'PATCH /api/crews/{crewId}/finds/{findId}': { name: 'Fuzz point 2', depthFt: 12, version: CURRENT_VERSION },
      'POST /api/crews/{crewId}/catches': {
        competitionDayId: day!.id,
        caughtAt: '10:30',
        species: 'largemouth',
        weight: { value: 3, unit: 'lb-oz', ounces: 4 },
        length: { value: 460, unit: 'mm' },
        fate: 'culled',
        lat: 32.95,
        lon: -96.2,
      },
      'PATCH /api/crews/{crewId}/catches/{catchId}': { weightLb: 2.75, fate: 'weighed', version: CURRENT_VERSION },
      'PUT /api/crews/{crewId}/competition-days/{dayId}/weigh-in': {
        grossLb: 14,
        penaltyLb: 0.25,
        officialLb: 13.75,
        dayPlace: 7,
        lateMinutes: 0,
        version: CURRENT_VERSION,
      },
      'POST /api/crews/{crewId}/reports/events/{eventId}/recap-email': { userIds: [crew.owner.userId] },
    };
  });
  afterAll(async () => {
    await app.close();
  });

  it('finds the journal and foundation write routes in the document', () => {
    const keys = routes.map((r) => r.key);
    for (const k of [
      'POST /api/crews/{crewId}/lakes',
      'PATCH /api/crews/{crewId}/catches/{catchId}',
      'PUT /api/crews/{crewId}/competition-days/{dayId}/weigh-in',
      'POST /api/auth/sign-up',
      'DELETE /api/crews/{crewId}',
      'DELETE /api/auth/me',
    ]) {
      expect(keys).toContain(k);
    }
  });

  it('answers every generated body below 500, refusals in the ApiError shape, and refused requests write nothing', async () => {
    const failures: string[] = [];
    const versions = new Map<string, number>(Object.entries(initialVersions));
    let accepted = 0;
    let refused = 0;
    for (const route of routes) {
      let before = await snapshot();
      const result = await fc.check(
        fc.asyncProperty(bodyFor(samples[route.key] ?? {}), async (body) => {
          const raw = 'raw' in body ? body.raw : serialise(body.value, versions.get(route.key));
          const who = ANONYMOUS.has(route.key) ? anonymous : owner;
          const server = request(app.getHttpServer());
          const res = await server[route.method](route.url)
            .set('Cookie', who.cookie)
            .set(CSRF_HEADER, who.csrf)
            .set('Content-Type', 'application/json')
            .send(raw);
          const after = await snapshot();
          const where = `${route.key} ${res.status} ${JSON.stringify(res.body).slice(0, 200)} for ${raw.slice(0, 200)}`;
          if (res.status >= 500 || res.status < 200) throw new Error(`server error: ${where}`);
          if (res.status >= 400) {
            refused++;
            const problems = apiErrorProblems(res);
            if (problems.length) throw new Error(`not the ApiError shape (${problems.join(', ')}): ${where}`);
            if (after !== before) throw new Error(`a refused request changed rows: ${where}`);
          } else {
            accepted++;
            const version = (res.body as { version?: unknown } | undefined)?.version;
            if (typeof version === 'number') versions.set(route.key, version);
          }
          before = after;
        }),
        { numRuns: RUNS_PER_ROUTE, endOnFailure: true },
      );
      if (result.failed)
        failures.push(
          `${route.key}: ${result.errorInstance instanceof Error ? result.errorInstance.message : String(result.errorInstance)} (seed ${result.seed})`,
        );
    }
    expect(failures).toEqual([]);
    // The generator reaches both sides: most bodies are refused, some edited valid ones get through.
    expect(refused).toBeGreaterThan(routes.length * RUNS_PER_ROUTE * 0.5);
    expect(accepted).toBeGreaterThan(0);
  }, 600_000);
});

/** `{"a":[[...]]}` nested `levels` deep (objects and arrays both count). */
function nested(levels: number): string {
  return `{"a":${'['.repeat(levels - 1)}${']'.repeat(levels - 1)}}`;
}

// The cases the generator above reaches only by chance, pinned: the nesting limit and every numeric field
// at the float edges. OWASP ASVS 4.0.3 V5.1.3 (positive validation with ranges) and V5.1.4 (structured data).
describe('hostile bodies, pinned: nesting depth and float edges', () => {
  let app: INestApplication;
  let crew: Awaited<ReturnType<typeof crewWithMembers>>;
  let base: string;
  let dayId: string;
  let findId: string;
  let lakeId: string;

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Edge Crew');
    base = `/api/crews/${crew.crewId}`;
    const lake = await createLake(crew.owner, crew.crewId);
    lakeId = lake.id;
    const event = await createEvent(crew.owner, crew.crewId, lake.id);
    dayId = (await competitionDays(crew.owner, crew.crewId, event.id))[0]!.id;
    const find = await crew.owner.post(`${base}/finds`, {
      lakeId,
      name: 'Edge',
      lat: 32.9,
      lon: -96.1,
      kind: 'contour',
    });
    expectOk(find, 201);
    findId = find.body.id;
  });
  afterAll(async () => {
    await app.close();
  });

  async function rawPost(path: string, raw: string, signedIn = true): Promise<Response> {
    const client = signedIn ? crew.owner : new ApiClient(app);
    const token = await client.refreshCsrf();
    return client.agent.post(path).set(CSRF_HEADER, token).set('Content-Type', 'application/json').send(raw);
  }

  it('refuses a body nested more than 32 levels with 400, also on the anonymous sign-in', async () => {
    for (const [path, signedIn] of [
      ['/api/auth/sign-in', false],
      [`${base}/lakes`, true],
    ] as const) {
      for (const levels of [33, 5000, 20_000]) {
        const res = await rawPost(path, nested(levels), signedIn);
        expect(res.status, `${path} ${levels}`).toBe(400);
        expect(res.body.message).toMatch(/the request body is nested too deeply/i);
      }
      // Brackets inside strings are text, not nesting; 32 levels still reach validation.
      const inString = await rawPost(path, JSON.stringify({ name: '['.repeat(50_000) }), signedIn);
      expect(inString.body.message).not.toMatch(/nested/);
      const deepest = await rawPost(path, nested(32), signedIn);
      expect(deepest.status).toBe(400);
      expect(deepest.body.message).not.toMatch(/nested/);
    }
  });

  const EDGES = [1e308, -1e308, 5e-324, -5e-324, -0, Number.MAX_VALUE];

  it('answers 400 naming the field for every numeric field at a float edge or out of range, and writes nothing', async () => {
    const catchBody = {
      competitionDayId: '',
      caughtAt: '09:10',
      species: 'largemouth',
      weightLb: 2.5,
      fate: 'weighed',
    };
    const findBody = { lakeId: '', name: 'Edge 2', lat: 32.9, lon: -96.1, kind: 'contour' };
    // [route, base body, field, values that must be refused]; plausible ranges from measurements/ranges.ts.
    const cases: [string, 'post' | 'put' | 'patch', object, string, unknown[]][] = [
      ['catches', 'post', catchBody, 'lengthIn', [...EDGES, 0.99, 40.01]],
      ['catches', 'post', catchBody, 'weightLb', [...EDGES, 0.009, 25.01]],
      ['catches', 'post', catchBody, 'depthFt', [1e308, -1e308, 400.5, -0.5]],
      ['catches', 'post', catchBody, 'waterTempF', [...EDGES, 31.9, 100.1]],
      [
        'catches',
        'post',
        catchBody,
        'length',
        [
          { value: 1e308, unit: 'mm' },
          { value: 5e-324, unit: 'in' },
          { value: 1017, unit: 'mm' },
        ],
      ],
      [
        'catches',
        'post',
        catchBody,
        'weight',
        [
          { value: 1e308, unit: 'kg' },
          { value: 11.4, unit: 'kg' },
        ],
      ],
      [
        'catches',
        'post',
        catchBody,
        'waterTemp',
        [
          { value: 1e308, unit: 'C' },
          { value: 38, unit: 'C' },
        ],
      ],
      ['finds', 'post', findBody, 'depthFt', [1e308, 400.01]],
      [
        'finds',
        'post',
        findBody,
        'depth',
        [
          { value: 1e308, unit: 'm' },
          { value: 122, unit: 'm' },
        ],
      ],
      ['finds', 'post', findBody, 'waterTempF', [...EDGES, 101]],
      ['weigh-in', 'put', {}, 'grossLb', [1e308, 150.01, -1]],
      ['weigh-in', 'put', {}, 'officialLb', [Number.MAX_VALUE, 151]],
      ['weigh-in', 'put', {}, 'penaltyLb', [1e308, -0.01]],
      ['competition-day', 'patch', { version: 1 }, 'waterTempF', [1e308, 5e-324, 20]],
    ];
    const url = (route: string) =>
      route === 'weigh-in'
        ? `${base}/competition-days/${dayId}/weigh-in`
        : route === 'competition-day'
          ? `${base}/competition-days/${dayId}`
          : `${base}/${route}`;
    const failures: string[] = [];
    const before = await journalCount(app, crew.crewId);
    for (const [route, method, body, field, values] of cases) {
      for (const value of values) {
        const filled = { ...body, ...('competitionDayId' in body ? { competitionDayId: dayId } : {}) };
        const full = { ...filled, ...('lakeId' in body ? { lakeId } : {}), [field]: value };
        const res = await crew.owner.send(method, url(route), full);
        const named = Object.keys(res.body.fieldErrors ?? {}).some((k) => k === field || k.startsWith(`${field}.`));
        if (res.status !== 400 || !named)
          failures.push(
            `${route} ${field}=${JSON.stringify(value)}: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`,
          );
      }
    }
    expect(failures).toEqual([]);
    expect(await journalCount(app, crew.crewId)).toBe(before);
  });

  it('stores -0 and subnormal numbers as a plain 0, never the edge itself', async () => {
    for (const depthFt of [-0, 5e-324]) {
      const res = await crew.owner.patch(`${base}/finds/${findId}`, {
        depthFt,
        version: (await crew.owner.get(`${base}/finds/${findId}`)).body.version,
      });
      expectOk(res);
      const row = await testEm(app).findOneOrFail(Find, { id: findId });
      expect(Object.is(row.depthFt, 0), `depthFt ${String(row.depthFt)}`).toBe(true);
    }
  });
});

/**
 * Names and free text refuse Unicode control characters (general category Cc) with a 400 naming the field;
 * multi-line notes keep tab, line feed and carriage return. OWASP ASVS 4.0.3 5.1.4 (structured data
 * validated against allowed characters); CR/LF in names are how CSV and log injection start.
 * The Cc set per the Unicode Character Database: U+0000–U+001F and U+007F–U+009F.
 */
const NAME_BREAKERS: Array<[string, string]> = [
  ['NUL', 'Bass\u0000Hole'],
  ['CR LF', 'Bass\r\nHole'],
  ['tab', 'Bass\tHole'],
  ['ESC', 'Bass\u001b[31mHole'],
  ['DEL', 'Bass\u007fHole'],
  ['NEL (C1)', 'Bass\u0085Hole'],
];
const NOTE_BREAKERS = NAME_BREAKERS.filter(([label]) => !['CR LF', 'tab'].includes(label));

describe('hostile strings, pinned: control characters and huge strings in every name and free-text field', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let lake: LakeView;
  let event: EventView;
  let day: CompetitionDayView;
  let practiceDayId: string;
  let findId: string;
  let base: string;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Control Crew');
    base = `/api/crews/${crew.crewId}`;
    lake = await createLake(crew.angler, crew.crewId);
    event = await createEvent(crew.angler, crew.crewId, lake.id);
    [day] = await competitionDays(crew.angler, crew.crewId, event.id);
    practiceDayId = ((await crew.angler.get(`${base}/events/${event.id}/practice-days`)).body as { id: string }[])[0]!
      .id;
    const find = await crew.angler.post(`${base}/finds`, {
      lakeId: lake.id,
      name: 'Point',
      kind: 'other',
      lat: 32.9,
      lon: -96.2,
    });
    expectOk(find, 201);
    findId = find.body.id as string;
  });
  afterAll(async () => {
    await app.close();
  });

  /** [label, method, path, body without the field, field, multiline] for every name and free-text field. */
  const fields = (): Array<[string, 'post' | 'patch', string, object, string, boolean]> => [
    ['crew name', 'post', '/api/crews', {}, 'name', false],
    ['crew rename', 'patch', base, {}, 'name', false],
    ['own display name', 'patch', '/api/auth/me', {}, 'displayName', false],
    ['lake name', 'post', `${base}/lakes`, { timeZone: 'America/Chicago', lat: 32.9, lon: -96.2 }, 'name', false],
    ['lake region', 'patch', `${base}/lakes/${lake.id}`, {}, 'region', false],
    ['lake notes', 'patch', `${base}/lakes/${lake.id}`, {}, 'notes', true],
    ['event name', 'patch', `${base}/events/${event.id}`, {}, 'name', false],
    ['event organiser', 'patch', `${base}/events/${event.id}`, {}, 'organiser', false],
    ['event notes', 'patch', `${base}/events/${event.id}`, {}, 'notes', true],
    ['practice-day notes', 'patch', `${base}/practice-days/${practiceDayId}`, {}, 'notes', true],
    ['competition-day weather notes', 'patch', `${base}/competition-days/${day.id}`, {}, 'weatherNotes', true],
    ['find name', 'post', `${base}/finds`, { lakeId: lake.id, kind: 'other', lat: 32.9, lon: -96.2 }, 'name', false],
    ['find sub-kind', 'patch', `${base}/finds/${findId}`, {}, 'subKind', false],
    ['find notes', 'patch', `${base}/finds/${findId}`, {}, 'notes', true],
    ...(['lure', 'technique', 'notes'] as const).map((field): [string, 'post', string, object, string, boolean] => [
      `stop ${field}`,
      'post',
      `${base}/stops`,
      { competitionDayId: day.id, findId, arrivedAt: '07:15' },
      field,
      field === 'notes',
    ]),
    ...(['lure', 'technique', 'notes'] as const).map((field): [string, 'post', string, object, string, boolean] => [
      `catch ${field}`,
      'post',
      `${base}/catches`,
      { competitionDayId: day.id, caughtAt: '08:00', species: 'largemouth', fate: 'released' },
      field,
      field === 'notes',
    ]),
  ];

  const journalRows = () => testEm(app).count(JournalEvent, { crewId: crew.crewId });

  it('refuses each control character in every field with 400 naming the field, and writes nothing', async () => {
    const before = await journalRows();
    const problems: string[] = [];
    for (const [label, method, path, body, field, multiline] of fields()) {
      for (const [what, value] of multiline ? NOTE_BREAKERS : NAME_BREAKERS) {
        const res = await crew.owner[method](path, { ...body, [field]: value });
        const messages = (res.body.fieldErrors?.[field] ?? []).join(' ');
        if (res.status !== 400 || !/control character U\+[0-9A-F]{4}/.test(messages))
          problems.push(`${label} with ${what}: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
      }
    }
    expect(problems).toEqual([]);
    expect(await journalRows()).toBe(before);
  });

  it('answers a huge string in every field with a 4xx naming the limit, never a 5xx, and writes nothing', async () => {
    const before = await journalRows();
    const problems: string[] = [];
    // Past each field's MaxLength (400 naming the field) and past the 64 kB body limit (413).
    for (const [label, method, path, body, field] of fields()) {
      for (const [size, want] of [
        [6_000, 400],
        [100_000, 413],
      ] as const) {
        const res = await crew.owner[method](path, { ...body, [field]: 'é'.repeat(size) });
        const named = want === 413 || Object.keys(res.body.fieldErrors ?? {}).includes(field);
        if (res.status !== want || !named)
          problems.push(`${label} with ${size} characters: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
      }
    }
    expect(problems).toEqual([]);
    expect(await journalRows()).toBe(before);
  });

  it('keeps tab and line breaks in multi-line notes', async () => {
    const notes = 'Wind from the south\r\n\tshad on the points\nmoved shallow';
    const current = await crew.angler.get(`${base}/finds/${findId}`);
    const res = await crew.angler.patch(`${base}/finds/${findId}`, { notes, version: current.body.version });
    expectOk(res);
    expect(res.body.notes).toBe(notes);
  });

  it('names the character and its position in the message, on sign-up too', async () => {
    const email = uniqueEmail('cc');
    const res = await new ApiClient(app).post('/api/auth/sign-up', {
      email,
      password: 'a fine long passphrase',
      displayName: 'Jo\nTester',
    });
    expectFieldError(res, 'displayName', /control character U\+000A at position 3/);
    expect(await testEm(app).count(User, { email })).toBe(0);
  });
});
