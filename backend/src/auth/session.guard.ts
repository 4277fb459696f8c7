import { type CanActivate, type ExecutionContext, HttpStatus, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { IS_PUBLIC_KEY } from '../common/decorators/public.decorator';
import { ApiException, ErrorCode } from '../common/errors/api-errors';
import { SessionsService } from './sessions.service';

/** Global guard: loads the session from the cookie; refuses anonymous callers unless the route is @Public(). */
@Injectable()
export class SessionGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly sessions: SessionsService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    if (context.getType() !== 'http') return true;
    const req = context.switchToHttp().getRequest<Request>();
    const token = req.cookies?.[this.sessions.cookieName] as string | undefined;
    const session = token ? await this.sessions.resolve(token) : null;
    if (session) {
      req.authSession = session;
      req.user = session.user;
    }
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!session && !isPublic)
      throw new ApiException(HttpStatus.UNAUTHORIZED, 'Sign in first.', ErrorCode.unauthenticated);
    return true;
  }
}
