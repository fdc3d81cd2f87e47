import { fileURLToPath } from 'node:url';
import { configDefaults, defineConfig } from 'vitest/config';

// Pure functions of the web app (no TestBed, no DOM); pages and flows are covered by e2e/.
export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  test: {
    include: ['src/**/*.spec.ts'],
    // Component and service specs (*.component.spec.ts, *.service.spec.ts) need the Angular compiler
    // (templates, decorators): `ng test web` runs them (angular.json).
    exclude: [...configDefaults.exclude, 'src/**/*.component.spec.ts', 'src/**/*.service.spec.ts'],
    environment: 'node',
    setupFiles: ['src/test-setup.ts'],
  },
});
