import { ConsoleLogger } from '@nestjs/common';

/** Nest's start-up chatter: one line per module and per route (about a hundred), which buries the lines that matter. */
const STARTUP_CONTEXTS = new Set(['InstanceLoader', 'RoutesResolver', 'RouterExplorer']);

/**
 * Nest's console logger without the start-up chatter at the `log` level; warnings and errors from those
 * contexts still show, and LOG_STARTUP=verbose brings the chatter back.
 */
export class StartupQuietLogger extends ConsoleLogger {
  override log(message: unknown, context?: string): void;
  override log(message: unknown, ...rest: unknown[]): void {
    const context = rest[rest.length - 1];
    if (typeof context === 'string' && STARTUP_CONTEXTS.has(context) && process.env.LOG_STARTUP !== 'verbose') return;
    super.log(message, ...(rest as [string]));
  }
}
