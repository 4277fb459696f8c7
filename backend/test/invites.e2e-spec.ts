import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invite } from '../src/crews/invite.entity';
import { Membership } from '../src/crews/membership.entity';
import { ApiClient, crewWithMembers, type CrewFixture, uniqueEmail } from './utils/api-client';
import { tokenFromMail, waitForMail } from './utils/outbox';
import { createTestApp, testEm } from './utils/test-app';

describe('invites by e-mail', () => {
  let app: INestApplication;
  let crew: CrewFixture;
  beforeAll(async () => {
    app = await createTestApp();
    crew = await crewWithMembers(app, 'Inviting Crew');
  });
  afterAll(async () => {
    await app.close();
  });

  async function invite(email: string, role = 'angler') {
    const res = await crew.owner.post(`/api/crews/${crew.crewId}/invites`, { email, role });
    expect(res.status).toBe(201);
    return {
      view: res.body as { id: string; email: string; role: string; expiresAt: string },
      token: tokenFromMail(await waitForMail(email, 1), '/invite'),
    };
  }

  it('mails a link whose token is accepted once by the invited address, then refused', async () => {
    const email = uniqueEmail('invitee');
    const { view, token } = await invite(email, 'viewer');
    expect(view).toMatchObject({ email, role: 'viewer' });
    expect(new Date(view.expiresAt).getTime() - Date.now()).toBeGreaterThan(6.9 * 86_400_000);
    expect(Buffer.from(token, 'base64url').length).toBeGreaterThanOrEqual(16);
    const stored = await testEm(app).findOneOrFail(Invite, { id: view.id });
    expect(stored.tokenHash).not.toBe(token);

    const preview = await request(app.getHttpServer()).get(`/api/invites/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ crewName: 'Inviting Crew', role: 'viewer', email });

    const pending = await crew.owner.get(`/api/crews/${crew.crewId}/invites`);
    expect(pending.body.map((i: { id: string }) => i.id)).toContain(view.id);

    const invitee = await new ApiClient(app).signUp(email);
    const accepted = await invitee.post('/api/invites/accept', { token });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ crewId: crew.crewId });
    expect((await invitee.get(`/api/crews/${crew.crewId}`)).body.role).toBe('viewer');

    const again = await invitee.post('/api/invites/accept', { token });
    expect(again.status).toBe(400);
    expect(again.body.code).toBe('token_invalid');
    const previewAgain = await request(app.getHttpServer()).get(`/api/invites/${token}`);
    expect(previewAgain.status).toBe(404);
    expect(previewAgain.body.code).toBe('token_invalid');
    expect(await testEm(app).count(Membership, { crew: crew.crewId, user: invitee.userId })).toBe(1);
  });

  it('refuses the link to another signed-in address, and an expired link, joining nobody', async () => {
    const email = uniqueEmail('forwarded');
    const { view, token } = await invite(email);
    const stranger = await new ApiClient(app).signUp(uniqueEmail('stranger'));
    const res = await stranger.post('/api/invites/accept', { token });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('invite_email_mismatch');
    await testEm(app).nativeUpdate(Invite, { id: view.id }, { expiresAt: new Date(Date.now() - 1000) });
    const invitee = await new ApiClient(app).signUp(email);
    const expired = await invitee.post('/api/invites/accept', { token });
    expect(expired.status).toBe(400);
    expect(expired.body.code).toBe('token_invalid');
    expect(
      await testEm(app).count(Membership, { crew: crew.crewId, user: { $in: [stranger.userId, invitee.userId] } }),
    ).toBe(0);
  });

  it('needs a session to accept, and refuses bad input', async () => {
    const anonymous = new ApiClient(app);
    expect((await anonymous.post('/api/invites/accept', { token: 'whatever' })).status).toBe(401);
    const user = await new ApiClient(app).signUp();
    expect((await user.post('/api/invites/accept', {})).status).toBe(400);
    expect((await user.post('/api/invites/accept', { token: 'x'.repeat(201) })).status).toBe(400);
    expect((await user.post('/api/invites/accept', { token: 'made-up' })).body.code).toBe('token_invalid');
    const badInvite = await crew.owner.post(`/api/crews/${crew.crewId}/invites`, { email: 'nope', role: 'boss' });
    expect(badInvite.status).toBe(400);
    expect(Object.keys(badInvite.body.fieldErrors).sort()).toEqual(['email', 'role']);
  });

  it('refuses to invite a current member, and lets the owner withdraw an invite', async () => {
    const member = await crew.owner.post(`/api/crews/${crew.crewId}/invites`, {
      email: crew.angler.email,
      role: 'viewer',
    });
    expect(member.status).toBe(409);
    expect(member.body.code).toBe('already_member');
    const email = uniqueEmail('withdrawn');
    const { view, token } = await invite(email);
    expect((await crew.owner.delete(`/api/crews/${crew.crewId}/invites/${view.id}`)).status).toBe(204);
    expect((await crew.owner.delete(`/api/crews/${crew.crewId}/invites/${view.id}`)).status).toBe(404);
    expect((await request(app.getHttpServer()).get(`/api/invites/${token}`)).status).toBe(404);
  });

  it('replaces a pending invite to the same address, so only the newest link works', async () => {
    const email = uniqueEmail('twice');
    const first = await invite(email);
    const res = await crew.owner.post(`/api/crews/${crew.crewId}/invites`, { email, role: 'viewer' });
    expect(res.status).toBe(201);
    const second = tokenFromMail(await waitForMail(email, 2), '/invite');
    expect((await request(app.getHttpServer()).get(`/api/invites/${first.token}`)).status).toBe(404);
    expect((await request(app.getHttpServer()).get(`/api/invites/${second}`)).body.role).toBe('viewer');
  });
});
