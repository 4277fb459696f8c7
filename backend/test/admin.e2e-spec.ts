import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../src/users/user.entity';
import { ApiClient, crewWithMembers, makeAdmin, newUser } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

describe('site administration', () => {
  let app: INestApplication;
  let admin: ApiClient;
  beforeAll(async () => {
    app = await createTestApp();
    admin = await newUser(app, 'admin');
    await makeAdmin(app, admin.userId);
  });
  afterAll(async () => {
    await app.close();
  });

  it('lists accounts for admins only', async () => {
    const user = await newUser(app);
    const res = await admin.get('/api/admin/users');
    expect(res.status).toBe(200);
    const row = res.body.find((u: { id: string }) => u.id === user.userId);
    expect(row).toEqual({
      id: user.userId,
      email: user.email,
      displayName: 'Test Angler',
      siteRole: 'user',
      disabled: false,
      createdAt: expect.any(String),
    });
    expect(Object.keys(row)).not.toContain('passwordHash');
    expect((await user.get('/api/admin/users')).status).toBe(403);
    expect((await new ApiClient(app).get('/api/admin/users')).status).toBe(401);
  });

  it('finds accounts by part of the e-mail or name, any case, newest first, in pages with the total', async () => {
    const tag = `srch${Date.now().toString(36)}`;
    const first = await newUser(app, `${tag}-first`);
    await new Promise((resolve) => setTimeout(resolve, 5)); // a later createdAt, so "newest first" is defined
    const second = await newUser(app, `${tag}-second`);
    await testEm(app).nativeUpdate(User, { id: second.userId }, { displayName: `Ripple ${tag}%_Done` });

    const byMail = await admin.get(`/api/admin/users?q=${tag.toUpperCase()}`);
    expect(byMail.status).toBe(200);
    expect(byMail.body.map((u: { id: string }) => u.id)).toEqual([second.userId, first.userId]);
    expect(byMail.headers['x-total-count']).toBe('2');

    const page = await admin.get(`/api/admin/users?q=${tag}&limit=1&offset=1`);
    expect(page.body.map((u: { id: string }) => u.id)).toEqual([first.userId]);
    expect(page.headers['x-total-count']).toBe('2');

    // LIKE's wildcards in the search text are plain characters: "<tag>%_d" matches only the name that has them;
    // unescaped, "<tag>%" would match the first account's e-mail too.
    const literal = await admin.get(`/api/admin/users?q=${encodeURIComponent(`${tag}%_d`)}`);
    expect(literal.body.map((u: { id: string }) => u.id)).toEqual([second.userId]);
    const percent = await admin.get(`/api/admin/users?q=${encodeURIComponent(`${tag}%`)}`);
    expect(percent.body.map((u: { id: string }) => u.id)).toEqual([second.userId]);

    expect((await admin.get('/api/admin/users?limit=0')).status).toBe(400);
    expect((await admin.get(`/api/admin/users?q=${'x'.repeat(255)}`)).status).toBe(400);
  });

  it('disables an account: its sessions end and sign-in is refused; enabling lets it back in', async () => {
    const user = await newUser(app);
    const res = await admin.patch(`/api/admin/users/${user.userId}`, { disabled: true });
    expect(res.status).toBe(200);
    expect(res.body.disabled).toBe(true);
    expect((await user.get('/api/auth/me')).status).toBe(401);
    // No account enumeration (OWASP ASVS 4.0.3 2.2.x): a disabled account answers like a wrong password.
    const signIn = await new ApiClient(app).signIn(user.email, user.password);
    const wrong = await new ApiClient(app).signIn(user.email, 'not the password at all');
    expect(signIn.status).toBe(401);
    expect(signIn.body.code).toBe('wrong_credentials');
    expect({ ...signIn.body, requestId: undefined }).toEqual({ ...wrong.body, requestId: undefined });
    await admin.patch(`/api/admin/users/${user.userId}`, { disabled: false });
    expect((await new ApiClient(app).signIn(user.email, user.password)).status).toBe(200);
  });

  it('refuses bad input, unknown accounts, non-admins and self-lockout, changing nothing', async () => {
    const user = await newUser(app);
    expect((await admin.patch(`/api/admin/users/${user.userId}`, { disabled: 'yes' })).status).toBe(400);
    expect((await admin.patch(`/api/admin/users/${user.userId}`, { siteRole: 'owner' })).status).toBe(400);
    expect(
      (await admin.patch('/api/admin/users/00000000-0000-4000-8000-000000000000', { disabled: true })).status,
    ).toBe(404);
    expect((await user.patch(`/api/admin/users/${user.userId}`, { siteRole: 'admin' })).status).toBe(403);
    const self = await admin.patch(`/api/admin/users/${admin.userId}`, { disabled: true });
    expect(self.status).toBe(409);
    expect(self.body.code).toBe('self_lockout');
    const rows = await testEm(app).find(User, { id: { $in: [user.userId, admin.userId] } });
    expect(rows.map((u) => [u.siteRole, u.disabled]).sort()).toEqual([
      ['admin', false],
      ['user', false],
    ]);
  });

  it('opens no crew to the site admin', async () => {
    const crew = await crewWithMembers(app, 'Private Crew');
    expect((await admin.get(`/api/crews/${crew.crewId}`)).status).toBe(404);
    expect((await admin.get(`/api/crews/${crew.crewId}/members`)).status).toBe(404);
    expect((await admin.get('/api/crews')).body).toEqual([]);
  });
});
