import { DynamicModule, Global, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { AppConfig } from './app-config.service';
import { validateEnv } from './env.validation';

/**
 * @nestjs/config, validated at start-up. `overrides` win over process.env: tests use them to start an
 * app with, say, a wrong database port or low rate limits.
 */
@Global()
@Module({})
export class AppConfigModule {
  static forRoot(overrides: Record<string, string> = {}): DynamicModule {
    return {
      module: AppConfigModule,
      imports: [
        ConfigModule.forRoot({
          ignoreEnvFile: true,
          cache: true,
          validate: (env) => validateEnv({ ...env, ...overrides }),
        }),
      ],
      providers: [AppConfig],
      exports: [AppConfig],
    };
  }
}
