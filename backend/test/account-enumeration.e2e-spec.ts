import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Response } from 'supertest';
import { ApiClient, GOOD_PASSWORD, makeAdmin, newUser, uniqueEmail } from './utils/api-client';
import { messagesTo } from './utils/outbox';
import { createTestApp } from './utils/test-app';

async function waitUntil(done: () => boolean, timeoutMs = 10_000): Promise<void> {
  const start = Date.now();
  while (!done()) {
    if (Date.now() - start > timeoutMs) throw new Error('the background work did not finish in time');
    await new Promise((r) => setTimeout(r, 10));
  }
}

/**
 * No account enumeration: OWASP ASVS 4.0.3 2.2.x / the OWASP Authentication cheat sheet ("Authentication and
 * Error Messages", "Account enumeration" by response and by time). Each pair of requests must give the same
 * status and body (the request id aside) on every one of 20 interleaved tries. Their times are a speed figure,
 * so they are compared side by side in `npm run bench`, not asserted here (a loaded machine makes them noisy).
 */
const TRIES = 20;

function answer(res: Response): { status: number; body: unknown } {
  const { requestId: _ignored, ...body } = res.body as Record<string, unknown>;
  return { status: res.status, body };
}

/**
 * Runs `a` and `b` alternately, each answer kept (request id aside). `settleA` waits for work `a` does after
 * its answer (a mail), so the two sides never overlap.
 */
async function compare(
  a: (i: number) => Promise<Response>,
  b: (i: number) => Promise<Response>,
  settleA: (i: number) => Promise<void> = async () => {},
) {
  const answers = { a: new Set<string>(), b: new Set<string>() };
  for (let i = 0; i < TRIES; i++) {
    answers.a.add(JSON.stringify(answer(await a(i))));
    await settleA(i);
    answers.b.add(JSON.stringify(answer(await b(i))));
  }
  return { answersA: [...answers.a], answersB: [...answers.b] };
}

describe('account enumeration', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  const post = (path: string, body: object) => new ApiClient(app).post(path, body);

  it('sign-up: a free and a taken address get the same answer', async () => {
    const owner = await newUser(app, 'taken');
    const result = await compare(
      () =>
        post('/api/auth/sign-up', { email: uniqueEmail('free'), password: 'a fresh pass phrase', displayName: 'N' }),
      () => post('/api/auth/sign-up', { email: owner.email, password: 'a fresh pass phrase', displayName: 'N' }),
    );
    expect(result.answersA).toHaveLength(1);
    expect(result.answersB).toEqual(result.answersA);
    expect(JSON.parse(result.answersA[0]!)).toMatchObject({ status: 202 });
  });

  it('password-reset request: an address with and without an account get the same answer', async () => {
    const user = await newUser(app, 'reset');
    const before = messagesTo(user.email).length;
    const result = await compare(
      () => post('/api/auth/password-reset/request', { email: user.email }),
      () => post('/api/auth/password-reset/request', { email: uniqueEmail('nobody') }),
      // The reset mail is sent after the answer: wait for it before the other side's request.
      (i) => waitUntil(() => messagesTo(user.email).length >= before + i + 1),
    );
    expect(result.answersA).toHaveLength(1);
    expect(result.answersB).toEqual(result.answersA);
    expect(JSON.parse(result.answersA[0]!)).toMatchObject({ status: 202 });
  });

  it('sign-in: a disabled account with its right password and a wrong password get the same answer', async () => {
    const admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
    const disabled = await newUser(app, 'disabled');
    const active = await newUser(app, 'active');
    expect((await admin.patch(`/api/admin/users/${disabled.userId}`, { disabled: true })).status).toBe(200);
    const result = await compare(
      () => post('/api/auth/sign-in', { email: disabled.email, password: GOOD_PASSWORD }),
      () => post('/api/auth/sign-in', { email: active.email, password: 'not the right pass phrase' }),
    );
    expect(result.answersA).toHaveLength(1);
    expect(result.answersB).toEqual(result.answersA);
    expect(JSON.parse(result.answersA[0]!)).toMatchObject({ status: 401, body: { code: 'wrong_credentials' } });
  });
});
