import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, newUser, uniqueEmail } from './utils/api-client';
import { createTestApp } from './utils/test-app';

describe('rate limits on sign-in, sign-up, reset and invites', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp({
      THROTTLE_AUTH_LIMIT: '6',
      THROTTLE_ACCOUNT_LIMIT: '4', // newUser's sign-in after sign-up is the first of the four
      THROTTLE_AUTH_TTL_SECONDS: '60',
    });
  });
  afterAll(async () => {
    await app.close();
  });

  it('answers 429 after too many sign-ins for one account, even with the right password', async () => {
    const user = await newUser(app);
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++)
      statuses.push(
        (await new ApiClient(app).post('/api/auth/sign-in', { email: user.email, password: 'wrong password!' })).status,
      );
    const blocked = await new ApiClient(app).post('/api/auth/sign-in', { email: user.email, password: user.password });
    expect(statuses).toEqual([401, 401, 401]);
    expect(blocked.status).toBe(429);
    expect(blocked.body).toMatchObject({ statusCode: 429, code: 'rate_limited' });
    expect(blocked.body.message).toMatch(/Too many attempts/);
  });

  it('answers 429 after too many requests from one address across accounts', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++)
      statuses.push(
        (await new ApiClient(app).post('/api/auth/password-reset/request', { email: uniqueEmail('flood') })).status,
      );
    expect(statuses.slice(0, 6)).toEqual([202, 202, 202, 202, 202, 202]);
    expect(statuses[6]).toBe(429);
  });
});

describe('the per-account sign-in limit keys on the canonical e-mail', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp({
      THROTTLE_AUTH_LIMIT: '50',
      THROTTLE_ACCOUNT_LIMIT: '4', // newUser's sign-in after sign-up is the first of the four
      THROTTLE_AUTH_TTL_SECONDS: '60',
    });
  });
  afterAll(async () => {
    await app.close();
  });

  const signIn = (email: string, password: string) => new ApiClient(app).post('/api/auth/sign-in', { email, password });
  const fullWidth = (s: string) => s.replace(/[a-z0-9]/g, (c) => String.fromCodePoint(c.codePointAt(0)! + 0xfee0));

  // OWASP ASVS 4.0.3 2.2.1 (anti-automation against credential guessing); handbook security.md: the account
  // key is the canonical e-mail, so no spelling of an address gets a counter of its own.
  it('counts upper-case, padded and full-width spellings of one address on one counter, then 429 with Retry-After', async () => {
    const user = await newUser(app, 'probe');
    const [local, domain] = user.email.split('@') as [string, string];
    const spellings = [user.email.toUpperCase(), `  ${user.email}\t`, `${fullWidth(local)}@${domain}`];
    const statuses: number[] = [];
    for (const email of spellings) statuses.push((await signIn(email, 'wrong password!')).status);
    expect(statuses).toEqual([401, 401, 401]);
    const blocked = await signIn(`\u3000${local.toUpperCase()}@${domain}`, user.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body).toMatchObject({ code: 'rate_limited' });
    // RFC 9110 section 10.2.3: Retry-After is a delay in whole seconds; the window here is 60 s.
    const retryAfter = Number(blocked.headers['retry-after']);
    expect(Number.isInteger(retryAfter)).toBe(true);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(60);
  });

  it('does not let an accented spelling (pröbe@ for probe@) into the account, though the collation folds accents', async () => {
    const user = await newUser(app, 'probe');
    const accented = user.email.replace(/^probe/, 'pröbe');
    expect(accented).not.toBe(user.email);
    const res = await signIn(accented, user.password);
    expect(res.status).toBe(401);
    expect((await signIn(user.email, user.password)).status).toBe(200);
  });

  it('stores the canonical form: signing up with a full-width, upper-case spelling signs in with the plain one', async () => {
    const plain = uniqueEmail('canon');
    const [local, domain] = plain.split('@') as [string, string];
    const client = await new ApiClient(app).signUp(`${fullWidth(local).toUpperCase()}@${domain.toUpperCase()}`);
    expect(client.me!.user.email).toBe(plain);
    expect((await signIn(plain, client.password)).status).toBe(200);
  });
});
