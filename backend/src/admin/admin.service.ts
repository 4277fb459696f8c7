import { EntityManager } from '@mikro-orm/mariadb';
import { HttpStatus, Injectable } from '@nestjs/common';
import type { AdminUpdateUserRequest, AdminUserView } from '@shoalbook/shared';
import { SessionsService } from '../auth/sessions.service';
import { ApiException, ErrorCode } from '../common/errors/api-errors';
import { User } from '../users/user.entity';

function toAdminView(u: User): AdminUserView {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    siteRole: u.siteRole,
    disabled: u.disabled,
    createdAt: u.createdAt.toISOString(),
  };
}

/** Account administration. Touches accounts only, never a crew's journal. */
@Injectable()
export class AdminService {
  constructor(
    private readonly em: EntityManager,
    private readonly sessions: SessionsService,
  ) {}

  /** Newest first; `q` matches part of the e-mail (stored case-folded) or of the display name. */
  async list(query: {
    q?: string;
    limit?: number;
    offset?: number;
  }): Promise<{ views: AdminUserView[]; total: number }> {
    const q = query.q?.trim() ?? '';
    // LIKE's own wildcards in the search text are searched for, not obeyed.
    const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    const where = q ? { $or: [{ email: { $like: pattern.toLowerCase() } }, { displayName: { $like: pattern } }] } : {};
    const [users, total] = await this.em.findAndCount(User, where, {
      orderBy: { createdAt: 'desc', id: 'desc' },
      limit: query.limit ?? 100,
      offset: query.offset ?? 0,
    });
    return { views: users.map(toAdminView), total };
  }

  async update(adminId: string, userId: string, changes: AdminUpdateUserRequest): Promise<AdminUserView> {
    if (userId === adminId && (changes.disabled === true || changes.siteRole === 'user')) {
      // Keeps the site from locking out its own admin by a slip.
      throw new ApiException(
        HttpStatus.CONFLICT,
        'You cannot disable your own account or remove your own admin role.',
        ErrorCode.selfLockout,
      );
    }
    return this.em.transactional(async (em) => {
      const user = await em.findOne(User, { id: userId });
      if (!user) throw new ApiException(HttpStatus.NOT_FOUND, 'No such account.', ErrorCode.notFound);
      if (changes.siteRole !== undefined) user.siteRole = changes.siteRole;
      if (changes.disabled !== undefined) user.disabled = changes.disabled;
      await em.flush();
      if (changes.disabled) await this.sessions.endAllFor(user.id, undefined, em);
      return toAdminView(user);
    });
  }
}
