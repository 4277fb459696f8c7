import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Crew } from '../src/crews/crew.entity';
import { Membership } from '../src/crews/membership.entity';
import { addMember, crewWithMembers, type CrewFixture, newUser } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

function expectStatus(res: { status: number; body: unknown }, status: number): void {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
}

describe('crews, members and roles', () => {
  let app: INestApplication;
  let a: CrewFixture;
  let b: CrewFixture;
  beforeAll(async () => {
    app = await createTestApp();
    [a, b] = await Promise.all([crewWithMembers(app, 'Crew A'), crewWithMembers(app, 'Crew B')]);
  });
  afterAll(async () => {
    await app.close();
  });

  it('creates a crew with the caller as owner and positions hidden from viewers by default', async () => {
    const user = await newUser(app);
    const res = await user.post('/api/crews', { name: '  Morning Shift  ' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Morning Shift', role: 'owner', viewersSeePositions: false });
    const list = await user.get('/api/crews');
    expect(list.body).toEqual([res.body]);
    const me = await user.get('/api/auth/me');
    expect(me.body.crews).toEqual([{ crewId: res.body.id, crewName: 'Morning Shift', role: 'owner' }]);
  });

  it('refuses a crew without a name or with an over-long one, creating nothing', async () => {
    const user = await newUser(app);
    for (const body of [{}, { name: '' }, { name: 'x'.repeat(81) }, { name: 42 }]) {
      const res = await user.post('/api/crews', body);
      expect(res.status).toBe(400);
      expect(res.body.fieldErrors.name).toBeDefined();
    }
    expect(await testEm(app).count(Membership, { user: user.userId })).toBe(0);
  });

  it('lets every member read the crew and its members, each seeing their own role', async () => {
    for (const [client, role] of [
      [a.owner, 'owner'],
      [a.angler, 'angler'],
      [a.viewer, 'viewer'],
    ] as const) {
      const crew = await client.get(`/api/crews/${a.crewId}`);
      expect(crew.status).toBe(200);
      expect(crew.body.role).toBe(role);
      const members = await client.get(`/api/crews/${a.crewId}/members`);
      expect(members.status).toBe(200);
      expect(members.body.map((m: { role: string }) => m.role).sort()).toEqual(['angler', 'owner', 'viewer']);
    }
  });

  it('answers 404 to a member of another crew, and to any id that is not a crew, on every crew route', async () => {
    const outsider = b.owner;
    const target = a.angler.userId;
    const attempts = [
      () => outsider.get(`/api/crews/${a.crewId}`),
      () => outsider.patch(`/api/crews/${a.crewId}`, { name: 'Taken over' }),
      () => outsider.get(`/api/crews/${a.crewId}/members`),
      () => outsider.patch(`/api/crews/${a.crewId}/members/${target}`, { role: 'viewer' }),
      () => outsider.delete(`/api/crews/${a.crewId}/members/${target}`),
      () => outsider.get(`/api/crews/${a.crewId}/invites`),
      () => outsider.post(`/api/crews/${a.crewId}/invites`, { email: 'x@example.test', role: 'angler' }),
      () => outsider.get('/api/crews/00000000-0000-4000-8000-000000000000'),
      () => outsider.get('/api/crews/not-a-uuid/members'),
    ];
    for (const attempt of attempts) {
      const res = await attempt();
      expect(res.status).toBe(404);
      expect(res.body.message).toBe('No such crew.');
    }
    const crew = await testEm(app).findOneOrFail(Crew, { id: a.crewId });
    expect(crew.name).toBe('Crew A');
    expect(await testEm(app).findOneOrFail(Membership, { crew: a.crewId, user: target })).toMatchObject({
      role: 'angler',
    });
  });

  it('refuses writes to viewers (403) and owner-only actions to anglers (403)', async () => {
    const viewerRename = await a.viewer.patch(`/api/crews/${a.crewId}`, { name: 'Viewer was here' });
    expect(viewerRename.status).toBe(403);
    const anglerRename = await a.angler.patch(`/api/crews/${a.crewId}`, { name: 'Angler was here' });
    expect(anglerRename.status).toBe(403);
    expect(anglerRename.body.message).toMatch(/owner/);
    const anglerPromotes = await a.angler.patch(`/api/crews/${a.crewId}/members/${a.angler.userId}`, { role: 'owner' });
    expect(anglerPromotes.status).toBe(403);
    const viewerRemoves = await a.viewer.delete(`/api/crews/${a.crewId}/members/${a.angler.userId}`);
    expect(viewerRemoves.status).toBe(403);
    const anglerInvites = await a.angler.post(`/api/crews/${a.crewId}/invites`, {
      email: 'x@example.test',
      role: 'viewer',
    });
    expect(anglerInvites.status).toBe(403);
    expect((await testEm(app).findOneOrFail(Crew, { id: a.crewId })).name).toBe('Crew A');
    expect(await testEm(app).count(Membership, { crew: a.crewId })).toBe(3);
  });

  it('lets the owner rename the crew and let viewers see positions', async () => {
    const res = await a.owner.patch(`/api/crews/${a.crewId}`, { viewersSeePositions: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Crew A', viewersSeePositions: true });
    const bad = await a.owner.patch(`/api/crews/${a.crewId}`, { viewersSeePositions: 'yes' });
    expect(bad.status).toBe(400);
    const back = await a.owner.patch(`/api/crews/${a.crewId}`, { viewersSeePositions: false });
    expect(back.body.viewersSeePositions).toBe(false);
  });

  it('changes roles (owner only), refusing an unknown role and a user who is not a member', async () => {
    const crew = await crewWithMembers(app, 'Roles');
    const res = await crew.owner.patch(`/api/crews/${crew.crewId}/members/${crew.viewer.userId}`, { role: 'angler' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ userId: crew.viewer.userId, role: 'angler' });
    const promoted = await crew.viewer.patch(`/api/crews/${crew.crewId}`, { name: 'Now I can? No, owners only' });
    expect(promoted.status).toBe(403);
    const unknownRole = await crew.owner.patch(`/api/crews/${crew.crewId}/members/${crew.viewer.userId}`, {
      role: 'captain',
    });
    expect(unknownRole.status).toBe(400);
    expect(unknownRole.body.fieldErrors.role).toBeDefined();
    const notMember = await crew.owner.patch(`/api/crews/${crew.crewId}/members/${b.angler.userId}`, {
      role: 'viewer',
    });
    expect(notMember.status).toBe(404);
    expect(await testEm(app).count(Membership, { user: b.angler.userId, role: 'viewer' })).toBe(0);
  });

  it('protects the last owner: cannot step down or leave; can once there is a second owner', async () => {
    const crew = await crewWithMembers(app, 'Owners');
    const demote = await crew.owner.patch(`/api/crews/${crew.crewId}/members/${crew.owner.userId}`, { role: 'angler' });
    expect(demote.status).toBe(409);
    expect(demote.body.code).toBe('last_owner');
    const leave = await crew.owner.delete(`/api/crews/${crew.crewId}/members/${crew.owner.userId}`);
    expect(leave.status).toBe(409);
    expect(leave.body.code).toBe('last_owner');
    expect(await testEm(app).count(Membership, { crew: crew.crewId, role: 'owner' })).toBe(1);

    await crew.owner.patch(`/api/crews/${crew.crewId}/members/${crew.angler.userId}`, { role: 'owner' });
    const nowLeave = await crew.owner.delete(`/api/crews/${crew.crewId}/members/${crew.owner.userId}`);
    expect(nowLeave.status).toBe(204);
    expect((await crew.owner.get(`/api/crews/${crew.crewId}`)).status).toBe(404);
  });

  it('hands the crew to another member in one step: they own it, the old owner stays as angler or viewer, or leaves', async () => {
    const crew = await crewWithMembers(app, 'Hand-over');
    const path = `/api/crews/${crew.crewId}/hand-over`;
    const roleOf = async (userId: string) =>
      (await testEm(app).findOne(Membership, { crew: crew.crewId, user: userId }))?.role ?? null;

    const handed = await crew.owner.post(path, { userId: crew.angler.userId, stayAs: 'viewer' });
    expect(handed.status).toBe(200);
    expect(handed.body.find((m: { userId: string }) => m.userId === crew.angler.userId).role).toBe('owner');
    expect(await roleOf(crew.angler.userId)).toBe('owner');
    expect(await roleOf(crew.owner.userId)).toBe('viewer');
    // The old owner is a viewer now: no second hand-over.
    expect((await crew.owner.post(path, { userId: crew.viewer.userId, stayAs: 'angler' })).status).toBe(403);

    // Bad input changes nothing: oneself, an unknown member, an unknown role.
    const self = await crew.angler.post(path, { userId: crew.angler.userId, stayAs: 'angler' });
    expect(self.status).toBe(400);
    expect(self.body.fieldErrors).toHaveProperty('userId');
    const stranger = await newUser(app);
    expect((await crew.angler.post(path, { userId: stranger.userId, stayAs: 'angler' })).status).toBe(404);
    const badRole = await crew.angler.post(path, { userId: crew.viewer.userId, stayAs: 'owner' });
    expect(badRole.status).toBe(400);
    expect(badRole.body.fieldErrors).toHaveProperty('stayAs');
    expect(await roleOf(crew.angler.userId)).toBe('owner');
    expect(await roleOf(crew.viewer.userId)).toBe('viewer');

    // Handing over and leaving: the new owner is the only owner, the old one is no member.
    expectStatus(await crew.angler.post(path, { userId: crew.viewer.userId, stayAs: 'leave' }), 200);
    expect(await roleOf(crew.viewer.userId)).toBe('owner');
    expect(await roleOf(crew.angler.userId)).toBeNull();
    expect((await crew.angler.get(`/api/crews/${crew.crewId}`)).status).toBe(404);
    expect(await testEm(app).count(Membership, { crew: crew.crewId, role: 'owner' })).toBe(1);
  });

  it('lets any member leave, and lets the owner remove a member', async () => {
    const crew = await crewWithMembers(app, 'Leavers');
    expect((await crew.viewer.delete(`/api/crews/${crew.crewId}/members/${crew.viewer.userId}`)).status).toBe(204);
    expect((await crew.viewer.get(`/api/crews/${crew.crewId}`)).status).toBe(404);
    expect((await crew.owner.delete(`/api/crews/${crew.crewId}/members/${crew.angler.userId}`)).status).toBe(204);
    expect((await crew.angler.get(`/api/crews/${crew.crewId}/members`)).status).toBe(404);
    const members = await crew.owner.get(`/api/crews/${crew.crewId}/members`);
    expect(members.body.map((m: { userId: string }) => m.userId)).toEqual([crew.owner.userId]);
  });

  it('lists only the caller’s crews', async () => {
    const user = await newUser(app);
    await addMember(app, b.crewId, user.userId, 'viewer');
    const res = await user.get('/api/crews');
    expect(res.body).toEqual([{ id: b.crewId, name: 'Crew B', role: 'viewer', viewersSeePositions: false }]);
  });
});
