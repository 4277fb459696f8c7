import { randomUUID } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import request, { type Response } from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { CSRF_HEADER, type CrewRole, type MeResponse } from '@shoalbook/shared';
import { Membership } from '../../src/crews/membership.entity';
import { Crew } from '../../src/crews/crew.entity';
import { User } from '../../src/users/user.entity';
import { testEm } from './test-app';

/** A password that passes the policy. */
export const GOOD_PASSWORD = 'drop-shot at the weed edge';

/** A unique address on the reserved .test domain. */
export function uniqueEmail(prefix = 'angler'): string {
  return `${prefix}-${randomUUID().slice(0, 8)}@example.test`;
}

/**
 * A browser stand-in: keeps cookies like a browser does and sends the CSRF header on every
 * state-changing request, refetching the token after the session changes.
 */
export class ApiClient {
  readonly agent: TestAgent;
  private csrfToken: string | undefined;
  me: MeResponse | undefined;
  email = '';
  password = '';
  /** `sb_session=…` as last set by the server, to replay it from another client in tests. */
  sessionCookie = '';

  constructor(readonly app: INestApplication) {
    this.agent = request.agent(app.getHttpServer());
  }

  get userId(): string {
    if (!this.me) throw new Error('not signed in');
    return this.me.user.id;
  }

  async refreshCsrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/csrf');
    if (res.status !== 200) throw new Error(`csrf fetch failed: ${res.status}`);
    this.csrfToken = (res.body as { csrfToken: string }).csrfToken;
    return this.csrfToken;
  }

  get(path: string): Promise<Response> {
    return this.agent.get(path).then((r) => r);
  }

  async send(
    method: 'post' | 'patch' | 'put' | 'delete',
    path: string,
    body?: unknown,
    headers: Record<string, string> = {},
  ): Promise<Response> {
    const token = this.csrfToken ?? (await this.refreshCsrf());
    const req = this.agent[method](path).set(CSRF_HEADER, token).set(headers);
    return body === undefined ? req : req.send(body as object);
  }

  post(path: string, body?: unknown): Promise<Response> {
    return this.send('post', path, body);
  }

  patch(path: string, body?: unknown): Promise<Response> {
    return this.send('patch', path, body);
  }

  delete(path: string, body?: unknown): Promise<Response> {
    return this.send('delete', path, body);
  }

  private captureSession(res: Response): void {
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('sb_session='));
    if (!cookie) throw new Error('the server set no session cookie');
    this.sessionCookie = cookie.split(';')[0]!;
  }

  /** Sign up through the API, then sign in as a browser would (fails the test on anything but 202 then 200). */
  async signUp(email = uniqueEmail(), password = GOOD_PASSWORD, displayName = 'Test Angler'): Promise<this> {
    const res = await this.post('/api/auth/sign-up', { email, password, displayName });
    if (res.status !== 202) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
    const signedIn = await this.signIn(email, password);
    if (signedIn.status !== 200)
      throw new Error(`sign-in after sign-up failed: ${signedIn.status} ${JSON.stringify(signedIn.body)}`);
    return this;
  }

  async signIn(email = this.email, password = this.password): Promise<Response> {
    const res = await this.post('/api/auth/sign-in', { email, password });
    if (res.status === 200) {
      this.me = res.body as MeResponse;
      this.email = email;
      this.password = password;
      this.captureSession(res);
      await this.refreshCsrf();
    }
    return res;
  }
}

/** A new signed-up user's client. */
export async function newUser(app: INestApplication, prefix = 'angler'): Promise<ApiClient> {
  return new ApiClient(app).signUp(uniqueEmail(prefix));
}

/** Set-up shortcut (not under test here): give a user a role in a crew directly in the database. */
export async function addMember(app: INestApplication, crewId: string, userId: string, role: CrewRole): Promise<void> {
  const em = testEm(app);
  em.create(Membership, { crew: em.getReference(Crew, crewId), user: em.getReference(User, userId), role });
  await em.flush();
}

/** Set-up shortcut: make an account a site admin directly in the database. */
export async function makeAdmin(app: INestApplication, userId: string): Promise<void> {
  await testEm(app).nativeUpdate(User, { id: userId }, { siteRole: 'admin' });
}

export interface CrewFixture {
  crewId: string;
  owner: ApiClient;
  angler: ApiClient;
  viewer: ApiClient;
}

/** A crew with one owner (created through the API), an angler and a viewer. */
export async function crewWithMembers(app: INestApplication, name = 'Test Crew'): Promise<CrewFixture> {
  const owner = await newUser(app, 'owner');
  const res = await owner.post('/api/crews', { name });
  if (res.status !== 201) throw new Error(`crew creation failed: ${res.status} ${JSON.stringify(res.body)}`);
  const crewId = (res.body as { id: string }).id;
  const [angler, viewer] = await Promise.all([newUser(app, 'angler'), newUser(app, 'viewer')]);
  await addMember(app, crewId, angler.userId, 'angler');
  await addMember(app, crewId, viewer.userId, 'viewer');
  return { crewId, owner, angler, viewer };
}
