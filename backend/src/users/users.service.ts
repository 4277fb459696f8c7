import { EntityManager } from '@mikro-orm/mariadb';
import { Injectable } from '@nestjs/common';
import type { MeResponse, UnitPreferences, UserView } from '@shoalbook/shared';
import { Membership } from '../crews/membership.entity';
import { canonicalEmail } from '../common/canonical-email';
import { User } from './user.entity';

export function toUserView(user: User): UserView {
  return { id: user.id, email: user.email, displayName: user.displayName, siteRole: user.siteRole, units: user.units };
}

/** Accounts: lookups and the caller's own view of themselves. */
@Injectable()
export class UsersService {
  constructor(private readonly em: EntityManager) {}

  findByEmail(email: string): Promise<User | null> {
    return this.em.findOne(User, { email: canonicalEmail(email) });
  }

  /** GET /auth/me: the account and its crews, oldest membership first. */
  async me(user: User): Promise<MeResponse> {
    const memberships = await this.em.find(
      Membership,
      { user: user.id },
      { populate: ['crew'], orderBy: { joinedAt: 'asc', id: 'asc' } },
    );
    return {
      user: toUserView(user),
      crews: memberships.map((m) => ({ crewId: m.crew.id, crewName: m.crew.name, role: m.role })),
    };
  }

  async updateProfile(user: User, changes: { displayName?: string; units?: Partial<UnitPreferences> }): Promise<User> {
    if (changes.displayName !== undefined) user.displayName = changes.displayName;
    if (changes.units) {
      const defined = Object.fromEntries(Object.entries(changes.units).filter(([, v]) => v !== undefined));
      user.units = { ...user.units, ...defined };
    }
    await this.em.flush();
    return user;
  }
}
