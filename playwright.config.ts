import { defineConfig, devices } from '@playwright/test';

const port = Number(process.env.E2E_PORT ?? 3100);

/**
 * End-to-end tests in Debian's Chromium (never `playwright install`). The web server is the
 * already-built app on a fresh database with the demo seed (tests/e2e/start-server.mjs).
 * Set E2E_EXTERNAL_SERVER=1 to run against a server you started yourself on E2E_PORT.
 */
export default defineConfig({
  testDir: 'tests/e2e',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  // A whole journey (sign in, book, walk several pages) on a shared 2-core CI machine: room enough
  // that a busy machine does not fail it, while a step that hangs still fails on its own expect.
  timeout: 60_000,
  expect: { timeout: 7_500 },
  reporter: process.env.CI ? [['list'], ['html', { open: 'never' }]] : 'list',
  use: {
    ...devices['Desktop Chrome'],
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1280, height: 800 },
    trace: 'retain-on-failure',
    // Each test is a fresh browser, so the service worker would precache the whole shell on every
    // first visit: load those tests do not check. The offline tablet test launches its own
    // Chromium with the worker on (tests/e2e/offline-helpers.ts).
    serviceWorkers: 'block',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    },
  },
  webServer: process.env.E2E_EXTERNAL_SERVER
    ? undefined
    : {
        command: 'node tests/e2e/start-server.mjs',
        url: `http://127.0.0.1:${port}/api/health`,
        reuseExistingServer: false,
        timeout: 120_000,
        stdout: 'pipe',
        stderr: 'pipe',
      },
});
