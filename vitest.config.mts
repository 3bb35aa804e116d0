import path from 'node:path';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: {
    alias: {
      '@': path.resolve(import.meta.dirname),
      // `server-only` throws outside React's server build; tests run server modules directly.
      'server-only': path.resolve(import.meta.dirname, 'tests/support/empty-module.ts'),
    },
  },
  test: {
    include: ['tests/**/*.test.{ts,tsx}'],
    exclude: ['tests/e2e/**', 'node_modules/**'],
    environment: 'node',
    pool: 'forks',
    // PDFs render in worker threads that load build/pdf-worker.mjs (app/lib/pdf-pool.ts).
    globalSetup: ['tests/support/build-pdf-worker.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
