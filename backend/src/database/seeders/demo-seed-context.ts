import type { Crew } from '../../crews/crew.entity';
import type { User } from '../../users/user.entity';

/**
 * What one seeder hands to the next: a journal seeder (e.g. from `@shoalbook/fixtures`) finds the demo
 * crews by name and the accounts by e-mail here.
 */
export interface DemoSeedContext extends Record<string, unknown> {
  users: Record<string, User>;
  crews: Record<string, Crew>;
}
