import { defineConfig } from 'vitest/config';

// One Vitest run covers the packages, the server and the web app's pure functions
// (its pages and flows are covered by the Playwright journeys in e2e/).
export default defineConfig({
  test: {
    testTimeout: 30_000,
    hookTimeout: 60_000,
    projects: [
      {
        test: {
          name: 'engine+server',
          include: ['packages/*/src/**/*.spec.ts', 'apps/server/src/**/*.spec.ts', 'seeds/**/*.spec.ts', 'db/**/*.spec.ts'],
          environment: 'node',
          pool: 'forks',
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      'apps/web/vitest.config.ts',
    ],
  },
});
