import type { INestApplication, NestApplicationOptions } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { CSRF_HEADER } from '@shoalbook/shared';
import { SESSION_COOKIE } from './common/session-cookie';
import { CsrfService } from './common/csrf/csrf.service';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { jsonBodyMiddleware } from './common/middleware/json-body.middleware';
import { docsAccessMiddleware } from './auth/docs-access.middleware';
import { noStoreMiddleware } from './common/middleware/no-store.middleware';
import { requestIdMiddleware } from './common/middleware/request-id.middleware';
import { ApiValidationPipe } from './common/pipes/api-validation.pipe';
import { AppConfig } from './config/app-config.service';

/** Create the app with these options (our own JSON parser sets the body limit and the error wording). */
export const APP_OPTIONS: NestApplicationOptions = { bodyParser: false };

export const API_PREFIX = 'api';

/**
 * Everything main.ts and the tests share: security headers, cookies, body parsing, CSRF, validation,
 * the error filter and the OpenAPI document. Call before `app.init()` / `app.listen()`.
 */
export function configureApp(app: INestApplication): INestApplication {
  const config = app.get(AppConfig);
  const https = config.secureCookies;
  app.use(requestIdMiddleware);
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Primer's components set inline style attributes; scripts stay strictly 'self'.
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
          ...(https ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      strictTransportSecurity: https,
    }),
  );
  app.use(cookieParser());
  app.use(`/${API_PREFIX}`, noStoreMiddleware);
  app.use(`/${API_PREFIX}`, jsonBodyMiddleware());
  app.use(`/${API_PREFIX}`, app.get(CsrfService).middleware);
  app.setGlobalPrefix(API_PREFIX);
  app.useGlobalPipes(new ApiValidationPipe());
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Shoalbook API')
      .setDescription(
        `The crew journal's API. Sign in to get the ${SESSION_COOKIE} cookie (__Host-${SESSION_COOKIE} over HTTPS); fetch GET /api/auth/csrf and send its token in the ${CSRF_HEADER} header of every POST, PUT, PATCH and DELETE. Every error has the ApiError shape.`,
      )
      .setVersion('0.1.0')
      .addCookieAuth(SESSION_COOKIE)
      .addApiKey({ type: 'apiKey', in: 'header', name: CSRF_HEADER }, 'csrf')
      .build(),
    { operationIdFactory: (controller, method) => `${controller.replace(/Controller$/, '')}_${method}` },
  );
  app.use([`/${API_PREFIX}/docs`, `/${API_PREFIX}/docs-json`], docsAccessMiddleware(app));
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, {
    jsonDocumentUrl: `${API_PREFIX}/docs-json`,
    raw: ['json'],
  });
  return app;
}
