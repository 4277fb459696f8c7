// Where each run profile keeps its data and which loopback ports it uses.
// "demo" is what `npm start` runs; "test" is what `npm test` runs: separate servers, never shared.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

const DEFAULTS = {
  demo: { dbPort: 3317, port: 3000, smtpPort: 2525, dbName: 'shoalbook' },
  test: { dbPort: 3318, port: 3100, smtpPort: 2526, dbName: 'shoalbook_test' },
  bench: { dbPort: 3319, port: 3200, smtpPort: 2527, dbName: 'shoalbook_bench' },
  // Extra test profiles, so two engineers can run test suites side by side (SHOALBOOK_TEST_PROFILE=test2).
  test2: { dbPort: 3320, port: 3101, smtpPort: 2528, dbName: 'shoalbook_test2' },
  test3: { dbPort: 3321, port: 3102, smtpPort: 2529, dbName: 'shoalbook_test3' },
  test4: { dbPort: 3322, port: 3103, smtpPort: 2530, dbName: 'shoalbook_test4' },
  test5: { dbPort: 3323, port: 3104, smtpPort: 2531, dbName: 'shoalbook_test5' },
  test6: { dbPort: 3324, port: 3105, smtpPort: 2532, dbName: 'shoalbook_test6' },
};

// "<test profile>-start" (e.g. test3-start): where the `npm start` test runs scripts/start.mjs
// (SHOALBOOK_START_PROFILE), beside the test profile's own servers: its ports + 1000, its own data.
const startCheck = (base) =>
  base && {
    dbPort: base.dbPort + 1000,
    port: base.port + 1000,
    smtpPort: base.smtpPort + 1000,
    dbName: `${base.dbName}_start`,
  };

/** Resolve a profile; the demo profile honours PORT and DB_PORT from the environment. */
export function profile(requested) {
  const name = requested === 'test' ? process.env.SHOALBOOK_TEST_PROFILE || 'test' : requested;
  const d =
    name.endsWith('-start') && name.startsWith('test') ? startCheck(DEFAULTS[name.slice(0, -6)]) : DEFAULTS[name];
  if (!d) throw new Error(`unknown profile ${name}`);
  const dataDir = join(ROOT, '.data', name);
  const fromEnv = name === 'demo';
  const p = {
    name,
    dataDir,
    dbDir: join(dataDir, 'mariadb'),
    runDir: join(dataDir, 'run'),
    outboxDir: join(dataDir, 'outbox'),
    uploadDir: join(dataDir, 'uploads'),
    dbPort: Number((fromEnv && process.env.DB_PORT) || d.dbPort),
    port: Number((fromEnv && process.env.PORT) || d.port),
    smtpPort: Number((fromEnv && process.env.SMTP_PORT) || d.smtpPort),
    dbName: d.dbName,
    dbUser: `shoalbook_${name}`,
  };
  mkdirSync(p.runDir, { recursive: true });
  p.secrets = loadSecrets(p);
  return p;
}

/** Secrets are generated once per profile and kept in the git-ignored data folder. */
function loadSecrets(p) {
  const file = join(p.dataDir, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8'));
  const secrets = {
    dbPassword: randomBytes(18).toString('base64url'),
    sessionSecret: randomBytes(32).toString('base64url'),
  };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}

/** The environment the back end reads (validated at its start-up). */
export function backendEnv(p, extra = {}) {
  return {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV === 'production' ? 'production' : 'development',
    PORT: String(p.port),
    APP_URL: `http://127.0.0.1:${p.port}`,
    DB_HOST: '127.0.0.1',
    DB_PORT: String(p.dbPort),
    DB_NAME: p.dbName,
    DB_USER: p.dbUser,
    DB_PASSWORD: p.secrets.dbPassword,
    SESSION_SECRET: p.secrets.sessionSecret,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(p.smtpPort),
    MAIL_FROM: 'Shoalbook <no-reply@shoalbook.test>',
    MAIL_OUTBOX_DIR: p.outboxDir,
    UPLOAD_DIR: p.uploadDir,
    FRONTEND_DIST: join(ROOT, 'frontend', 'dist'),
    ...extra,
  };
}
