import { applyDecorators, type ExecutionContext, Injectable, UseGuards } from '@nestjs/common';
import { ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { ThrottlerGuard, type ThrottlerLimitDetail, type ThrottlerModuleOptions } from '@nestjs/throttler';
import type { Response } from 'express';
import type { Request } from 'express';
import type { AppConfig } from '../../config/app-config.service';
import { canonicalEmail } from '../canonical-email';
import { ApiErrorDto } from '../dto/api-error.dto';

/** Which account a request concerns: the e-mail in the body, else the signed-in account. */
export function accountKey(req: Request): string | null {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  if (typeof email === 'string' && email.trim()) return `email:${canonicalEmail(email)}`;
  return req.user ? `user:${req.user.id}` : null;
}

/** Two counters per guarded route: one per client address, one per account (limits from the env). */
export function authThrottlerOptions(config: AppConfig): ThrottlerModuleOptions {
  const ttl = config.get('THROTTLE_AUTH_TTL_SECONDS') * 1000;
  return {
    errorMessage: 'Too many attempts. Wait a minute, then try again.',
    throttlers: [
      { name: 'per-ip', ttl, limit: config.get('THROTTLE_AUTH_LIMIT') },
      {
        name: 'per-account',
        ttl,
        limit: config.get('THROTTLE_ACCOUNT_LIMIT'),
        getTracker: (req) => accountKey(req as Request) ?? 'none',
        skipIf: (ctx: ExecutionContext) => accountKey(ctx.switchToHttp().getRequest<Request>()) === null,
      },
    ],
  };
}

/**
 * The throttler names its header per counter (Retry-After-per-account); clients read the plain
 * Retry-After (RFC 9110 section 10.2.3: seconds to wait), so the 429 carries that too.
 */
@Injectable()
export class AuthThrottlerGuard extends ThrottlerGuard {
  protected override async throwThrottlingException(context: ExecutionContext, detail: ThrottlerLimitDetail) {
    context
      .switchToHttp()
      .getResponse<Response>()
      .setHeader('Retry-After', String(Math.max(1, detail.timeToBlockExpire)));
    await super.throwThrottlingException(context, detail);
  }
}

/** Rate-limit a sign-in, sign-up, reset or invite route (429 when over the limit). */
export const AuthThrottle = (): MethodDecorator & ClassDecorator =>
  applyDecorators(
    UseGuards(AuthThrottlerGuard),
    ApiTooManyRequestsResponse({ type: ApiErrorDto, description: 'Too many attempts.' }),
  );
