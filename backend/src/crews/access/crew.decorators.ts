import {
  applyDecorators,
  createParamDecorator,
  type ExecutionContext,
  InternalServerErrorException,
  SetMetadata,
  UseGuards,
} from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse, ApiParam } from '@nestjs/swagger';
import type { Request } from 'express';
import type { CrewRole } from '@shoalbook/shared';
import { ApiErrorDto } from '../../common/dto/api-error.dto';
import { CrewMemberGuard } from './crew-member.guard';
import type { CrewAccess } from './request-context';
import { CREW_ACCESS_KEY, type CrewAccessRule } from './crew-access-rule';

export { CREW_ACCESS_KEY, type CrewAccessRule };

/**
 * Put on every controller whose routes live under `/crews/:crewId/...`: the guard loads the caller's
 * membership (404 for non-members and unknown crews) and, unless @CrewRoles says otherwise, lets any
 * member read (GET/HEAD) and only owners and anglers write (viewers get 403).
 */
export function CrewRoute(): ClassDecorator & MethodDecorator {
  return applyDecorators(
    UseGuards(CrewMemberGuard),
    ApiParam({ name: 'crewId', format: 'uuid', description: 'The crew; 404 unless the caller is a member.' }),
    ApiNotFoundResponse({ type: ApiErrorDto, description: 'No such crew, or the caller is not a member.' }),
    ApiForbiddenResponse({ type: ApiErrorDto, description: 'The caller’s role in the crew does not allow this.' }),
  );
}

/** The least crew role a route needs, overriding the read/write default of @CrewRoute. */
export function CrewRoles(
  role: CrewRole,
  options: Omit<CrewAccessRule, 'role'> = {},
): ClassDecorator & MethodDecorator {
  return SetMetadata(CREW_ACCESS_KEY, { role, ...options } satisfies CrewAccessRule);
}

/** The caller's membership of the route's crew; scope every query by `access.crewId`. */
export const CurrentCrew = createParamDecorator((_data: unknown, ctx: ExecutionContext): CrewAccess => {
  const access = ctx.switchToHttp().getRequest<Request>().crewAccess;
  if (!access) throw new InternalServerErrorException('CurrentCrew used on a route without @CrewRoute()');
  return access;
});
