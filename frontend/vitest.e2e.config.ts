import { defineConfig } from 'vitest/config';

// Browser tests: chromium drives the built app served by the real back end (see e2e/global-setup.ts).
export default defineConfig({
  test: {
    environment: 'node',
    include: ['e2e/**/*.e2e.test.ts'],
    globalSetup: ['./e2e/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 120000,
    hookTimeout: 180000,
  },
});
