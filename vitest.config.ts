import { defineConfig } from 'vitest/config';

// One Vitest run covers the packages and the server; the Angular app is covered by e2e.
export default defineConfig({
  test: {
    include: ['packages/*/src/**/*.spec.ts', 'apps/server/src/**/*.spec.ts', 'seeds/**/*.spec.ts', 'db/**/*.spec.ts'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
