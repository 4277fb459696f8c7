import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { EnvironmentVariables } from './env.validation';

/** Typed, read-only access to the validated environment. */
@Injectable()
export class AppConfig {
  constructor(private readonly config: ConfigService<EnvironmentVariables, true>) {}

  get<K extends keyof EnvironmentVariables>(key: K): EnvironmentVariables[K] {
    return this.config.get(key, { infer: true });
  }

  get isProduction(): boolean {
    return this.get('NODE_ENV') === 'production';
  }

  /** Cookies get the Secure flag when the app is served over HTTPS. */
  get secureCookies(): boolean {
    return this.get('APP_URL').startsWith('https:');
  }

  /** APP_URL without a trailing slash, for links in e-mails. */
  get appUrl(): string {
    return this.get('APP_URL').replace(/\/+$/, '');
  }
}
