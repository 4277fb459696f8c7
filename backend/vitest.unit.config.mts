import { defineConfig } from 'vitest/config';

// The back end's unit specs (`src/**/*.spec.ts`): pure code, no database, no mail; files run in parallel.
export default defineConfig({
  test: {
    include: ['src/**/*.spec.ts'],
    testTimeout: 30_000,
  },
});
