import type { INestApplication } from '@nestjs/common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuthToken } from '../src/auth/auth-token.entity';
import { ExpiredCredentialsCleanup } from '../src/auth/expired-credentials-cleanup.service';
import { Session } from '../src/auth/session.entity';
import { hashToken, randomToken } from '../src/common/tokens';
import { Crew } from '../src/crews/crew.entity';
import { Invite } from '../src/crews/invite.entity';
import { User } from '../src/users/user.entity';
import { crewWithMembers, newUser } from './utils/api-client';
import { createTestApp, testEm } from './utils/test-app';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

describe('cleanup of expired sessions, reset tokens and invites', () => {
  let app: INestApplication;
  beforeAll(async () => {
    // Idle lifetime 2 h; the periodic run is off here, so only the direct calls below delete anything.
    app = await createTestApp({ SESSION_IDLE_HOURS: '2', SESSION_CLEANUP_MINUTES: '0' });
  });
  afterAll(async () => {
    await app.close();
  });

  it('deletes only what can never be used again', async () => {
    const crew = await crewWithMembers(app, 'Cleanup Crew');
    const user = await newUser(app, 'cleanup');
    const em = testEm(app);
    const now = new Date();
    const ago = (ms: number) => new Date(now.getTime() - ms);
    const ahead = (ms: number) => new Date(now.getTime() + ms);
    const userRef = em.getReference(User, user.userId);
    const session = (name: string, lastSeenAt: Date, expiresAt: Date) => {
      em.create(Session, {
        tokenHash: hashToken(`${name}-${randomToken()}`),
        user: userRef,
        createdAt: ago(3 * DAY),
        lastSeenAt,
        expiresAt,
      });
    };
    session('live', ago(HOUR), ahead(DAY));
    session('idle', ago(3 * HOUR), ahead(DAY)); // idle past 2 h
    session('absolute', ago(60_000), ago(1000)); // past its absolute end
    const token = (expiresAt: Date, usedAt: Date | null) =>
      em.create(AuthToken, {
        tokenHash: hashToken(randomToken()),
        purpose: 'password_reset',
        user: userRef,
        expiresAt,
        usedAt,
      });
    const liveToken = token(ahead(HOUR), null);
    token(ago(1000), null);
    token(ahead(HOUR), ago(60_000));
    const invite = (expiresAt: Date, acceptedAt: Date | null) =>
      em.create(Invite, {
        crew: em.getReference(Crew, crew.crewId),
        email: `cleanup-${randomToken(4)}@example.test`,
        role: 'viewer',
        tokenHash: hashToken(randomToken()),
        invitedBy: em.getReference(User, crew.owner.userId),
        expiresAt,
        acceptedAt,
      });
    const pending = invite(ahead(DAY), null);
    invite(ago(1000), null);
    const accepted = invite(ago(DAY), ago(2 * DAY)); // history of a membership: kept
    await em.flush();
    const liveSessionsBefore = await testEm(app).count(Session, { user: crew.owner.userId });

    const cleanup = app.get(ExpiredCredentialsCleanup);
    expect(cleanup.scheduled).toBe(false);
    const result = await cleanup.cleanup(now);
    expect(result.sessions).toBeGreaterThanOrEqual(2);
    expect(result.authTokens).toBeGreaterThanOrEqual(2);
    expect(result.invites).toBeGreaterThanOrEqual(1);

    const check = testEm(app);
    // The user's own sign-up session (seen just now) and the live one remain; the idle and the expired one went.
    expect(await check.count(Session, { user: user.userId })).toBe(2);
    expect(await check.count(Session, { user: user.userId, lastSeenAt: { $lte: ago(2 * HOUR) } })).toBe(0);
    expect(await check.count(Session, { user: user.userId, expiresAt: { $lte: now } })).toBe(0);
    expect((await check.find(AuthToken, { user: user.userId })).map((t) => t.id)).toEqual([liveToken.id]);
    expect(
      (await check.find(Invite, { crew: crew.crewId }, { orderBy: { id: 'asc' } })).map((i) => i.id).sort(),
    ).toEqual([pending.id, accepted.id].sort());
    // Other people's live sessions are untouched, and the user is still signed in.
    expect(await check.count(Session, { user: crew.owner.userId })).toBe(liveSessionsBefore);
    expect((await user.get('/api/auth/me')).status).toBe(200);

    // A second pass finds nothing more of these.
    expect(await cleanup.cleanup(now)).toMatchObject({ sessions: 0 });
  });

  it('schedules itself when an interval is set, and stops when the app closes', async () => {
    const scheduledApp = await createTestApp({ SESSION_CLEANUP_MINUTES: '15' });
    const cleanup = scheduledApp.get(ExpiredCredentialsCleanup);
    expect(cleanup.scheduled).toBe(true);
    await scheduledApp.close();
    expect(cleanup.scheduled).toBe(false);
  });
});
