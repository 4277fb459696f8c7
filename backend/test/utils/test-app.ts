import { type EntityManager, MikroORM } from '@mikro-orm/mariadb';
import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { AppModule } from '../../src/app.module';
import { APP_OPTIONS, configureApp } from '../../src/configure-app';

/**
 * The real app (real MariaDB, real SMTP to the fake server) listening on a free loopback port.
 * `overrides` replace environment variables for this app only.
 */
export async function createTestApp(overrides: Record<string, string> = {}): Promise<INestApplication> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule.forRoot(overrides)] }).compile();
  const app = moduleRef.createNestApplication(APP_OPTIONS);
  app.useLogger(['error', 'warn']);
  configureApp(app);
  await app.listen(0, '127.0.0.1');
  return app;
}

/** A fresh EntityManager for direct reads and set-up writes in tests. */
export function testEm(app: INestApplication): EntityManager {
  return app.get(MikroORM).em.fork() as EntityManager;
}
