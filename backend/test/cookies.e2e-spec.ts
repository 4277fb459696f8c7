import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '@shoalbook/shared';
import { GOOD_PASSWORD, newUser } from './utils/api-client';
import { createTestApp } from './utils/test-app';

function setCookies(res: request.Response): string[] {
  return ([] as string[]).concat(res.headers['set-cookie'] ?? []);
}

/** RFC 6265bis section 4.1.3.2: a __Host- cookie is Secure, has Path=/ and no Domain attribute. */
function expectHostPrefixed(cookie: string | undefined, name: string): string {
  expect(cookie, `no ${name} cookie`).toBeDefined();
  expect(cookie!.startsWith(`__Host-${name}=`)).toBe(true);
  expect(cookie).toMatch(/;\s*Secure/i);
  expect(cookie).toMatch(/;\s*Path=\/(;|$)/i);
  expect(cookie).not.toMatch(/;\s*Domain=/i);
  expect(cookie).toMatch(/;\s*HttpOnly/i);
  return cookie!.split(';')[0]!;
}

describe('cookie names: __Host- over HTTPS, plain on loopback HTTP', () => {
  let https: INestApplication;
  let plain: INestApplication;
  beforeAll(async () => {
    plain = await createTestApp();
    // Behind a TLS-terminating proxy the app's public address is https; the proxy speaks HTTP to it.
    https = await createTestApp({ APP_URL: 'https://shoalbook.example.test' });
  });
  afterAll(async () => {
    await https.close();
    await plain.close();
  });

  it('sets __Host-sb_csrf and __Host-sb_session (Secure, Path=/, no Domain) and reads only those names', async () => {
    const user = await newUser(plain); // same database; a plain-HTTP client cannot send Secure cookies back
    const server = https.getHttpServer();
    const csrf = await request(server).get('/api/auth/csrf');
    const csrfCookie = expectHostPrefixed(
      setCookies(csrf).find((c) => c.startsWith('__Host-sb_csrf=')),
      'sb_csrf',
    );
    const signIn = await request(server)
      .post('/api/auth/sign-in')
      .set('Cookie', csrfCookie)
      .set(CSRF_HEADER, csrf.body.csrfToken as string)
      .send({ email: user.email, password: GOOD_PASSWORD });
    expect(signIn.status).toBe(200);
    const session = expectHostPrefixed(
      setCookies(signIn).find((c) => c.startsWith('__Host-sb_session=')),
      'sb_session',
    );
    expect(setCookies(signIn).some((c) => c.startsWith('sb_session='))).toBe(false);
    expect((await request(server).get('/api/auth/me').set('Cookie', session)).status).toBe(200);
    // The same token under the plain name is not a session here: only the host-bound cookie counts.
    const unprefixed = session.replace(/^__Host-/, '');
    expect((await request(server).get('/api/auth/me').set('Cookie', unprefixed)).status).toBe(401);
  });

  it('keeps the plain names on loopback HTTP, where browsers refuse __Host- cookies without TLS', async () => {
    const csrf = await request(plain.getHttpServer()).get('/api/auth/csrf');
    const cookie = setCookies(csrf).find((c) => c.includes('sb_csrf='));
    expect(cookie).toMatch(/^sb_csrf=/);
    expect(cookie).not.toMatch(/;\s*Secure/i);
  });
});
