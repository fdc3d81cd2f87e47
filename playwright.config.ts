import { defineConfig } from '@playwright/test';

const PORT = Number(process.env.E2E_PORT ?? 3210);

// Debian's Chromium (installed by .ci/run); Playwright downloads no browser here. The flags keep it
// from reaching out to the network, which is closed on these machines.
export const CHROMIUM_ARGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync',
];

export default defineConfig({
  testDir: 'e2e',
  outputDir: '.tmp/e2e-results',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  reporter: [['list']],
  use: {
    baseURL: `http://localhost:${PORT}`,
    browserName: 'chromium',
    launchOptions: { executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS },
    trace: 'retain-on-failure',
  },
  webServer: {
    // A fresh data directory each run, as a new user would have.
    command: `node e2e/helpers/serve-fresh.mjs`,
    env: { PORT: String(PORT), DATA_DIR: process.env.E2E_DATA_DIR ?? '.tmp/e2e-data', DEMO_DATA: 'true', NODE_ENV: 'test' },
    url: `http://localhost:${PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'pipe',
  },
});
