import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, newUser, uniqueEmail } from './utils/api-client';
import { createTestApp } from './utils/test-app';

describe('rate limits on sign-in, sign-up, reset and invites', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp({
      THROTTLE_AUTH_LIMIT: '6',
      THROTTLE_ACCOUNT_LIMIT: '3',
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
