/**
 * First-load benchmark in a real browser (Debian Chromium through Playwright) against the built app
 * served by the real server on a new data directory with the demo data.
 *
 * For home, Explore and the studio, cold loads (a new browser context each run, cache disabled) report:
 * - bytes by resource type as the browser received them (Resource Timing: transferSize is what came
 *   over the wire, headers included; encodedBodySize the body as sent, compressed or not;
 *   decodedBodySize the body after decoding). Equal encoded and decoded sizes mean nothing was
 *   compressed on the wire.
 * - first and largest contentful paint (Chromium's paint and largest-contentful-paint entries),
 * - ready: the page's own content drawn and, where the page has one, an input that took a keystroke
 *   (home: the hero and the bar rows filled; Explore: the result count shown and a character typed in
 *   the search box shown back; studio: co-editing connected, the profile and line study drawn, and a
 *   character typed in the notes shown back), timed from navigation start on the page's clock,
 * - long tasks (longtask entries: count and longest) up to ready.
 * Medians of RUNS runs (default 5). Timing targets are reported, not enforced; the process exits 1
 * only when something fails (server, browser, a page that never gets ready).
 *
 * Env:
 * - WEB_DIST: the build's browser folder. Unset, dist/web/browser, first brought up to date with its
 *   sources by `scripts/build.mjs web --if-stale` (which also writes the brotli and gzip files the
 *   server sends).
 * - WEB_DIST_COMPARE: another build's browser folder, served too (a second server on the next port, its
 *   own data directory); loads alternate between the two builds, so a before/after comparison shares
 *   the machine's load.
 * - BENCH_PORT (default 3302), RUNS (default 5), CHROMIUM_PATH (default /usr/bin/chromium),
 *   BENCH_COMPILED=1 (run dist/server/main.js instead of the sources through tsx), BENCH_FILES=1 (list
 *   the files of one load).
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { CHROMIUM_ARGS } from '../../../playwright.config';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
const BUILDS = [process.env.WEB_DIST ?? 'dist/web/browser', ...(process.env.WEB_DIST_COMPARE ? [process.env.WEB_DIST_COMPARE] : [])].map((d) => path.resolve(ROOT, d));
const PORT = Number(process.env.BENCH_PORT ?? 3302);
const RUNS = Number(process.env.RUNS ?? 5);
const DEMO_EMAIL = 'maren@example.test';
const DEMO_PASSWORD = 'marsh-lathe-demo-2026';

const TARGETS = { initialKb: 250, homeLcpMs: 1500, studioReadyMs: 2500 };

type Kind = 'document' | 'script' | 'style' | 'font' | 'image' | 'api' | 'other';
const KINDS: Kind[] = ['document', 'script', 'style', 'font', 'image', 'api', 'other'];
interface Bytes { transfer: number; encoded: number; decoded: number; count: number }
interface Run { bytes: Record<Kind, Bytes>; fcp: number; lcp: number; ready: number; fontsDone: number; longTasks: number; longest: number; files: string[] }

/** Installed before any page script: collects paints, LCP and long tasks from the start (buffered). */
const OBSERVE = `(() => {
  const seen = (window.__bench = { lcp: 0, longTasks: [] });
  new PerformanceObserver((l) => { for (const e of l.getEntries()) seen.lcp = e.startTime; }).observe({ type: 'largest-contentful-paint', buffered: true });
  new PerformanceObserver((l) => { for (const e of l.getEntries()) seen.longTasks.push(e.duration); }).observe({ type: 'longtask', buffered: true });
})();`;

function kindOf(name: string, initiator: string): Kind {
  const p = new URL(name).pathname;
  if (p.startsWith('/api/')) return 'api';
  if (/\.m?js$/.test(p)) return 'script';
  if (/\.css$/.test(p)) return 'style';
  if (/\.(woff2?|ttf|otf)$/.test(p)) return 'font';
  if (/\.(svg|png|jpe?g|webp|avif|gif|ico)$/.test(p) || initiator === 'img') return 'image';
  return 'other';
}

async function measure(page: Page, url: string, ready: (page: Page) => Promise<number>): Promise<Run> {
  await page.goto(url, { waitUntil: 'commit' });
  const readyAt = await ready(page);
  // Let a late LCP candidate settle, then read the page's own entries.
  await page.waitForTimeout(300);
  const raw = await page.evaluate(() => {
    const w = window as unknown as { __bench: { lcp: number; longTasks: number[] } };
    const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
    const res = performance.getEntriesByType('resource') as PerformanceResourceTiming[];
    const fcp = performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN;
    return {
      fcp,
      lcp: w.__bench.lcp,
      longTasks: w.__bench.longTasks,
      entries: [nav, ...res].map((e) => ({ name: e.name, initiator: e.initiatorType, start: e.startTime, end: e.responseEnd, transfer: e.transferSize, encoded: e.encodedBodySize, decoded: e.decodedBodySize })),
    };
  });
  const bytes = Object.fromEntries(KINDS.map((k) => [k, { transfer: 0, encoded: 0, decoded: 0, count: 0 }])) as Record<Kind, Bytes>;
  const files: string[] = [];
  let fontsDone = 0;
  for (const e of raw.entries) {
    if (e.start > readyAt) continue; // what the page needed to get ready
    const kind = e.initiator === 'navigation' ? 'document' : kindOf(e.name, e.initiator);
    const b = bytes[kind];
    b.transfer += e.transfer;
    b.encoded += e.encoded;
    b.decoded += e.decoded;
    b.count += 1;
    if (kind === 'font') fontsDone = Math.max(fontsDone, e.end);
    files.push(new URL(e.name).pathname);
  }
  const longIn = raw.longTasks;
  return { bytes, fcp: raw.fcp, lcp: raw.lcp, ready: readyAt, fontsDone, longTasks: longIn.length, longest: longIn.length ? Math.max(...longIn) : 0, files };
}

/** Polls on animation frames until every selector matches (and shows a digit / has the attribute); answers the page-clock time it first held. */
interface Check { selector: string; digit?: boolean; attribute?: [string, string | null]; longerThan?: number }
async function when(page: Page, checks: Check[], timeout = 60_000): Promise<number> {
  // A function, not a string: the app's CSP (script-src 'self') forbids evaluating strings.
  const handle = await page
    .waitForFunction(
    (cs: Check[]) => {
      const held = cs.every((c) => {
        const el = document.querySelector(c.selector);
        if (!el) return false;
        if (c.digit && !/\d/.test(el.textContent ?? '')) return false;
        if (c.attribute && (c.attribute[1] === null ? !el.getAttribute(c.attribute[0]) : el.getAttribute(c.attribute[0]) !== c.attribute[1])) return false;
        if (c.longerThan !== undefined && !((el as HTMLInputElement).value.length > c.longerThan)) return false;
        return true;
      });
      return held ? performance.now() : false;
    },
    checks,
    { polling: 'raf', timeout },
  )
    .catch(async (err: unknown) => {
      const missing = await page.evaluate((cs: Check[]) => cs.filter((c) => !document.querySelector(c.selector)).map((c) => c.selector), checks);
      throw new Error(`${page.url()}: not ready (${missing.length ? `missing ${missing.join(', ')}` : 'an element lacks its text, attribute or value'}): ${String(err)}`);
    });
  return (await handle.jsonValue()) as number;
}

/** Types one character into the input and answers the page-clock time the input shows it. */
async function keystroke(page: Page, selector: string, timeout = 60_000): Promise<number> {
  const field = page.locator(selector);
  const before = await field.inputValue();
  await field.focus();
  await page.keyboard.press('End');
  await page.keyboard.type('q');
  return when(page, [{ selector, longerThan: before.length }], timeout);
}

const tid = (id: string) => `[data-testid="${id}"]`;

const PAGES: { name: string; signedIn: boolean; url: (designId: string) => string; ready: (page: Page) => Promise<number> }[] = [
  {
    name: 'home',
    signedIn: false,
    url: () => '/',
    ready: (page) => when(page, [{ selector: tid('home-sign-up') }, { selector: `${tid('home-newest')} a` }]),
  },
  {
    name: 'explore',
    signedIn: false,
    url: () => '/explore',
    ready: async (page) => {
      await when(page, [{ selector: tid('explore-count'), digit: true }]);
      return keystroke(page, tid('explore-search'));
    },
  },
  {
    name: 'studio',
    signedIn: true,
    url: (designId) => `/studio/${designId}`,
    ready: async (page) => {
      await when(page, [
        { selector: tid('connection-status'), attribute: ['data-status', 'live'] },
        { selector: `${tid('profile-svg')} polygon.bar` },
        { selector: tid('study-flat'), attribute: ['data-period', null] },
      ]);
      return keystroke(page, tid('notes'));
    },
  },
];

/** One build served by its own server on a new data directory. */
interface Served { dist: string; base: string; server: ChildProcess; designId: string; runs: Map<string, Run[]> }

function startServer(dist: string, port: number): ChildProcess {
  const dataDir = path.join(ROOT, '.tmp', `bench-web-data-${port}`);
  fs.rmSync(dataDir, { recursive: true, force: true });
  const env = {
    ...process.env,
    PORT: String(port),
    DATA_DIR: dataDir,
    DEMO_DATA: 'true',
    NODE_ENV: 'production',
    PUBLIC_URL: `http://localhost:${port}`,
    SESSION_SECRET: randomBytes(32).toString('hex'),
    SMTP_URL: 'smtp://127.0.0.1:9',
    WEB_DIST: dist,
  };
  const compiled = path.join(ROOT, 'dist/server/main.js');
  // tsx runs the server from source, so the figures never come from a stale compiled bundle.
  const args = process.env.BENCH_COMPILED ? [compiled] : ['--import', 'tsx', 'apps/server/src/main.ts'];
  const child = spawn(process.execPath, args, { cwd: ROOT, env, stdio: ['ignore', 'ignore', 'pipe'] });
  child.stderr!.on('data', (d: Buffer) => process.stderr.write(d));
  return child;
}

async function waitForHealth(child: ChildProcess, base: string, timeoutMs = 180_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server did not answer ${base}/api/health within ${timeoutMs / 1000} s`);
}

async function signIn(context: BrowserContext, base: string): Promise<void> {
  await context.request.get(`${base}/api/auth/me`);
  const xsrf = decodeURIComponent((await context.cookies()).find((c) => c.name === 'XSRF-TOKEN')?.value ?? '');
  const res = await context.request.post(`${base}/api/auth/sign-in`, { data: { email: DEMO_EMAIL, password: DEMO_PASSWORD }, headers: { 'X-XSRF-TOKEN': xsrf } });
  if (!res.ok()) throw new Error(`sign-in failed: ${res.status()} ${await res.text()}`);
}

async function demoDesignId(browser: Browser, base: string): Promise<string> {
  const context = await browser.newContext();
  await signIn(context, base);
  const boards = (await (await context.request.get(`${base}/api/boards`)).json()) as { mine: { id: string }[]; shared: { id: string }[] };
  for (const b of [...boards.mine, ...boards.shared]) {
    const detail = (await (await context.request.get(`${base}/api/boards/${b.id}`)).json()) as { designs: { id: string }[] };
    if (detail.designs.length > 0) {
      await context.close();
      return detail.designs[0]!.id;
    }
  }
  throw new Error(`${DEMO_EMAIL} has no design on any board`);
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};
const kb = (n: number) => (n / 1000).toFixed(1);
const ms = (n: number) => (Number.isFinite(n) ? `${Math.round(n)}` : '-');

function report(name: string, runs: Run[]): { initial: number; lcp: number; ready: number } {
  const med = (f: (r: Run) => number) => median(runs.map(f));
  console.log(`\n${name} (median of ${runs.length} cold loads)`);
  console.log('  type       files   received kB   body as sent kB   decoded kB');
  let total = { transfer: 0, encoded: 0, decoded: 0 };
  let noFonts = 0;
  for (const k of KINDS) {
    const t = med((r) => r.bytes[k].transfer);
    const e = med((r) => r.bytes[k].encoded);
    const d = med((r) => r.bytes[k].decoded);
    const c = med((r) => r.bytes[k].count);
    if (c === 0) continue;
    total = { transfer: total.transfer + t, encoded: total.encoded + e, decoded: total.decoded + d };
    if (k !== 'font') noFonts += t;
    console.log(`  ${k.padEnd(9)} ${String(c).padStart(6)} ${kb(t).padStart(13)} ${kb(e).padStart(17)} ${kb(d).padStart(12)}`);
  }
  console.log(`  ${'total'.padEnd(9)} ${''.padStart(6)} ${kb(total.transfer).padStart(13)} ${kb(total.encoded).padStart(17)} ${kb(total.decoded).padStart(12)}`);
  const lcp = med((r) => r.lcp);
  const ready = med((r) => r.ready);
  console.log(`  FCP ${ms(med((r) => r.fcp))} ms · LCP ${ms(lcp)} ms · ready ${ms(ready)} ms · long tasks ${med((r) => r.longTasks)} (longest ${ms(med((r) => r.longest))} ms)`);
  // Fonts arriving after the first paint show they do not hold it back (Roboto swaps in; the icon font hides only icons).
  console.log(`  last font received at ${ms(med((r) => r.fontsDone))} ms`);
  console.log(`  per run ready (ms): ${runs.map((r) => ms(r.ready)).join(', ')}`);
  if (process.env.BENCH_FILES) console.log(`  files: ${runs[0]!.files.join(' ')}`);
  return { initial: noFonts, lcp, ready };
}

async function main(): Promise<void> {
  if (!process.env.WEB_DIST) {
    // The default build, dist/web, brought up to date with the sources first (as `npm start` does).
    const built = spawnSync(process.execPath, ['scripts/build.mjs', 'web', '--if-stale'], { cwd: ROOT, stdio: 'inherit' });
    if (built.status !== 0) throw new Error(`building the web app failed (exit ${built.status})`);
  }
  for (const dist of BUILDS) {
    if (!fs.existsSync(path.join(dist, 'index.html'))) {
      throw new Error(`no built web app at ${dist}: run \`npm run build\` first (or set WEB_DIST to a build's browser folder)`);
    }
  }
  const load = () => os.loadavg().map((l) => l.toFixed(1)).join(' / ');
  console.log(`First loads in Chromium, ${os.cpus().length} cores, load average ${load()} (1/5/15 min) at start`);
  const served: Served[] = BUILDS.map((dist, i) => ({ dist, base: `http://localhost:${PORT + i}`, server: startServer(dist, PORT + i), designId: '', runs: new Map() }));
  const stop = () => served.forEach((s) => s.server.exitCode === null && s.server.kill('SIGTERM'));
  process.on('exit', stop);
  let browser: Browser | undefined;
  try {
    await Promise.all(served.map((s) => waitForHealth(s.server, s.base)));
    browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
    for (const s of served) s.designId = await demoDesignId(browser, s.base);
    for (const target of PAGES) {
      // Load 0 warms each server up and is not counted (its first answers read files and plan queries).
      for (let i = 0; i <= RUNS; i++) {
        // With two builds, alternate which goes first so neither always meets the other's leftovers.
        for (const s of i % 2 ? [...served].reverse() : served) {
          const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
          if (target.signedIn) await signIn(context, s.base);
          await context.addInitScript(OBSERVE);
          const page = await context.newPage();
          const cdp = await context.newCDPSession(page);
          await cdp.send('Network.enable');
          await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
          const run = await measure(page, s.base + target.url(s.designId), target.ready);
          if (i > 0) s.runs.set(target.name, [...(s.runs.get(target.name) ?? []), run]);
          await context.close();
        }
      }
    }
    const verdict = (ok: boolean) => (ok ? 'met' : 'missed');
    for (const s of served) {
      console.log(`\n=== web app ${path.relative(ROOT, s.dist)} ===`);
      const results = Object.fromEntries(PAGES.map((p) => [p.name, report(p.name, s.runs.get(p.name)!)]));
      console.log('\n  Targets (reported, not enforced; timings depend on the machine and its load)');
      const line = (what: string, figure: string, target: string, ok: boolean) => console.log(`  ${what.padEnd(46)} ${figure.padStart(10)}  ${target.padStart(8)}  ${verdict(ok)}`);
      const homeKb = results.home!.initial / 1000;
      line('home: received until ready, fonts aside', `${homeKb.toFixed(1)} kB`, `${TARGETS.initialKb} kB`, homeKb <= TARGETS.initialKb);
      line('home: largest contentful paint', `${ms(results.home!.lcp)} ms`, `${TARGETS.homeLcpMs} ms`, results.home!.lcp < TARGETS.homeLcpMs);
      line('studio: ready (drawn, takes a keystroke)', `${ms(results.studio!.ready)} ms`, `${TARGETS.studioReadyMs} ms`, results.studio!.ready < TARGETS.studioReadyMs);
    }
    console.log(`\nload average at end: ${load()}`);
  } finally {
    await browser?.close();
    stop();
  }
}

main().then(
  () => process.exit(0),
  (err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);
