import { defineConfig, devices } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 3100);
const baseURL = `http://127.0.0.1:${PORT}`;
const dbDir = `tmp/e2e-${PORT}`;

export default defineConfig({
  testDir: './tests/e2e',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  retries: 0,
  workers: 1,
  reporter: [['list']],
  outputDir: 'test-results',
  use: { baseURL, trace: 'off', screenshot: 'only-on-failure' },
  projects: [
    {
      name: 'debian-chromium',
      use: {
        ...devices['Desktop Chrome'],
        // Debian's chromium package; never a browser downloaded by a test tool.
        launchOptions: {
          executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
          args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
        },
      },
    },
  ],
  // The exported web build (dist/) and the API from the Express server, on a fresh database with the demo data.
  webServer: {
    command: `rm -rf ${dbDir} && exec node_modules/.bin/tsx server/index.ts`,
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      PORT: String(PORT),
      HOST: '127.0.0.1',
      APP_URL: baseURL,
      DATABASE_URL: `${dbDir}/e2e.db`,
      LOG_LEVEL: 'error',
      SIGNIN_RATE_MAX: '1000',
      // Browser tests make their own plans; the demo's seeded plans would change what they count.
      SEED_DEMO_PLANS: '0',
    },
  },
});
