import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import { DemoAccountsSeeder } from './demo-accounts.seeder';
import { JournalDemoSeeder } from './journal-demo.seeder';
import type { DemoSeedContext } from './demo-seed-context';

/**
 * The demo data, in order. Add the journal's seeder (fed by `@shoalbook/fixtures`) after the accounts;
 * it receives the same context with the created users and crews.
 */
export class DatabaseSeeder extends Seeder {
  async run(em: EntityManager): Promise<void> {
    const context: DemoSeedContext = { users: {}, crews: {} };
    await this.call(em, [DemoAccountsSeeder, JournalDemoSeeder], context);
  }
}
