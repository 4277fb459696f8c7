import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './utils/test-app';

describe('GET /api/health', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('answers ok with the database up', async () => {
    const res = await request(app.getHttpServer()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      status: 'ok',
      db: 'up',
      projection: { events: expect.any(Number), failedRuns: 0 },
    });
  });

  it('sets the security headers (CSP without inline scripts)', async () => {
    const res = await request(app.getHttpServer()).get('/api/health');
    const csp = res.headers['content-security-policy'] as string;
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });
});

describe('GET /api/health with the database unreachable', () => {
  let app: INestApplication;
  beforeAll(async () => {
    // Port 9 (discard) on loopback: nothing listens there, so every connection is refused.
    app = await createTestApp({ DB_PORT: '9' });
  });
  afterAll(async () => {
    await app.close();
  });

  it('answers 503 with db down, and the server keeps running', async () => {
    const started = Date.now();
    const res = await request(app.getHttpServer()).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ status: 'error', db: 'down', statusCode: 503 });
    // RFC 9110 §10.2.3: a 503 may say when to come back.
    expect(res.headers['retry-after']).toMatch(/^\d+$/);
    expect(Date.now() - started).toBeLessThan(5000);
    const again = await request(app.getHttpServer()).get('/api/health');
    expect(again.status).toBe(503);
  });

  it('answers other routes with the error shape, not a crash or a stack trace', async () => {
    const res = await request(app.getHttpServer()).get('/api/crews').set('Cookie', 'sb_session=abc');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ statusCode: 503, code: 'db_unavailable', requestId: expect.any(String) });
    expect(res.headers['retry-after']).toMatch(/^\d+$/);
    expect(JSON.stringify(res.body)).not.toMatch(/ECONNREFUSED|at .*\.js:\d+/);
  });
});
