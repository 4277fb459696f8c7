import type { EntityManager } from '@mikro-orm/core';
import { Seeder } from '@mikro-orm/seeder';
import { Crew } from '../../crews/crew.entity';
import { Membership } from '../../crews/membership.entity';
import { User } from '../../users/user.entity';
import { hashPassword } from '../../users/passwords/password-hasher';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';
import type { DemoSeedContext } from './demo-seed-context';

/** The demo accounts and their two crews. Fills `context` for the seeders that run after it. */
export class DemoAccountsSeeder extends Seeder {
  async run(em: EntityManager, context: DemoSeedContext): Promise<void> {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    context.users ??= {};
    context.crews ??= {};
    for (const account of DEMO_ACCOUNTS) {
      const user = em.create(User, {
        email: account.email,
        displayName: account.displayName,
        passwordHash,
        siteRole: account.siteRole,
      });
      context.users[account.email] = user;
      if (!account.crew) continue;
      const crew = (context.crews[account.crew.name] ??= em.create(Crew, { name: account.crew.name }));
      em.create(Membership, { crew, user, role: account.crew.role });
    }
    await em.flush();
  }
}
