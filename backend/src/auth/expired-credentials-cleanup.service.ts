import { MikroORM } from '@mikro-orm/mariadb';
import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { AppConfig } from '../config/app-config.service';
import { Invite } from '../crews/invite.entity';
import { AuthToken } from './auth-token.entity';
import { Session } from './session.entity';

export interface CleanupResult {
  sessions: number;
  authTokens: number;
  invites: number;
}

/**
 * Deletes what can never be used again: sessions past their absolute or idle lifetime, reset tokens
 * that are used or expired, and pending invites past their expiry. Resolving a session already refuses
 * an expired one; this keeps the tables from holding dead credential hashes. Runs every
 * SESSION_CLEANUP_MINUTES (0 turns it off).
 */
@Injectable()
export class ExpiredCredentialsCleanup implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(ExpiredCredentialsCleanup.name);
  private timer: NodeJS.Timeout | null = null;

  constructor(
    private readonly orm: MikroORM,
    private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    const minutes = this.config.get('SESSION_CLEANUP_MINUTES');
    if (minutes <= 0) return;
    this.timer = setInterval(() => {
      this.cleanup().catch((e: unknown) =>
        this.logger.error(`cleanup failed: ${e instanceof Error ? e.message : String(e)}`),
      );
    }, minutes * 60_000);
    // A pending cleanup never keeps the process alive.
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  /** Whether the periodic run is scheduled. */
  get scheduled(): boolean {
    return this.timer !== null;
  }

  /** One pass; `now` is injectable for tests. */
  async cleanup(now: Date = new Date()): Promise<CleanupResult> {
    const em = this.orm.em.fork();
    const idleCutoff = new Date(now.getTime() - this.config.get('SESSION_IDLE_HOURS') * 3_600_000);
    const sessions = await em.nativeDelete(Session, {
      $or: [{ expiresAt: { $lte: now } }, { lastSeenAt: { $lte: idleCutoff } }],
    });
    const authTokens = await em.nativeDelete(AuthToken, {
      $or: [{ expiresAt: { $lte: now } }, { usedAt: { $ne: null } }],
    });
    const invites = await em.nativeDelete(Invite, { acceptedAt: null, expiresAt: { $lte: now } });
    if (sessions + authTokens + invites > 0)
      this.logger.log(`removed ${sessions} session(s), ${authTokens} reset token(s), ${invites} expired invite(s)`);
    return { sessions, authTokens, invites };
  }
}
