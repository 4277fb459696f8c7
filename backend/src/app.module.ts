import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { MariaDbDriver } from '@mikro-orm/mariadb';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { type DynamicModule, Module } from '@nestjs/common';
import { CqrsModule } from '@nestjs/cqrs';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerModule } from '@nestjs/throttler';
import { AdminModule } from './admin/admin.module';
import { AuthModule } from './auth/auth.module';
import { authThrottlerOptions } from './common/throttling/auth-throttling';
import { AppConfigModule } from './config/app-config.module';
import { AppConfig } from './config/app-config.service';
import { CrewsModule } from './crews/crews.module';
import { setStaticCacheHeaders } from './common/static-cache';
import { buildOrmConfig } from './database/mikro-orm.config';
import { DevOutboxModule } from './dev-outbox/dev-outbox.module';
import { HealthModule } from './health/health.module';
import { IdempotencyModule } from './idempotency/idempotency.module';
import { LakesModule } from './lakes/lakes.module';
import { EventsModule } from './events/events.module';
import { FindsModule } from './finds/finds.module';
import { CatchesModule } from './catches/catches.module';
import { StopsModule } from './stops/stops.module';
import { WeighInsModule } from './weigh-ins/weigh-ins.module';
import { PhotosModule } from './photos/photos.module';
import { SkyModule } from './sky/sky.module';
import { ExportsModule } from './exports/exports.module';
import { MailModule } from './mail/mail.module';
import { UsersModule } from './users/users.module';
import { ProjectionsModule } from './projections/projections.module';
import { ReportsModule } from './reports/reports.module';

/**
 * The whole server. `overrides` replace environment variables for this instance only (tests start
 * apps with a wrong DB port, low rate limits or NODE_ENV=production this way).
 */
@Module({})
export class AppModule {
  static forRoot(overrides: Record<string, string> = {}): DynamicModule {
    // Which modules exist depends on the environment, so read it before Nest validates it.
    const raw = { ...process.env, ...overrides };
    const frontendDist = raw.FRONTEND_DIST;
    const serveFrontend = !!frontendDist && existsSync(join(frontendDist, 'index.html'));
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(overrides),
        MikroOrmModule.forRootAsync({
          driver: MariaDbDriver,
          inject: [AppConfig],
          useFactory: (config: AppConfig) => ({ ...buildOrmConfig(configToDb(config)), driver: MariaDbDriver }),
        }),
        CqrsModule.forRoot(),
        ThrottlerModule.forRootAsync({ inject: [AppConfig], useFactory: authThrottlerOptions }),
        MailModule,
        HealthModule,
        UsersModule,
        AuthModule,
        CrewsModule,
        AdminModule,
        LakesModule,
        EventsModule,
        FindsModule,
        CatchesModule,
        StopsModule,
        WeighInsModule,
        PhotosModule,
        SkyModule,
        ExportsModule,
        IdempotencyModule,
        ProjectionsModule,
        ReportsModule,
        // It holds reset and invite links: mounted only in development (npm start), and only for a site admin.
        ...(raw.NODE_ENV === 'development' ? [DevOutboxModule] : []),
        ...(serveFrontend
          ? [
              ServeStaticModule.forRoot({
                rootPath: frontendDist!,
                exclude: ['/api/{*path}'],
                serveStaticOptions: { setHeaders: setStaticCacheHeaders },
              }),
            ]
          : []),
      ],
    };
  }
}

function configToDb(config: AppConfig) {
  return {
    DB_HOST: config.get('DB_HOST'),
    DB_PORT: config.get('DB_PORT'),
    DB_NAME: config.get('DB_NAME'),
    DB_USER: config.get('DB_USER'),
    DB_PASSWORD: config.get('DB_PASSWORD'),
  };
}
