import { defineConfig } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 3100);
export const BASE_URL = `http://127.0.0.1:${PORT}`;

// Debian's Chromium (Playwright cannot download its own browser here), one worker on 2 cores,
// against the production server of `next build`.
export default defineConfig({
  testDir: 'tests/e2e',
  workers: 1,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  retries: 0,
  use: {
    baseURL: BASE_URL,
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
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
    trace: 'off',
  },
  webServer: {
    command: `node_modules/.bin/next start -p ${PORT} -H 127.0.0.1`,
    url: `${BASE_URL}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      DATABASE_URL: process.env.DATABASE_URL ?? '',
      NEXTAUTH_URL: BASE_URL,
      // `next start` is NODE_ENV=production: without both secrets (32+ characters) it refuses to start.
      NEXTAUTH_SECRET: 'setline-e2e-session-secret-0123456789abcdef',
      REPORT_LINK_SECRET: 'setline-e2e-report-link-secret-0123456789ab',
      // The local mail fake has no usable certificate.
      SMTP_TLS: 'off',
    },
  },
});
