// `npm test`: builds the web app, runs every Vitest suite (the web app's component and service specs through `ng test web`)
// and every Playwright journey, and ends with one plain line `N passed, N failed` totalling them (the line CI reads).
import fs from 'node:fs';
import { spawnSync } from 'node:child_process';

fs.mkdirSync('.tmp', { recursive: true });
const run = (cmd, args, env = {}) => spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } }).status ?? 1;
const readJson = (file) => (fs.existsSync(file) ? JSON.parse(fs.readFileSync(file, 'utf8')) : undefined);

let passed = 0;
let failed = 0;
let broken = false;

const built = run('npm', ['run', 'build', '--silent']);
if (built !== 0) broken = true;

/** Runs a Vitest suite that writes its JSON report to `report`, and adds its counts. */
function vitestSuite(args, report) {
  fs.rmSync(report, { force: true });
  const status = run('npx', args);
  const v = readJson(report);
  if (v) {
    passed += v.numPassedTests;
    failed += v.numFailedTests;
  }
  if (status !== 0 && (!v || v.numFailedTests === 0)) broken = true;
}

vitestSuite(['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=.tmp/vitest.json'], '.tmp/vitest.json');
// The web app's component and service specs (*.component.spec.ts, *.service.spec.ts): Angular's unit-test builder compiles them, then Vitest runs them in jsdom.
vitestSuite(['ng', 'test', 'web', '--reporters=default', '--reporters=json', '--output-file=.tmp/vitest-components.json'], '.tmp/vitest-components.json');

if (built === 0) {
  fs.rmSync('.tmp/playwright.json', { force: true });
  const e2e = run('npx', ['playwright', 'test', '--reporter=list,json'], { PLAYWRIGHT_JSON_OUTPUT_NAME: '.tmp/playwright.json' });
  const p = readJson('.tmp/playwright.json');
  if (p) {
    passed += p.stats.expected + p.stats.flaky;
    failed += p.stats.unexpected;
  }
  if (e2e !== 0 && (!p || p.stats.unexpected === 0)) broken = true;
}

if (broken) failed += 1; // a runner that crashed or a build that failed counts as a failure
console.log(`\n${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
