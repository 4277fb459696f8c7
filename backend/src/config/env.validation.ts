import { plainToInstance, Type } from 'class-transformer';
import {
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';

/** The variables the database scripts (migrate, seed) need; the server needs these and more. */
export class DatabaseEnv {
  @IsString() @IsNotEmpty() DB_HOST: string;
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) DB_PORT: number;
  @IsString() @IsNotEmpty() DB_NAME: string;
  @IsString() @IsNotEmpty() DB_USER: string;
  @IsString() DB_PASSWORD: string;
}

/** Every variable the server reads, validated once at start-up (see backend/.env.example). */
export class EnvironmentVariables extends DatabaseEnv {
  @IsIn(['development', 'production', 'test']) NODE_ENV: 'development' | 'production' | 'test';
  @Type(() => Number) @IsInt() @Min(0) @Max(65535) PORT: number;
  @IsUrl({ require_tld: false, protocols: ['http', 'https'], require_protocol: true }) APP_URL: string;
  /** Keys the CSRF tokens; at least 32 characters of randomness. */
  @IsString() @MinLength(32) SESSION_SECRET: string;
  @IsString() @IsNotEmpty() SMTP_HOST: string;
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) SMTP_PORT: number;
  @IsString() @IsNotEmpty() MAIL_FROM: string;
  @IsString() @IsNotEmpty() MAIL_OUTBOX_DIR: string;
  @IsString() @IsNotEmpty() UPLOAD_DIR: string;
  @IsOptional() @IsString() FRONTEND_DIST?: string;
  /** Requests per IP to each sign-in/sign-up/reset/invite route within THROTTLE_AUTH_TTL_SECONDS. */
  @Type(() => Number) @IsInt() @Min(1) THROTTLE_AUTH_LIMIT = 30;
  /** The same, counted per account e-mail (or per signed-in account for invites). */
  @Type(() => Number) @IsInt() @Min(1) THROTTLE_ACCOUNT_LIMIT = 10;
  @Type(() => Number) @IsInt() @Min(1) THROTTLE_AUTH_TTL_SECONDS = 60;
  /** Session lifetimes: ends after this many idle hours, and in any case after ABSOLUTE days. */
  @Type(() => Number) @IsInt() @Min(1) SESSION_IDLE_HOURS = 24 * 7;
  @Type(() => Number) @IsInt() @Min(1) SESSION_ABSOLUTE_DAYS = 30;
  /** How often expired sessions, reset tokens and invites are deleted (minutes; 0 = never). */
  @Type(() => Number) @IsInt() @Min(0) SESSION_CLEANUP_MINUTES = 60;
  /** "false" for a process that only appends journal events and never projects them (a write-only instance). */
  @IsIn(['true', 'false']) PROJECTOR_ENABLED: 'true' | 'false' = 'true';
  /** How long the projector waits for an uncommitted gap in the journal's ids before passing it (ms). */
  @Type(() => Number) @IsInt() @Min(0) PROJECTION_GAP_TIMEOUT_MS = 5000;
}

/**
 * Check `raw` against `schema`, listing every missing or invalid variable in one error so a person can
 * fix them all at once.
 */
export function validateEnvAs<T extends object>(schema: new () => T, raw: Record<string, unknown>): T {
  const known = Object.keys(new schema());
  const instance = plainToInstance(schema, raw, { enableImplicitConversion: false, exposeDefaultValues: true });
  const errors = validateSync(instance, { skipMissingProperties: false, forbidUnknownValues: false });
  if (errors.length > 0) {
    const lines = errors.map((e) => {
      const value = raw[e.property];
      const problem =
        value === undefined || value === ''
          ? 'is missing'
          : `is invalid (${Object.values(e.constraints ?? {}).join('; ')})`;
      return `  - ${e.property} ${problem}`;
    });
    throw new Error(`The server's environment is incomplete; see backend/.env.example:\n${lines.join('\n')}`);
  }
  // Keep only the declared variables, so the rest of process.env never leaks into the typed config.
  const picked = {} as Record<string, unknown>;
  for (const key of new Set([...known, ...Object.keys(instance)])) {
    if ((instance as Record<string, unknown>)[key] !== undefined)
      picked[key] = (instance as Record<string, unknown>)[key];
  }
  return Object.assign(new schema(), picked);
}

/** Validate the full server environment. */
export function validateEnv(raw: Record<string, unknown>): EnvironmentVariables {
  return validateEnvAs(EnvironmentVariables, raw);
}
