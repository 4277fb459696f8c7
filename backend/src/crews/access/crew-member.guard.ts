import { EntityManager } from '@mikro-orm/mariadb';
import { type CanActivate, type ExecutionContext, HttpStatus, Injectable, UnauthorizedException } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { roleAtLeast } from '@shoalbook/shared';
import { Membership } from '../membership.entity';
import { CREW_ACCESS_KEY, type CrewAccessRule } from './crew-access-rule';
import { ApiException, ErrorCode } from '../../common/errors/api-errors';

const READ_METHODS = new Set(['GET', 'HEAD']);
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** 404 whether the crew is missing or merely not the caller's: an outsider learns nothing. */
export function crewNotFound(): ApiException {
  return new ApiException(HttpStatus.NOT_FOUND, 'No such crew.', ErrorCode.notFound);
}

/**
 * The one place that decides crew membership. Loads the caller's membership for `:crewId` into
 * `req.crewAccess`; handlers never check membership themselves.
 */
@Injectable()
export class CrewMemberGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly em: EntityManager,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const req = context.switchToHttp().getRequest<Request>();
    const user = req.user;
    if (!user) throw new UnauthorizedException('Sign in first.');
    const crewId = req.params.crewId;
    if (typeof crewId !== 'string' || !UUID.test(crewId)) throw crewNotFound();
    const membership = await this.em.findOne(Membership, { crew: crewId, user: user.id }, { populate: ['crew'] });
    if (!membership) throw crewNotFound();

    const rule = this.reflector.getAllAndOverride<CrewAccessRule | undefined>(CREW_ACCESS_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    const needed = rule?.role ?? (READ_METHODS.has(req.method) ? 'viewer' : 'angler');
    const actingOnSelf = rule?.orSelf !== undefined && req.params[rule.orSelf] === user.id;
    if (!roleAtLeast(membership.role, needed) && !actingOnSelf) {
      const message =
        membership.role === 'viewer' && needed !== 'owner'
          ? 'Viewers can read this crew’s journal but not change it.'
          : 'Only an owner of this crew can do this.';
      throw new ApiException(HttpStatus.FORBIDDEN, message, ErrorCode.forbidden);
    }
    req.crewAccess = { crewId: membership.crew.id, crew: membership.crew, role: membership.role, userId: user.id };
    return true;
  }
}
