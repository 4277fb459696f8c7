import { defineConfig } from 'vitest/config';

// The back end's database tests (`test/**/*.e2e-spec.ts`) run against the test profile's real MariaDB and
// fake SMTP (never the demo ones). The unit specs beside the code have their own config (vitest.unit.config.mts).
const { profile, backendEnv } = await import('../scripts/lib/profile.mjs');

export default defineConfig({
  test: {
    include: ['test/**/*.e2e-spec.ts'],
    globalSetup: ['test/global-setup.mts'],
    // The suites share one database; run files one at a time.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: backendEnv(profile('test'), {
      NODE_ENV: 'test',
      // High limits so ordinary tests never trip the throttler; the rate-limit test sets low ones.
      THROTTLE_AUTH_LIMIT: '10000',
      THROTTLE_ACCOUNT_LIMIT: '10000',
    }),
  },
});
