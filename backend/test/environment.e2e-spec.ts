import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppModule } from '../src/app.module';
import { APP_OPTIONS, configureApp } from '../src/configure-app';
import { ApiClient, makeAdmin, newUser, uniqueEmail } from './utils/api-client';
import { createTestApp } from './utils/test-app';

describe('the development outbox', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp({ NODE_ENV: 'development' });
  });
  afterAll(async () => {
    await app.close();
  });

  it('lists the fake SMTP server’s messages, newest first, to a signed-in site admin', async () => {
    const admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
    const user = await newUser(app);
    await new ApiClient(app).post('/api/auth/password-reset/request', { email: user.email });
    await new ApiClient(app).post('/api/auth/password-reset/request', { email: user.email });
    let mine: Array<{ to: string; subject: string; receivedAt: string; text: string }> = [];
    const resets = () => mine.filter((m) => /new Shoalbook password/.test(m.subject)).length;
    for (let i = 0; i < 100 && resets() < 2; i++) {
      const res = await admin.get('/api/dev/outbox');
      expect(res.status).toBe(200);
      mine = res.body.filter((m: { to: string }) => m.to.includes(user.email));
      if (resets() < 2) await new Promise((r) => setTimeout(r, 50));
    }
    expect(mine.filter((m) => /new Shoalbook password/.test(m.subject))).toHaveLength(2);
    mine = mine.filter((m) => /new Shoalbook password/.test(m.subject));
    expect(mine[0]!.subject).toBe('Set a new Shoalbook password');
    expect(mine[0]!.receivedAt >= mine[1]!.receivedAt).toBe(true);
    expect(mine[0]!.text).toContain('/reset-password?token=');
  });
});

describe('the development outbox outside development', () => {
  it('is refused to anyone but a signed-in site admin, and not mounted in the test profile', async () => {
    const dev = await createTestApp({ NODE_ENV: 'development' });
    const test = await createTestApp();
    try {
      expect((await request(dev.getHttpServer()).get('/api/dev/outbox')).status).toBe(401);
      expect((await (await newUser(dev)).get('/api/dev/outbox')).status).toBe(403);
      expect((await request(test.getHttpServer()).get('/api/dev/outbox')).status).toBe(404);
    } finally {
      await dev.close();
      await test.close();
    }
  });
});

describe('production mode', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp({ NODE_ENV: 'production' });
  });
  afterAll(async () => {
    await app.close();
  });

  it('has no outbox route (404) while the API works', async () => {
    expect((await request(app.getHttpServer()).get('/api/dev/outbox')).status).toBe(404);
    expect((await request(app.getHttpServer()).get('/api/health')).status).toBe(200);
  });
});

describe('start-up configuration', () => {
  it('refuses to start with missing or invalid variables, naming each in one error', async () => {
    const error = await createTestApp({ SESSION_SECRET: 'short', SMTP_PORT: 'many', APP_URL: '' }).then(
      () => null,
      (e: unknown) => e as Error,
    );
    expect(error?.message).toMatch(/environment is incomplete/);
    expect(error?.message).toMatch(/SESSION_SECRET is invalid/);
    expect(error?.message).toMatch(/SMTP_PORT is invalid/);
    expect(error?.message).toMatch(/APP_URL is missing/);
    expect(error?.message).not.toMatch(/DB_PORT/);
  });

  it('validates the projector switches too, instead of reading them undeclared', async () => {
    const error = await createTestApp({ PROJECTOR_ENABLED: 'maybe', PROJECTION_GAP_TIMEOUT_MS: 'soon' }).then(
      () => null,
      (e: unknown) => e as Error,
    );
    expect(error?.message).toMatch(/PROJECTOR_ENABLED is invalid/);
    expect(error?.message).toMatch(/PROJECTION_GAP_TIMEOUT_MS is invalid/);
  });
});

describe('serving the built front end', () => {
  let app: INestApplication;
  let dist: string;
  beforeAll(async () => {
    dist = mkdtempSync(join(tmpdir(), 'shoalbook-dist-'));
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Shoalbook test shell</title>');
    writeFileSync(join(dist, 'app.js'), 'console.log(1)');
    mkdirSync(join(dist, 'assets'));
    writeFileSync(join(dist, 'assets', 'index-B7x_Qk2a.js'), 'console.log(2)');
    // serve-static only works in a real app (not inside Test.createTestingModule).
    app = await NestFactory.create(AppModule.forRoot({ FRONTEND_DIST: dist }), { ...APP_OPTIONS, logger: ['error'] });
    configureApp(app);
    await app.listen(0, '127.0.0.1');
  });
  afterAll(async () => {
    await app.close();
    rmSync(dist, { recursive: true, force: true });
  });

  it('caches only the hashed assets for long, and never an API answer', async () => {
    const server = app.getHttpServer();
    // RFC 8246 immutable: the file name changes whenever its bytes do (Vite's content hash).
    const hashed = await request(server).get('/assets/index-B7x_Qk2a.js');
    expect(hashed.text).toBe('console.log(2)');
    expect(hashed.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    for (const path of ['/', '/app.js', '/crews/some-id/settings'])
      expect((await request(server).get(path)).headers['cache-control'], path).toBe('no-cache');
    // OWASP ASVS 4.0.3 V8.2.1: API answers are never stored, also error answers.
    for (const path of ['/api/auth/csrf', '/api/nothing-here']) {
      const res = await request(server).get(path);
      expect(res.headers['cache-control'], path).toBe('no-store');
      expect(res.headers.vary, path).toMatch(/\bCookie\b/);
    }
  });

  it('serves files, falls back to index.html for app routes, and keeps /api JSON', async () => {
    const server = app.getHttpServer();
    expect((await request(server).get('/app.js')).text).toBe('console.log(1)');
    const spa = await request(server).get('/crews/some-id/settings');
    expect(spa.status).toBe(200);
    expect(spa.text).toContain('Shoalbook test shell');
    expect(spa.headers['content-security-policy']).toContain("script-src 'self'");
    const api = await request(server).get('/api/nothing-here');
    expect(api.status).toBe(404);
    expect(api.body).toMatchObject({ statusCode: 404 });
    // Middleware errors keep their status with the front end served (serve-static would make them 404s).
    const noToken = await request(server).post('/api/auth/sign-in').send({ email: 'a@example.test', password: 'x' });
    expect(noToken.status).toBe(403);
    expect(noToken.body.code).toBe('csrf_invalid');
    const client = new ApiClient(app);
    const token = await client.refreshCsrf();
    const malformed = await client.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', token)
      .set('Content-Type', 'application/json')
      .send('{"email":');
    expect(malformed.status).toBe(400);
    expect(malformed.body.code).toBe('invalid_json');
    const signUp = await new ApiClient(app).post('/api/auth/sign-up', {
      email: uniqueEmail('static'),
      password: 'a fine long passphrase',
      displayName: 'Static',
    });
    expect(signUp.status).toBe(202);
  });
});
