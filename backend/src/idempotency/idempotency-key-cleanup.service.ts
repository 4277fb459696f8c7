import { MikroORM } from '@mikro-orm/mariadb';
import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { IDEMPOTENCY_KEY_LIFETIME_MS, IdempotencyKey } from './idempotency-key.entity';

const SWEEP_EVERY_MS = 6 * 3_600_000;

/** Deletes keys past their 30 days; an expired key found on a write is also replaced on the spot. */
@Injectable()
export class IdempotencyKeyCleanup implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(IdempotencyKeyCleanup.name);
  private timer: NodeJS.Timeout | null = null;

  constructor(private readonly orm: MikroORM) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => {
      this.sweep().catch((e: unknown) =>
        this.logger.error(`idempotency key sweep failed: ${e instanceof Error ? e.message : String(e)}`),
      );
    }, SWEEP_EVERY_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  /** One pass; `now` is injectable for tests. */
  async sweep(now: Date = new Date()): Promise<number> {
    const cutoff = new Date(now.getTime() - IDEMPOTENCY_KEY_LIFETIME_MS);
    return this.orm.em.fork().nativeDelete(IdempotencyKey, { createdAt: { $lt: cutoff } });
  }
}
