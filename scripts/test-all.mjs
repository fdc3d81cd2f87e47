// `npm test`: builds the web app, runs every Vitest suite and every Playwright journey, and ends
// with one plain line `N passed, N failed` totalling both runners (the line CI reads).
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

fs.rmSync('.tmp/vitest.json', { force: true });
const unit = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=.tmp/vitest.json']);
const v = readJson('.tmp/vitest.json');
if (v) {
  passed += v.numPassedTests;
  failed += v.numFailedTests;
}
if (unit !== 0 && (!v || v.numFailedTests === 0)) broken = true;

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
