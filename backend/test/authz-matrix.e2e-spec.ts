import { randomUUID } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '@shoalbook/shared';
import { SessionsService } from '../src/auth/sessions.service';
import { hashToken, randomToken } from '../src/common/tokens';
import { Crew } from '../src/crews/crew.entity';
import { Invite } from '../src/crews/invite.entity';
import { User } from '../src/users/user.entity';
import { addMember, crewWithMembers, type CrewFixture, makeAdmin, newUser } from './utils/api-client';
import {
  ACTORS,
  type Actor,
  expectationFor,
  OVERRIDES,
  OWNER_ONLY,
  type Outcome,
  type Profile,
  PROFILE_ROWS,
} from './utils/authz-expectations';
import { createTestApp, testEm } from './utils/test-app';

interface Operation {
  key: string;
  method: string;
  path: string;
}

/** Bodies that let an allowed caller's request succeed (others get {} and may answer 400: still "passed"). */
const SAMPLE_BODIES: Record<string, () => object> = {
  'POST /api/auth/sign-up': () => ({
    email: `matrix-${randomUUID().slice(0, 8)}@example.test`,
    password: 'matrix passphrase one',
    displayName: 'Matrix',
  }),
  'PATCH /api/auth/me': () => ({ displayName: 'Matrix Renamed' }),
  'POST /api/crews': () => ({ name: 'Matrix Crew' }),
  'PATCH /api/crews/{crewId}': () => ({ name: 'Crew A' }),
  'PATCH /api/crews/{crewId}/members/{userId}': () => ({ role: 'viewer' }),
  'POST /api/crews/{crewId}/invites': () => ({
    email: `matrix-invite-${randomUUID().slice(0, 8)}@example.test`,
    role: 'viewer',
  }),
  'PATCH /api/admin/users/{userId}': () => ({ disabled: false }),
};

/**
 * Every route the server answers, from Nest's router (Express's route table), as "METHOD /api/path" with
 * {param} like the OpenAPI document. Swagger UI's own files under /api/docs/ count as GET /api/docs.
 */
function routerRoutes(app: INestApplication): string[] {
  const stack = (app.getHttpAdapter().getInstance() as { router: { stack: RouteLayer[] } }).router.stack;
  const keys = stack.flatMap((layer) => {
    // Nest mounts its middleware (MikroORM's request context) as route layers for every method at /api and
    // /api/{*all}: middleware, not endpoints. An endpoint names its methods.
    if (!layer.route || Object.keys(layer.route.methods).length > 5) return [];
    const path = String(layer.route.path)
      .replace(/:(\w+)/g, '{$1}')
      .replace(/^\/api\/docs\/.*$/, '/api/docs');
    return Object.keys(layer.route.methods)
      .filter((m) => ['get', 'post', 'put', 'patch', 'delete'].includes(m))
      .map((m) => `${m.toUpperCase()} ${path}`);
  });
  return [...new Set(keys)];
}
interface RouteLayer {
  route?: { path: unknown; methods: Record<string, boolean> };
}

function classify(res: Response): Outcome | 'absent' {
  const body = res.body as { code?: string; message?: string };
  if (res.status >= 500) throw new Error(`server error ${res.status}: ${JSON.stringify(body)}`);
  if (res.status === 401 && body.code === 'unauthenticated') return 'anon';
  if (res.status === 403 && body.code === 'csrf_invalid') throw new Error('the matrix sent a bad CSRF token');
  if (res.status === 403 && body.code === 'forbidden') return 'forbidden';
  if (res.status === 404 && body.message === 'No such crew.') return 'hidden';
  // Nest's answer for a path no route matches ("Cannot GET /api/…"): the route is not mounted.
  if (res.status === 404 && /^Cannot [A-Z]+ \//.test(body.message ?? '')) return 'absent';
  return 'passed';
}

describe('authorisation matrix from the OpenAPI document', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  let actors: Record<Exclude<Actor, 'anonymous'>, string>;
  let operations: Operation[];

  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Crew A');
    const other = await crewWithMembers(app, 'Crew B');
    const admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
    actors = {
      nonMember: other.owner.userId,
      viewer: crew.viewer.userId,
      angler: crew.angler.userId,
      owner: crew.owner.userId,
      admin: admin.userId,
    };
    const doc = await request(app.getHttpServer()).get('/api/docs-json');
    expect(doc.status).toBe(200);
    operations = Object.entries(doc.body.paths as Record<string, Record<string, unknown>>).flatMap(([path, item]) =>
      Object.keys(item)
        .filter((m) => ['get', 'post', 'put', 'patch', 'delete'].includes(m))
        .map((m) => ({ key: `${m.toUpperCase()} ${path}`, method: m, path })),
    );
  });
  afterAll(async () => {
    await app.close();
  });

  /** A fresh session (so sign-out and the like never spoil the next call) plus its CSRF token. */
  async function credentials(actor: Actor): Promise<{ cookie: string; csrf: string }> {
    let cookie = '';
    if (actor !== 'anonymous') {
      const em = testEm(app);
      cookie = `sb_session=${await app.get(SessionsService).create(em.getReference(User, actors[actor]), em)}`;
    }
    const res = await request(app.getHttpServer()).get('/api/auth/csrf').set('Cookie', cookie);
    const csrfCookie = ([] as string[])
      .concat(res.headers['set-cookie'] ?? [])
      .find((c) => c.startsWith('sb_csrf='))!
      .split(';')[0]!;
    return { cookie: [cookie, csrfCookie].filter(Boolean).join('; '), csrf: res.body.csrfToken as string };
  }

  /** Real ids for the path's parameters; targets are made fresh, so destructive calls hit nothing shared. */
  async function fillPath(path: string): Promise<string> {
    const em = testEm(app);
    const values: Record<string, () => Promise<string>> = {
      crewId: async () => crew.crewId,
      userId: async () => {
        const target = await newUser(app, 'target');
        if (path.startsWith('/api/crews/')) await addMember(app, crew.crewId, target.userId, 'angler');
        return target.userId;
      },
      inviteId: async () => {
        const invite = em.create(Invite, {
          crew: em.getReference(Crew, crew.crewId),
          email: `${randomUUID()}@example.test`,
          role: 'viewer',
          tokenHash: hashToken(randomToken()),
          invitedBy: em.getReference(User, crew.owner.userId),
          expiresAt: new Date(Date.now() + 86_400_000),
        });
        await em.flush();
        return invite.id;
      },
      token: async () => {
        const token = randomToken();
        em.create(Invite, {
          crew: em.getReference(Crew, crew.crewId),
          email: `${randomUUID()}@example.test`,
          role: 'viewer',
          tokenHash: hashToken(token),
          invitedBy: em.getReference(User, crew.owner.userId),
          expiresAt: new Date(Date.now() + 86_400_000),
        });
        await em.flush();
        return token;
      },
    };
    let filled = path;
    for (const [, name] of path.matchAll(/\{(\w+)\}/g)) {
      // Unknown parameters (routes added later) get a random id: the guard decides before any lookup.
      filled = filled.replace(`{${name}}`, values[name!] ? await values[name!]!() : randomUUID());
    }
    return filled;
  }

  it('finds the foundation routes in the document, and every table row matches a route', () => {
    expect(operations.length).toBeGreaterThanOrEqual(24);
    const keys = new Set(operations.map((o) => o.key));
    for (const row of [...Object.keys(OVERRIDES), ...OWNER_ONLY]) expect(keys, `stale row ${row}`).toContain(row);
  });

  it("has a row for every route in Nest's router too (a route missing from the document still needs one)", () => {
    const documented = new Set(operations.map((o) => o.key));
    const routes = routerRoutes(app);
    expect(routes).toEqual(expect.arrayContaining(['GET /api/health', 'GET /api/docs', 'GET /api/docs-json']));
    const missing = routes.filter((key) => !documented.has(key) && !PROFILE_ROWS[key]);
    expect(missing, 'routes without a matrix row (add them to test/utils/authz-expectations.ts)').toEqual([]);
  });

  // Every route × six actors, each with a fresh session: minutes on a loaded shared machine, not a speed target.
  it('gives every route × actor the expected answer', { timeout: 300_000 }, async () => {
    const failures: string[] = [];
    const profileOps = Object.keys(PROFILE_ROWS)
      .filter((key) => PROFILE_ROWS[key]!.test !== 'absent')
      .map((key) => ({ key, method: 'get', path: key.split(' ')[1]! }));
    for (const op of [...operations, ...profileOps]) {
      const expected = expectationFor(op.key);
      if (!expected) {
        failures.push(`${op.key}: no expectation row (add it to test/utils/authz-expectations.ts)`);
        continue;
      }
      for (const actor of ACTORS) {
        const { cookie, csrf } = await credentials(actor);
        const url = await fillPath(op.path);
        const req = (request(app.getHttpServer()) as unknown as Record<string, (u: string) => request.Test>)[
          op.method
        ]!(url)
          .set('Cookie', cookie)
          .set(CSRF_HEADER, csrf);
        const res =
          op.method === 'get' || op.method === 'delete' ? await req : await req.send(SAMPLE_BODIES[op.key]?.() ?? {});
        const got = classify(res);
        // OWASP ASVS 4.0.3 V8.2.1: answers to a signed-in caller carry anti-caching headers (RFC 9111 no-store).
        if (
          actor !== 'anonymous' &&
          (res.headers['cache-control'] !== 'no-store' || !/\bCookie\b/.test(res.headers.vary ?? ''))
        )
          failures.push(
            `${op.key} as ${actor}: Cache-Control ${res.headers['cache-control']}, Vary ${res.headers.vary} (want no-store, Cookie)`,
          );
        if (got !== expected[actor])
          failures.push(
            `${op.key} as ${actor}: expected ${expected[actor]}, got ${got} (${res.status} ${JSON.stringify(res.body).slice(0, 120)})`,
          );
      }
    }
    expect(failures).toEqual([]);
  });

  // The rows whose audience depends on the profile, in each profile: the development mail page only for a
  // site admin in development, the docs for anyone in development and test but only a site admin in
  // production (OWASP ASVS 4.0.3 4.1.1 and 14.3.2).
  it.each(['development', 'test', 'production'] as Profile[])(
    'answers the dev mail page and the docs as their rows say in the %s profile',
    async (profile) => {
      const other = profile === 'test' ? app : await createTestApp({ NODE_ENV: profile });
      const failures: string[] = [];
      try {
        for (const [key, rows] of Object.entries(PROFILE_ROWS)) {
          const expected = rows[profile];
          for (const actor of ACTORS) {
            const { cookie } = await credentials(actor);
            const res = await request(other.getHttpServer()).get(key.split(' ')[1]!).set('Cookie', cookie);
            const got = classify(res);
            const want = expected === 'absent' ? 'absent' : expected[actor];
            if (got !== want) failures.push(`${key} as ${actor}: expected ${want}, got ${got} (${res.status})`);
          }
        }
        const mounted = routerRoutes(other);
        for (const [key, rows] of Object.entries(PROFILE_ROWS))
          if ((rows[profile] !== 'absent') !== mounted.includes(key))
            failures.push(`${key}: mounted=${mounted.includes(key)} in ${profile}`);
      } finally {
        if (other !== app) await other.close();
      }
      expect(failures).toEqual([]);
    },
  );
});
