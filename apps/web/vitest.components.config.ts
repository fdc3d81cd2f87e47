import { defineConfig } from 'vitest/config';

// Merged by Angular's unit-test builder (`ng test web`, angular.json) into its own configuration:
// the builder compiles the components and initialises TestBed; this file only sets what it leaves open.
export default defineConfig({
  test: {
    environment: 'jsdom',
    testTimeout: 20_000,
  },
});
