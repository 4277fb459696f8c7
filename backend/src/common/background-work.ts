import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';

/**
 * Work that must not change how long a request takes (OWASP ASVS 4.0.3 2.5.7 / the Authentication cheat
 * sheet's advice that account-dependent work not show in response times): it starts after the current
 * request's handler has returned, failures are logged, and shutdown waits for what is still running.
 */
@Injectable()
export class BackgroundWork implements OnApplicationShutdown {
  private readonly logger = new Logger(BackgroundWork.name);
  private readonly running = new Set<Promise<void>>();

  run(what: string, task: () => Promise<unknown>): void {
    const job: Promise<void> = new Promise<void>((resolve) => setImmediate(resolve))
      .then(task)
      .then(
        () => undefined,
        (e: unknown) => this.logger.error(`${what} failed: ${e instanceof Error ? e.message : String(e)}`),
      )
      .finally(() => this.running.delete(job));
    this.running.add(job);
  }

  /** Resolves once the work started so far has ended (shutdown; tests that must know no more mail is coming). */
  async settled(): Promise<void> {
    await Promise.all([...this.running]);
  }

  async onApplicationShutdown(): Promise<void> {
    await this.settled();
  }
}
