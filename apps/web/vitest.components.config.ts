import { defineConfig } from 'vitest/config';

// Merged by Angular's unit-test builder (`ng test web`, angular.json) into its own configuration:
// the builder compiles the component and service specs and initialises TestBed; this file only sets what it leaves open.
export default defineConfig({
  test: {
    environment: 'jsdom',
    // Generous: the machines running `npm test` are small and often busy; a spec that waits for the engine polls.
    testTimeout: 60_000,
  },
});
