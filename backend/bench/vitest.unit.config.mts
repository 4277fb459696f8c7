import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// The read-model unit specs alone, without the e2e global setup (which recreates a test database): handy while
// other suites share the test databases. `npx vitest run --config bench/vitest.unit.config.mts` from backend/.
export default defineConfig({
  root: fileURLToPath(new URL('..', import.meta.url)),
  test: { include: ['src/projections/**/*.spec.ts', 'src/reports/**/*.spec.ts'], testTimeout: 60_000 },
});
