import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { StartupQuietLogger } from './common/logging/startup-quiet.logger';
import { APP_OPTIONS, configureApp } from './configure-app';
import { AppConfig } from './config/app-config.service';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create(AppModule.forRoot(), { ...APP_OPTIONS, logger: new StartupQuietLogger() });
  configureApp(app);
  const config = app.get(AppConfig);
  await app.listen(config.get('PORT'), '127.0.0.1');
  new Logger('Shoalbook').log(
    `listening on ${config.appUrl} (API under ${config.appUrl}/api, docs at ${config.appUrl}/api/docs)`,
  );
}

bootstrap().catch((e: unknown) => {
  new Logger('Shoalbook').error(e instanceof Error ? e.message : String(e));
  process.exit(1);
});
