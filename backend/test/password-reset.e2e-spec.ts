import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuthToken } from '../src/auth/auth-token.entity';
import { ApiClient, newUser, uniqueEmail } from './utils/api-client';
import { messagesTo, tokenFromMail, waitForMail } from './utils/outbox';

const RESET_SUBJECT = /new Shoalbook password/;
import { createTestApp, testEm } from './utils/test-app';

const NEW_PASSWORD = 'slow-rolled spinnerbait';

describe('password reset by e-mail', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('answers known and unknown addresses alike, and mails only the known one', async () => {
    const user = await newUser(app);
    const unknown = uniqueEmail('ghost');
    const known = await new ApiClient(app).post('/api/auth/password-reset/request', { email: user.email });
    const ghost = await new ApiClient(app).post('/api/auth/password-reset/request', { email: unknown });
    expect(known.status).toBe(202);
    expect(ghost.status).toBe(202);
    expect(ghost.body).toEqual(known.body);
    await waitForMail(user.email, 1, RESET_SUBJECT);
    expect(messagesTo(unknown)).toHaveLength(0);
  });

  it('follows the e-mailed link once: sets the password, ends every session, refuses reuse', async () => {
    const user = await newUser(app);
    const other = new ApiClient(app);
    await other.signIn(user.email, user.password);
    await new ApiClient(app).post('/api/auth/password-reset/request', { email: user.email });
    const mail = await waitForMail(user.email, 1, RESET_SUBJECT);
    expect(mail.subject).toMatch(/new Shoalbook password/);
    expect(mail.html).toContain('/reset-password?token=');
    const token = tokenFromMail(mail, '/reset-password');
    expect(Buffer.from(token, 'base64url').length).toBeGreaterThanOrEqual(16);
    const stored = await testEm(app).findOneOrFail(AuthToken, { user: user.userId });
    expect(stored.tokenHash).not.toContain(token);
    expect(stored.expiresAt.getTime() - stored.createdAt.getTime()).toBe(30 * 60_000);

    const anonymous = new ApiClient(app);
    const weak = await anonymous.post('/api/auth/password-reset/confirm', { token, password: 'password123' });
    expect(weak.status).toBe(400);
    expect(weak.body.fieldErrors.password).toBeDefined();

    const res = await anonymous.post('/api/auth/password-reset/confirm', { token, password: NEW_PASSWORD });
    expect(res.status).toBe(204);
    expect((await user.get('/api/auth/me')).status).toBe(401);
    expect((await other.get('/api/auth/me')).status).toBe(401);
    expect((await new ApiClient(app).signIn(user.email, user.password)).status).toBe(401);
    expect((await new ApiClient(app).signIn(user.email, NEW_PASSWORD)).status).toBe(200);

    const reuse = await new ApiClient(app).post('/api/auth/password-reset/confirm', {
      token,
      password: 'another fine passphrase',
    });
    expect(reuse.status).toBe(400);
    expect(reuse.body.code).toBe('token_invalid');
    expect((await new ApiClient(app).signIn(user.email, NEW_PASSWORD)).status).toBe(200);
  });

  it('refuses an expired token and a made-up one, changing nothing', async () => {
    const user = await newUser(app);
    await new ApiClient(app).post('/api/auth/password-reset/request', { email: user.email });
    const token = tokenFromMail(await waitForMail(user.email, 1, RESET_SUBJECT), '/reset-password');
    await testEm(app).nativeUpdate(AuthToken, { user: user.userId }, { expiresAt: new Date(Date.now() - 1000) });
    for (const t of [token, 'made-up-token']) {
      const res = await new ApiClient(app).post('/api/auth/password-reset/confirm', {
        token: t,
        password: NEW_PASSWORD,
      });
      expect(res.status).toBe(400);
      expect(res.body.code).toBe('token_invalid');
    }
    expect((await new ApiClient(app).signIn(user.email, user.password)).status).toBe(200);
  });

  it('does not accept a session token as a reset token (tokens are bound to their purpose)', async () => {
    const user = await newUser(app);
    const sessionToken = user.sessionCookie.replace('sb_session=', '');
    const res = await new ApiClient(app).post('/api/auth/password-reset/confirm', {
      token: sessionToken,
      password: NEW_PASSWORD,
    });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('token_invalid');
    expect((await request(app.getHttpServer()).get('/api/auth/me').set('Cookie', user.sessionCookie)).status).toBe(200);
  });
});
