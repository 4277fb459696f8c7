import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Response } from 'supertest';
import { ApiClient, GOOD_PASSWORD, makeAdmin, newUser, uniqueEmail } from './utils/api-client';
import { createTestApp } from './utils/test-app';

/**
 * No account enumeration: OWASP ASVS 4.0.3 2.2.x / the OWASP Authentication cheat sheet ("Authentication and
 * Error Messages", "Account enumeration" by response and by time). Each pair of requests must give the same
 * status and body (the request id aside), and their median times over 20 interleaved tries each must lie
 * within 1.2 times of each other.
 */
const TRIES = 20;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

function answer(res: Response): { status: number; body: unknown } {
  const { requestId: _ignored, ...body } = res.body as Record<string, unknown>;
  return { status: res.status, body };
}

/** Runs `a` and `b` alternately (so machine load hits both alike), with a pause for any background work. */
async function compare(a: (i: number) => Promise<Response>, b: (i: number) => Promise<Response>) {
  const times = { a: [] as number[], b: [] as number[] };
  const answers = { a: new Set<string>(), b: new Set<string>() };
  const timed = async (side: 'a' | 'b', run: () => Promise<Response>) => {
    const start = process.hrtime.bigint();
    const res = await run();
    times[side].push(Number(process.hrtime.bigint() - start) / 1e6);
    answers[side].add(JSON.stringify(answer(res)));
    await new Promise((r) => setTimeout(r, 40));
  };
  await a(-1); // warm-up: first-use costs (prepared statements, argon2's memory) land on neither side
  await b(-1);
  for (let i = 0; i < TRIES; i++) {
    await timed('a', () => a(i));
    await timed('b', () => b(i));
  }
  const [ma, mb] = [median(times.a), median(times.b)];
  return { answersA: [...answers.a], answersB: [...answers.b], ratio: Math.max(ma, mb) / Math.min(ma, mb), ma, mb };
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

  it('sign-up: a free and a taken address get the same answer in the same time', async () => {
    const owner = await newUser(app, 'taken');
    const result = await compare(
      () =>
        post('/api/auth/sign-up', { email: uniqueEmail('free'), password: 'a fresh pass phrase', displayName: 'N' }),
      () => post('/api/auth/sign-up', { email: owner.email, password: 'a fresh pass phrase', displayName: 'N' }),
    );
    expect(result.answersA).toHaveLength(1);
    expect(result.answersB).toEqual(result.answersA);
    expect(JSON.parse(result.answersA[0]!)).toMatchObject({ status: 202 });
    expect(result.ratio, `medians ${result.ma.toFixed(1)} / ${result.mb.toFixed(1)} ms`).toBeLessThanOrEqual(1.2);
  });

  it('password-reset request: an address with and without an account get the same answer in the same time', async () => {
    const user = await newUser(app, 'reset');
    const result = await compare(
      () => post('/api/auth/password-reset/request', { email: user.email }),
      () => post('/api/auth/password-reset/request', { email: uniqueEmail('nobody') }),
    );
    expect(result.answersA).toHaveLength(1);
    expect(result.answersB).toEqual(result.answersA);
    expect(JSON.parse(result.answersA[0]!)).toMatchObject({ status: 202 });
    expect(result.ratio, `medians ${result.ma.toFixed(1)} / ${result.mb.toFixed(1)} ms`).toBeLessThanOrEqual(1.2);
  });

  it('sign-in: a disabled account with its right password and a wrong password get the same answer in the same time', async () => {
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
    expect(result.ratio, `medians ${result.ma.toFixed(1)} / ${result.mb.toFixed(1)} ms`).toBeLessThanOrEqual(1.2);
  });
});
