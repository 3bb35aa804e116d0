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
    // The AWS SDK warns on every run that its 2027 releases will need Node 22; said once in README.
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' },
    pool: 'forks',
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
