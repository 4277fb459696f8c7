import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { CookieOptions, Response } from 'express';
import { AppConfig } from '../config/app-config.service';
import { hashToken, randomToken } from '../common/tokens';
import type { User } from '../users/user.entity';
import { Session } from './session.entity';
import { cookieName, SESSION_COOKIE } from '../common/session-cookie';

/** Touch `lastSeenAt` at most this often, so reads do not write on every request. */
const TOUCH_EVERY_MS = 60_000;

/** Server-side sessions: create on sign-in, resolve per request, end on sign-out or password change. */
@Injectable()
export class SessionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly config: AppConfig,
  ) {}

  private get idleMs(): number {
    return this.config.get('SESSION_IDLE_HOURS') * 3_600_000;
  }

  private get absoluteMs(): number {
    return this.config.get('SESSION_ABSOLUTE_DAYS') * 86_400_000;
  }

  /** A fresh session for `user` (flushed); returns the cookie's token, which is never stored. */
  async create(user: User, em: EntityManager = this.em): Promise<string> {
    const token = randomToken(32);
    const now = new Date();
    em.create(Session, {
      tokenHash: hashToken(token),
      user,
      createdAt: now,
      lastSeenAt: now,
      expiresAt: new Date(now.getTime() + this.absoluteMs),
    });
    await em.flush();
    return token;
  }

  /** The live session for a cookie token, or null (expired ones are deleted on the way). */
  async resolve(token: string): Promise<Session | null> {
    if (!token || token.length > 100) return null;
    const session = await this.em.findOne(Session, { tokenHash: hashToken(token) }, { populate: ['user'] });
    if (!session) return null;
    const now = Date.now();
    if (
      session.expiresAt.getTime() <= now ||
      session.lastSeenAt.getTime() + this.idleMs <= now ||
      session.user.disabled
    ) {
      await this.em.nativeDelete(Session, { tokenHash: session.tokenHash });
      return null;
    }
    if (now - session.lastSeenAt.getTime() > TOUCH_EVERY_MS) {
      await this.em.nativeUpdate(Session, { tokenHash: session.tokenHash }, { lastSeenAt: new Date(now) });
    }
    return session;
  }

  async end(tokenHash: string): Promise<void> {
    await this.em.nativeDelete(Session, { tokenHash });
  }

  /** End every session of a user, optionally keeping the one making the request. */
  async endAllFor(userId: string, keepTokenHash?: string, em: EntityManager = this.em): Promise<number> {
    return em.nativeDelete(
      Session,
      keepTokenHash ? { user: userId, tokenHash: { $ne: keepTokenHash } } : { user: userId },
    );
  }

  /** `__Host-sb_session` over HTTPS, `sb_session` on loopback HTTP. */
  get cookieName(): string {
    return cookieName(SESSION_COOKIE, this.config.secureCookies);
  }

  private cookieOptions(): CookieOptions {
    return { httpOnly: true, sameSite: 'lax', secure: this.config.secureCookies, path: '/' };
  }

  setCookie(res: Response, token: string): void {
    res.cookie(this.cookieName, token, { ...this.cookieOptions(), maxAge: this.absoluteMs });
  }

  clearCookie(res: Response): void {
    res.clearCookie(this.cookieName, this.cookieOptions());
  }
}
