import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '@shoalbook/shared';
import { ACCOUNT_EXISTS_MAIL_INTERVAL_MS } from '../src/auth/commands/sign-up.handler';
import { Session } from '../src/auth/session.entity';
import { BackgroundWork } from '../src/common/background-work';
import { User } from '../src/users/user.entity';
import { ApiClient, GOOD_PASSWORD, newUser, uniqueEmail } from './utils/api-client';
import { messagesTo, waitForMail } from './utils/outbox';
import { createTestApp, testEm } from './utils/test-app';

function expectApiError(body: unknown, statusCode: number) {
  expect(body).toMatchObject({
    statusCode,
    error: expect.any(String),
    message: expect.any(String),
    requestId: expect.any(String),
  });
  expect(JSON.stringify(body)).not.toMatch(/\bat [\w.<>]+ \(|\.ts:\d+|\.js:\d+|stack|select |insert into/i);
}

describe('accounts and sessions', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  const countUsers = (email: string) => testEm(app).count(User, { email });

  describe('sign-up', () => {
    it('creates the account (202, no session yet); signing in sets an httpOnly SameSite=Lax cookie and GET /me answers', async () => {
      const client = new ApiClient(app);
      const email = uniqueEmail('signup');
      const res = await client.post('/api/auth/sign-up', {
        email: `  ${email.toUpperCase()} `,
        password: GOOD_PASSWORD,
        displayName: '  Jo Tester ',
      });
      expect(res.status).toBe(202);
      expect(res.body).toEqual({ message: expect.stringMatching(/sign in/) });
      expect(res.headers['set-cookie'] ?? []).not.toEqual(
        expect.arrayContaining([expect.stringMatching(/^sb_session=/)]),
      );
      const signIn = await client.post('/api/auth/sign-in', { email, password: GOOD_PASSWORD });
      expect(signIn.status).toBe(200);
      expect(signIn.body.user).toMatchObject({
        email,
        displayName: 'Jo Tester',
        siteRole: 'user',
        units: { weight: 'lb', length: 'in', depth: 'ft', temperature: 'F' },
      });
      expect(signIn.body.crews).toEqual([]);
      const cookie = ([] as string[])
        .concat(signIn.headers['set-cookie'] ?? [])
        .find((c) => c.startsWith('sb_session='))!;
      expect(cookie).toMatch(/HttpOnly/i);
      expect(cookie).toMatch(/SameSite=Lax/i);
      expect(cookie).not.toMatch(/Secure/i);
      const me = await client.get('/api/auth/me');
      expect(me.status).toBe(200);
      expect(me.body.user.email).toBe(email);
      expect(signIn.body.user).not.toHaveProperty('passwordHash');
      const welcome = await waitForMail(email);
      expect(welcome.subject).toMatch(/account is ready/);
    });

    it('stores an argon2id hash with at least the OWASP minimum parameters, and only the session token hash', async () => {
      const client = await newUser(app);
      const user = await testEm(app).findOneOrFail(User, { id: client.userId });
      const params = /^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/.exec(user.passwordHash);
      expect(params).not.toBeNull();
      expect(Number(params![1])).toBeGreaterThanOrEqual(19456);
      expect(Number(params![2])).toBeGreaterThanOrEqual(2);
      expect(Number(params![3])).toBe(1);
      const sessions = await testEm(app).find(Session, { user: client.userId });
      expect(sessions).toHaveLength(1);
      expect(sessions[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    });

    // OWASP ASVS 4.0.3 2.2.x and the OWASP Authentication cheat sheet (account enumeration): a taken address
    // gets the same answer as a free one; its owner hears of the attempt by e-mail.
    it('answers a taken address (any spelling) exactly like a free one, keeps the account, and mails its owner', async () => {
      const first = await newUser(app);
      const taken = await new ApiClient(app).post('/api/auth/sign-up', {
        email: first.email.toUpperCase(),
        password: 'another pass phrase here',
        displayName: 'Copy',
      });
      const free = await new ApiClient(app).post('/api/auth/sign-up', {
        email: uniqueEmail('free'),
        password: 'another pass phrase here',
        displayName: 'Copy',
      });
      expect(taken.status).toBe(202);
      expect({ status: taken.status, body: taken.body }).toEqual({ status: free.status, body: free.body });
      expect(await countUsers(first.email)).toBe(1);
      const user = await testEm(app).findOneOrFail(User, { email: first.email });
      expect(user.displayName).toBe('Test Angler');
      expect((await first.signIn(first.email, GOOD_PASSWORD)).status).toBe(200);
      const notice = await waitForMail(first.email, 2);
      expect(notice.subject).toMatch(/tried to sign up/);
      expect(notice.text).toMatch(/already has one/);
    });

    // OWASP ASVS 4.0.3 2.2.x / the OWASP Authentication cheat sheet ("Account enumeration"): a taken address
    // writes its row (the attempt's time) as a free one writes a new row, and answers alike. Not flooding the
    // owner's inbox: OWASP ASVS 4.0.3 V11.1.4, anti-automation (recalled from memory).
    it('records each attempt on a taken address and mails its owner once an hour, answering 202 each time', async () => {
      const owner = await newUser(app, 'probed');
      const attempt = () =>
        new ApiClient(app).post('/api/auth/sign-up', {
          email: owner.email,
          password: 'another pass phrase here',
          displayName: 'Probe',
        });
      const accountExists = () => messagesTo(owner.email, /tried to sign up/);
      const first = await attempt();
      await app.get(BackgroundWork).settled();
      const afterFirst = await testEm(app).findOneOrFail(User, { email: owner.email });
      expect(afterFirst.signUpAttemptedAt).toBeInstanceOf(Date);
      const second = await attempt();
      // Every mail the two requests started has been handed to the fake SMTP server (which stores before it answers).
      await app.get(BackgroundWork).settled();
      expect([first.status, second.status]).toEqual([202, 202]);
      expect(second.body).toEqual(first.body);
      expect(accountExists()).toHaveLength(1);
      const afterSecond = await testEm(app).findOneOrFail(User, { email: owner.email });
      expect(afterSecond.signUpAttemptedAt!.getTime()).toBeGreaterThan(afterFirst.signUpAttemptedAt!.getTime());

      // The last attempt over an hour ago: the owner is told again.
      await testEm(app).nativeUpdate(
        User,
        { email: owner.email },
        { signUpAttemptedAt: new Date(Date.now() - ACCOUNT_EXISTS_MAIL_INTERVAL_MS - 60_000) },
      );
      expect((await attempt()).status).toBe(202);
      await app.get(BackgroundWork).settled();
      expect(accountExists()).toHaveLength(2);
    });

    const badBodies: Array<[string, unknown, string]> = [
      ['a missing password', { email: 'x@example.test', displayName: 'X' }, 'password'],
      ['an invalid e-mail', { email: 'not-an-address', password: GOOD_PASSWORD, displayName: 'X' }, 'email'],
      ['a number for the e-mail', { email: 12345, password: GOOD_PASSWORD, displayName: 'X' }, 'email'],
      ['a short password', { email: 'x@example.test', password: 'short', displayName: 'X' }, 'password'],
      [
        'a 129-character password',
        { email: 'x@example.test', password: 'p'.repeat(64) + 'q'.repeat(65), displayName: 'X' },
        'password',
      ],
      ['a common password', { email: 'x@example.test', password: 'qwertyuiop', displayName: 'X' }, 'password'],
      [
        'an 81-character name',
        { email: 'x@example.test', password: GOOD_PASSWORD, displayName: 'n'.repeat(81) },
        'displayName',
      ],
      ['a blank name', { email: 'x@example.test', password: GOOD_PASSWORD, displayName: '   ' }, 'displayName'],
      [
        'a 255-character e-mail',
        {
          email: `${'a'.repeat(64)}@${'b'.repeat(63)}.${'c'.repeat(63)}.${'d'.repeat(58)}.test`,
          password: GOOD_PASSWORD,
          displayName: 'X',
        },
        'email',
      ],
      [
        'an unknown field',
        { email: 'x@example.test', password: GOOD_PASSWORD, displayName: 'X', siteRole: 'admin' },
        'siteRole',
      ],
    ];
    it.each(badBodies)('refuses %s with 400, a field error, and no account', async (_label, body, field) => {
      const res = await new ApiClient(app).post('/api/auth/sign-up', body);
      expect(res.status).toBe(400);
      expectApiError(res.body, 400);
      expect(res.body.fieldErrors[field]).toEqual(expect.arrayContaining([expect.any(String)]));
      expect(await testEm(app).count(User, { email: 'x@example.test' })).toBe(0);
    });

    it('refuses malformed JSON, a JSON array and an oversized body with clear 4xx answers', async () => {
      const client = new ApiClient(app);
      const token = await client.refreshCsrf();
      const malformed = await client.agent
        .post('/api/auth/sign-up')
        .set(CSRF_HEADER, token)
        .set('Content-Type', 'application/json')
        .send('{"email": "x@example.test",');
      expect(malformed.status).toBe(400);
      expect(malformed.body).toMatchObject({ code: 'invalid_json', message: 'The request body is not valid JSON.' });
      const array = await client.post('/api/auth/sign-up', [{ email: 'x@example.test' }]);
      expect(array.status).toBe(400);
      expect(array.body.message).toMatch(/JSON object/);
      const huge = await client.post('/api/auth/sign-up', {
        email: 'x@example.test',
        password: GOOD_PASSWORD,
        displayName: 'x'.repeat(70_000),
      });
      expect(huge.status).toBe(413);
      expectApiError(huge.body, 413);
      expect(await testEm(app).count(User, { email: 'x@example.test' })).toBe(0);
    });
  });

  describe('CSRF', () => {
    it('refuses a state-changing request without the token (403 csrf_invalid) and changes nothing', async () => {
      const email = uniqueEmail('csrf');
      const res = await request(app.getHttpServer())
        .post('/api/auth/sign-up')
        .send({ email, password: GOOD_PASSWORD, displayName: 'No Token' });
      expect(res.status).toBe(403);
      expectApiError(res.body, 403);
      expect(res.body.code).toBe('csrf_invalid');
      expect(await countUsers(email)).toBe(0);
    });

    it('refuses a token from another browser, and a token issued before sign-in once signed in', async () => {
      const other = new ApiClient(app);
      const foreignToken = await other.refreshCsrf();
      const client = new ApiClient(app);
      await client.refreshCsrf();
      const forged = await client.agent
        .post('/api/auth/sign-in')
        .set(CSRF_HEADER, foreignToken)
        .send({ email: 'a@example.test', password: 'whatever-1234' });
      expect(forged.status).toBe(403);

      const user = await newUser(app);
      const anon = new ApiClient(app);
      const before = await anon.refreshCsrf();
      await anon.signIn(user.email, user.password);
      const stale = await anon.agent.patch('/api/auth/me').set(CSRF_HEADER, before).send({ displayName: 'Stale' });
      expect(stale.status).toBe(403);
      expect(stale.body.code).toBe('csrf_invalid');
      const fresh = await anon.patch('/api/auth/me', { displayName: 'Fresh' });
      expect(fresh.status).toBe(200);
    });
  });

  describe('sign-in and sign-out', () => {
    it('answers a wrong password and an unknown e-mail with the same 401', async () => {
      const user = await newUser(app);
      const wrong = await new ApiClient(app).post('/api/auth/sign-in', {
        email: user.email,
        password: 'not the right password',
      });
      const unknown = await new ApiClient(app).post('/api/auth/sign-in', {
        email: uniqueEmail('nobody'),
        password: 'not the right password',
      });
      for (const res of [wrong, unknown]) {
        expect(res.status).toBe(401);
        expectApiError(res.body, 401);
        expect(res.body.message).toBe('E-mail or password is wrong.');
        expect(res.body.code).toBe('wrong_credentials');
        expect(res.headers['set-cookie']?.toString() ?? '').not.toMatch(/sb_session=[^;]/);
      }
    });

    it('starts a new session on every sign-in and ends the browser’s previous one', async () => {
      const user = await newUser(app);
      const oldCookie = user.sessionCookie;
      expect((await request(app.getHttpServer()).get('/api/auth/me').set('Cookie', oldCookie)).status).toBe(200);
      const res = await user.signIn();
      expect(res.status).toBe(200);
      expect(await testEm(app).count(Session, { user: user.userId })).toBe(1);
      const replay = await request(app.getHttpServer()).get('/api/auth/me').set('Cookie', oldCookie);
      expect(replay.status).toBe(401);
      expect((await user.get('/api/auth/me')).status).toBe(200);
    });

    it('ends the session on sign-out', async () => {
      const user = await newUser(app);
      const res = await user.post('/api/auth/sign-out');
      expect(res.status).toBe(204);
      expect((await user.get('/api/auth/me')).status).toBe(401);
      expect(await testEm(app).count(Session, { user: user.userId })).toBe(0);
    });

    it('ends sessions that were idle too long or reached their absolute end', async () => {
      const user = await newUser(app);
      await testEm(app).nativeUpdate(
        Session,
        { user: user.userId },
        { lastSeenAt: new Date(Date.now() - 8 * 86_400_000) },
      );
      expect((await user.get('/api/auth/me')).status).toBe(401);
      await user.signIn();
      await testEm(app).nativeUpdate(Session, { user: user.userId }, { expiresAt: new Date(Date.now() - 1000) });
      expect((await user.get('/api/auth/me')).status).toBe(401);
    });

    it('answers GET /me with 401 and the error shape when signed out', async () => {
      const res = await request(app.getHttpServer()).get('/api/auth/me');
      expect(res.status).toBe(401);
      expectApiError(res.body, 401);
    });
  });

  describe('profile and password', () => {
    it('stores a display name and unit preferences, and refuses an unknown unit without changing anything', async () => {
      const user = await newUser(app);
      const ok = await user.patch('/api/auth/me', { displayName: 'Renamed', units: { weight: 'kg', depth: 'm' } });
      expect(ok.status).toBe(200);
      expect(ok.body.user).toMatchObject({
        displayName: 'Renamed',
        units: { weight: 'kg', length: 'in', depth: 'm', temperature: 'F' },
      });
      const bad = await user.patch('/api/auth/me', { displayName: 'Again', units: { weight: 'stone' } });
      expect(bad.status).toBe(400);
      expect(bad.body.fieldErrors['units.weight']).toBeDefined();
      const nested = await user.patch('/api/auth/me', { units: { weight: 'lb', colour: 'red' } });
      expect(nested.status).toBe(400);
      expect(nested.body.fieldErrors['units.colour']).toEqual(['This field is not accepted.']);
      const me = await user.get('/api/auth/me');
      expect(me.body.user).toMatchObject({ displayName: 'Renamed', units: { weight: 'kg', depth: 'm' } });
    });

    it('changes the password, keeps this session and ends the others', async () => {
      const user = await newUser(app);
      const elsewhere = new ApiClient(app);
      await elsewhere.signIn(user.email, user.password);
      const wrong = await user.post('/api/auth/change-password', {
        currentPassword: 'not my password',
        newPassword: 'a brand new passphrase',
      });
      expect(wrong.status).toBe(400);
      expect(wrong.body.fieldErrors.currentPassword).toBeDefined();
      expect((await elsewhere.get('/api/auth/me')).status).toBe(200);

      const res = await user.post('/api/auth/change-password', {
        currentPassword: user.password,
        newPassword: 'a brand new passphrase',
      });
      expect(res.status).toBe(204);
      expect((await user.get('/api/auth/me')).status).toBe(200);
      expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
      expect((await new ApiClient(app).signIn(user.email, user.password)).status).toBe(401);
      expect((await new ApiClient(app).signIn(user.email, 'a brand new passphrase')).status).toBe(200);
    });
  });

  it('answers unknown API routes with the JSON error shape', async () => {
    const res = await request(app.getHttpServer()).get('/api/no-such-route');
    expect(res.status).toBe(404);
    expectApiError(res.body, 404);
  });
});
