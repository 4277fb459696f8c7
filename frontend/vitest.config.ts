import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// Component tests: jsdom, Primer inlined because it imports its own .css files.
export default defineConfig({
  plugins: [react()],
  test: {
    environment: 'jsdom',
    setupFiles: ['./src/testing/setup.ts'],
    include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
    css: false,
    server: { deps: { inline: [/@primer\/react/] } },
    testTimeout: 15000,
  },
});
