import { defineConfig } from '@playwright/test';

// Started by scripts/test-e2e.sh, which builds the app, prepares a temporary
// database and picks a free port. Debian's Chromium only: no browser is downloaded.
const baseURL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';
const port = new URL(baseURL).port;

export default defineConfig({
  testDir: 'tests/e2e',
  timeout: 60_000,
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list']],
  use: {
    baseURL,
    acceptDownloads: true,
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      // Playwright gives each launch a fresh, empty user-data directory of its own.
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  webServer: [
    {
      // The production server script (socket addresses for the rate limits), as `npm start` runs it.
      command: `HOST=127.0.0.1 PORT=${port} node scripts/server.mjs`,
      url: `${baseURL}/api/health`,
      reuseExistingServer: false,
      timeout: 60_000,
      stdout: 'ignore',
      stderr: 'pipe',
    },
    // The local SMTP fake (ports and data file exported by scripts/test-e2e.sh).
    ...(process.env.MAIL_FAKE_URL
      ? [
          {
            command: 'npx tsx scripts/mail-fake.ts',
            url: `${process.env.MAIL_FAKE_URL}/health`,
            reuseExistingServer: false,
            timeout: 30_000,
            stdout: 'ignore' as const,
            stderr: 'pipe' as const,
          },
        ]
      : []),
  ],
});
