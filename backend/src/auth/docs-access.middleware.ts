import { MikroORM, RequestContext } from '@mikro-orm/mariadb';
import { ForbiddenException, type INestApplication, UnauthorizedException } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { SessionsService } from './sessions.service';
import { AppConfig } from '../config/app-config.service';
import { ErrorCode } from '../common/errors/api-errors';
import { sendApiError } from '../common/filters/api-exception.filter';

/**
 * The API docs (Swagger UI and the OpenAPI JSON) are open in the development and test profiles; in production
 * only a signed-in site admin reads them (OWASP ASVS 4.0.3 14.3.2: no debug or documentation surface open to
 * everyone in production). Swagger is mounted on Express directly, so Nest's guards never see these paths.
 */
export function docsAccessMiddleware(app: INestApplication) {
  const config = app.get(AppConfig);
  const sessions = app.get(SessionsService);
  const orm = app.get(MikroORM);
  return (req: Request, res: Response, next: NextFunction): void => {
    if (config.get('NODE_ENV') !== 'production') return next();
    RequestContext.create(orm.em, async () => {
      try {
        const token = req.cookies?.[sessions.cookieName] as string | undefined;
        const session = token ? await sessions.resolve(token) : null;
        if (!session)
          return sendApiError(
            req,
            res,
            new UnauthorizedException({ message: 'Sign in first.', code: ErrorCode.unauthenticated }),
          );
        if (session.user.siteRole !== 'admin')
          return sendApiError(
            req,
            res,
            new ForbiddenException({ message: 'Only site admins can read the API docs.', code: ErrorCode.forbidden }),
          );
        next();
      } catch (e) {
        next(e);
      }
    });
  };
}
