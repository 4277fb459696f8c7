import {
  applyDecorators,
  type CanActivate,
  type ExecutionContext,
  HttpStatus,
  Injectable,
  UnauthorizedException,
  UseGuards,
} from '@nestjs/common';
import { ApiForbiddenResponse } from '@nestjs/swagger';
import type { Request } from 'express';
import { ApiErrorDto } from '../dto/api-error.dto';
import { ApiException, ErrorCode } from '../errors/api-errors';

/** Site administration (accounts). Being admin opens no crew: crew routes use CrewMemberGuard only. */
@Injectable()
export class SiteAdminGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const user = context.switchToHttp().getRequest<Request>().user;
    if (!user) throw new UnauthorizedException('Sign in first.');
    if (user.siteRole !== 'admin')
      throw new ApiException(HttpStatus.FORBIDDEN, 'Only site admins can do this.', ErrorCode.forbidden);
    return true;
  }
}

/** Restrict a controller or route to site admins. */
export const SiteAdminOnly = (): ClassDecorator & MethodDecorator =>
  applyDecorators(
    UseGuards(SiteAdminGuard),
    ApiForbiddenResponse({ type: ApiErrorDto, description: 'Not a site admin.' }),
  );
