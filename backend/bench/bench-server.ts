// The benchmark server: the real app plus BenchModule's comparison routes.
import 'reflect-metadata';
import { Logger, Module } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { AppModule } from '../src/app.module';
import { APP_OPTIONS, configureApp } from '../src/configure-app';
import { BenchModule } from './bench.module';

@Module({ imports: [AppModule.forRoot(), BenchModule] })
class BenchAppModule {}

async function main(): Promise<void> {
  const app = await NestFactory.create(BenchAppModule, { ...APP_OPTIONS, logger: ['error', 'warn'] });
  configureApp(app);
  await app.listen(Number(process.env.PORT), '127.0.0.1');
}

main().catch((e: unknown) => {
  new Logger('bench').error(e instanceof Error ? e.message : String(e));
  process.exit(1);
});
