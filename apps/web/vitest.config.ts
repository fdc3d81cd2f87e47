import { fileURLToPath } from 'node:url';
import { configDefaults, defineConfig } from 'vitest/config';

// Pure functions of the web app (no TestBed, no DOM); pages and flows are covered by e2e/.
export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  test: {
    include: ['src/**/*.spec.ts'],
    // Component specs (*.component.spec.ts) need the Angular compiler: `ng test web` runs them (angular.json).
    exclude: [...configDefaults.exclude, 'src/**/*.component.spec.ts'],
    environment: 'node',
    setupFiles: ['src/test-setup.ts'],
  },
});
