import type { EntityManager } from '@mikro-orm/mariadb';
import { LockMode } from '@mikro-orm/core';
import { HttpStatus } from '@nestjs/common';
import { ApiException, ErrorCode } from '../../common/errors/api-errors';
import { Membership } from '../membership.entity';

/**
 * Inside a transaction: refuse a change that would leave the crew without an owner. The owners' rows
 * are locked, so two owners demoting each other at once cannot both succeed.
 */
export async function assertOwnersRemain(
  em: EntityManager,
  crewId: string,
  target: Membership,
  newRole: Membership['role'] | null,
): Promise<void> {
  if (target.role !== 'owner' || newRole === 'owner') return;
  const owners = await em.find(Membership, { crew: crewId, role: 'owner' }, { lockMode: LockMode.PESSIMISTIC_WRITE });
  if (owners.length <= 1) {
    const message =
      newRole === null
        ? 'The last owner cannot leave the crew. Make another member an owner first.'
        : 'The last owner cannot step down. Make another member an owner first.';
    throw new ApiException(HttpStatus.CONFLICT, message, ErrorCode.lastOwner);
  }
}

/** The membership of `userId` in `crewId`, or a 404 (scoped by crew in the query itself). */
export async function memberOr404(
  em: EntityManager,
  crewId: string,
  userId: string,
  lock = false,
): Promise<Membership> {
  const m = await em.findOne(
    Membership,
    { crew: crewId, user: userId },
    { populate: ['user'], ...(lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {}) },
  );
  if (!m) throw new ApiException(HttpStatus.NOT_FOUND, 'This person is not a member of the crew.', ErrorCode.notFound);
  return m;
}
