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
    // The SQLite → PostgreSQL copy needs a server: it runs in the PostgreSQL pass (scripts/test-postgres.sh).
    exclude: ['tests/e2e/**', 'node_modules/**', ...(process.env.RIMSCALE_TEST_DATABASE_URL ? [] : ['tests/db/copy-database.test.ts'])],
    environment: 'node',
    // The AWS SDK warns on every run that its 2027 releases will need Node 22; said once in README.
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' },
    pool: 'forks',
    // PDFs render in worker threads that load build/pdf-worker.mjs (app/lib/pdf-pool.ts).
    globalSetup: ['tests/support/build-pdf-worker.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
