import { defineConfig } from 'vitest/config';

// The architecture check (`test/architecture/*.lint-spec.ts`): ESLint's import rules over backend/src. No database,
// but it parses every file, so it is its own suite rather than part of the fast unit specs.
export default defineConfig({
  test: {
    include: ['test/architecture/**/*.lint-spec.ts'],
    testTimeout: 60_000,
  },
});
