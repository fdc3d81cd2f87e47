/*
 * Sweep benchmark, measured from outside in Debian's Chromium on the real page (/rack/sweep/:id):
 *  - 500 candidates (150 mm bars, the page's default study): from clicking Run to every thumbnail
 *    on screen drawn (target < 2 s), with the workers already started (a second run) and cold (the
 *    saved sweep opened, which runs it: page load, worker start-up and all);
 *  - 5 000 candidates: from clicking Run to done (target < 15 s), and the main thread's long tasks meanwhile;
 *  - scrolling the grid (wheel, during a run and after it): the main thread's long tasks (target: none, every task < 50 ms);
 *  - the page's JS heap with 5 000 candidates done, after a garbage collection (target < 300 MB).
 * The member's rack is made through the API: 100 rosettes tagged "bench" (50 of them also "half"),
 * 2 rubbers, 5 travel settings, 5 cutters; the saved sweeps choose half × 2 × 5 × 1 = 500 and
 * bench × 2 × 5 × 5 = 5 000. Like studio-redraw-bench.ts it starts a real server on a fresh data
 * directory with the demo data (WEB_DIST: the web build, default dist/web/browser).
 * Run: node --import tsx apps/web/bench/sweep-bench.ts (BENCH_PORT, BENCH_DATA_DIR; BENCH_PROFILE=1 samples the
 * page over the 5 000 run; BENCH_SHOTS=dir saves the grid at 1280 and 360 px; BENCH_QUICK=1 stops after the 500).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type CDPSession, type Page } from '@playwright/test';

const ROOT = path.resolve(import.meta.dirname, '../../..');
const PORT = Number(process.env.BENCH_PORT ?? 3305);
const BASE = `http://localhost:${PORT}`;
const DATA_DIR = path.resolve(ROOT, process.env.BENCH_DATA_DIR ?? '.tmp/bench-sweep');
const WEB_DIST = path.resolve(ROOT, process.env.WEB_DIST ?? 'dist/web/browser');
const DEMO_PASSWORD = 'marsh-lathe-demo-2026';
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const SCROLL_MS = 5000;

/*
 * Installed in the page: the time of the click on Run, long tasks, and a frame loop noting when every
 * card on screen shows a drawn thumbnail (or its refusal) and when the progress says done. Page
 * scripts are strings: tsx would wrap named functions in a helper the page lacks.
 */
const INSTRUMENT = `(() => {
  const bench = (window.bench = { clicked: 0, running: false, drawn: 0, done: 0, longTasks: [] });
  const now = () => performance.timeOrigin + performance.now();
  document.addEventListener('click', (e) => {
    if (e.target instanceof Element && e.target.closest('[data-testid="sweep-run"]')) Object.assign(bench, { clicked: now(), running: false, drawn: 0, done: 0 });
  }, true);
  new PerformanceObserver((list) => { for (const e of list.getEntries()) bench.longTasks.push(e.duration); }).observe({ type: 'longtask' });
  const frame = () => {
    requestAnimationFrame(frame);
    const p = document.querySelector('[data-testid="sweep-progress"]');
    // Marks count only once the page shows this run (the grid of the run before is gone by then).
    if (!bench.running) { bench.running = !!p && p.getAttribute('data-state') === 'running'; if (!bench.running) return; }
    if (!bench.done && p && p.getAttribute('data-state') === 'done' && p.getAttribute('data-done') === p.getAttribute('data-total')) bench.done = now();
    const grid = document.querySelector('[data-testid="sweep-grid"]');
    if (!bench.drawn && grid) {
      // On screen: the cards inside the grid's viewport (the page itself may be scrolled anywhere).
      const g = grid.getBoundingClientRect();
      const cards = [...grid.querySelectorAll('[data-testid="sweep-card"]')].filter((c) => { const r = c.getBoundingClientRect(); return r.bottom > g.top && r.top < g.bottom && r.height > 0; });
      if (cards.length && cards.every((c) => c.querySelector('[data-testid="sweep-thumb"][data-drawn="true"], .refused'))) bench.drawn = now();
    }
  };
  requestAnimationFrame(frame);
})()`;

interface BenchWindow {
  bench: { clicked: number; running: boolean; drawn: number; done: number; longTasks: number[] };
}
const bench = (page: Page) => page.evaluate(() => (window as unknown as BenchWindow).bench);

async function main(): Promise<void> {
  if (!fs.existsSync(path.join(WEB_DIST, 'index.html'))) throw new Error(`No web build at ${WEB_DIST}: build it, or set WEB_DIST`);
  const server = await startServer();
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
  try {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await context.addInitScript({ content: INSTRUMENT });
    const page = await context.newPage();
    page.on('pageerror', (e) => console.error('page error:', e.message));
    await signIn(page);
    const [small, large] = await makeRack(page);
    console.log(`Sweep, Chromium ${browser.version()}, ${os.cpus().length} cores, load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}, ${WEB_DIST}`);

    // 500, cold: opening the saved sweep runs it (page load, worker start-up, first JIT all included).
    const opened = Date.now();
    await page.goto(`${BASE}/rack/sweep/${small}`);
    await waitBench(page, 'drawn and done', 120_000);
    const cold = await bench(page);
    const coldDrawn = cold.drawn - opened;
    const coldDone = cold.done - opened;
    // 500, warm: Run again, three times.
    const warm: { drawn: number; done: number; longest: number }[] = [];
    for (let i = 0; i < 3; i++) warm.push(await timeRun(page));
    row('500: Run → on-screen thumbnails drawn', warm.map((w) => w.drawn), 'target < 2000 ms');
    row('500: Run → done', warm.map((w) => w.done));
    console.log(`${'500, cold (open → drawn / done)'.padEnd(44)} ${coldDrawn.toFixed(0)} ms / ${coldDone.toFixed(0)} ms (page load and worker start-up included)`);
    console.log(`${'500: longest main-thread task in a run'.padEnd(44)} ${Math.max(...warm.map((w) => w.longest)).toFixed(0)} ms (0: none over 50 ms)`);

    if (process.env.BENCH_SHOTS) await screenshots(page, process.env.BENCH_SHOTS);
    if (process.env.BENCH_QUICK) return;

    // 5 000: open (it runs), cancel that run, then Run and time it.
    await page.goto(`${BASE}/rack/sweep/${large}`);
    await page.locator('[data-testid="sweep-progress"][data-state="running"]').waitFor({ timeout: 60_000 });
    await page.getByTestId('sweep-cancel').click();
    await page.locator('[data-testid="sweep-progress"][data-state="cancelled"]').waitFor();
    const profiler = process.env.BENCH_PROFILE ? await startProfile(page) : null;
    const big = await timeRun(page, 180_000);
    if (profiler) await printProfile(profiler);
    row('5 000: Run → done', [big.done], 'target < 15000 ms');
    row('5 000: Run → on-screen thumbnails drawn', [big.drawn]);
    console.log(`${'5 000: long tasks during the run'.padEnd(44)} ${big.longCount} (longest ${big.longest.toFixed(0)} ms)`);

    const heap = await heapMb(page);
    console.log(`${'5 000 done: JS heap after GC'.padEnd(44)} ${heap.toFixed(1)} MB (target < 300 MB)`);

    // Scrolling: after the run, then during one.
    const after = await scrollGrid(page);
    console.log(`${'scrolling 5 000 done: long tasks'.padEnd(44)} ${after.count} (longest ${after.longest.toFixed(0)} ms; ${after.frames} frames in ${SCROLL_MS} ms)`);
    await page.evaluate(() => ((window as unknown as BenchWindow).bench.longTasks = []));
    await page.getByTestId('sweep-grid').evaluate((el) => (el.scrollTop = 0));
    await page.getByTestId('sweep-run').click();
    const during = await scrollGrid(page);
    console.log(`${'scrolling during a 5 000 run: long tasks'.padEnd(44)} ${during.count} (longest ${during.longest.toFixed(0)} ms; ${during.frames} frames in ${SCROLL_MS} ms)`);
    await waitBench(page, 'done', 180_000);
    const heapAfter = await heapMb(page);
    console.log(`${'after a second 5 000 run: JS heap after GC'.padEnd(44)} ${heapAfter.toFixed(1)} MB`);
  } finally {
    await browser.close();
    server.kill('SIGTERM');
  }
}

/** Clicks Run; resolves with ms from the click to the on-screen thumbnails drawn and to done, and the run's long tasks. */
async function timeRun(page: Page, timeout = 60_000) {
  await page.getByTestId('sweep-grid').evaluate((el) => (el.scrollTop = 0)).catch(() => undefined);
  await page.evaluate(() => ((window as unknown as BenchWindow).bench.longTasks = []));
  await page.getByTestId('sweep-run').click();
  await waitBench(page, 'clicked, drawn and done', timeout);
  const b = await bench(page);
  await page.waitForTimeout(300);
  return { drawn: b.drawn - b.clicked, done: b.done - b.clicked, longest: Math.max(0, ...b.longTasks), longCount: b.longTasks.length };
}

/** With BENCH_SHOTS=dir: the grid at 1280 and 360 px wide, once every card on screen is drawn. */
async function screenshots(page: Page, dir: string): Promise<void> {
  fs.mkdirSync(dir, { recursive: true });
  for (const width of [1280, 360]) {
    await page.setViewportSize({ width, height: 900 });
    await page.getByTestId('sweep-grid').scrollIntoViewIfNeeded();
    await page.waitForTimeout(1500);
    await page.screenshot({ path: path.join(dir, `sweep-grid-${width}.png`) });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}

/** Waits for the bench's marks (`what`: which of clicked, drawn, done); on a timeout shows the page's state and a screenshot. */
async function waitBench(page: Page, what: string, timeout: number): Promise<void> {
  try {
    await page.waitForFunction((w) => { const b = (window as unknown as BenchWindow).bench as unknown as Record<string, number>; return ['clicked', 'drawn', 'done'].every((k) => !w.includes(k) || b[k] > 0); }, what, { timeout, polling: 100 });
  } catch (error) {
    const state = await page.evaluate(() => ({
      bench: (window as unknown as BenchWindow).bench,
      progress: document.querySelector('[data-testid="sweep-progress"]')?.outerHTML.slice(0, 300),
      cards: document.querySelectorAll('[data-testid="sweep-card"]').length,
      thumbs: document.querySelectorAll('[data-testid="sweep-thumb"]').length,
      drawn: document.querySelectorAll('[data-testid="sweep-thumb"][data-drawn="true"]').length,
    }));
    await page.screenshot({ path: path.join(ROOT, '.tmp/sweep-bench-timeout.png') });
    throw new Error(`Waiting for ${what}: ${JSON.stringify({ ...state, bench: { ...state.bench, longTasks: state.bench.longTasks.length } })}`, { cause: error });
  }
}

/** Wheels down the grid for SCROLL_MS (a notch every 50 ms) and back up; the long tasks meanwhile and the frames drawn. */
async function scrollGrid(page: Page) {
  const grid = page.getByTestId('sweep-grid');
  const box = (await grid.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + Math.min(box.height / 2, 300));
  await page.evaluate(`(() => {
    window.bench.longTasks = [];
    window.frames_ = 0;
    const count = () => { window.frames_++; if (window.frames_ < 1e6) requestAnimationFrame(count); };
    requestAnimationFrame(count);
  })()`);
  const started = Date.now();
  let down = true;
  while (Date.now() - started < SCROLL_MS) {
    await page.mouse.wheel(0, down ? 400 : -400);
    if (Date.now() - started > SCROLL_MS * 0.75) down = false;
    await page.waitForTimeout(50);
  }
  await page.waitForTimeout(200);
  const r = await page.evaluate<{ tasks: number[]; frames: number }>(`(() => { const f = window.frames_; window.frames_ = 1e6; return { tasks: window.bench.longTasks, frames: f }; })()`);
  return { count: r.tasks.length, longest: Math.max(0, ...r.tasks), frames: r.frames };
}

/** With BENCH_PROFILE set: the page's JavaScript sampled by Chromium's profiler over the 5 000 run. */
async function startProfile(page: Page): Promise<CDPSession> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 500 });
  await cdp.send('Profiler.start');
  return cdp;
}

/** The 25 functions with the most self time (a development build names them). */
async function printProfile(cdp: CDPSession): Promise<void> {
  const { profile } = await cdp.send('Profiler.stop');
  const self = new Map<string, number>();
  const dt = new Map<number, number>();
  profile.samples?.forEach((id, k) => dt.set(id, (dt.get(id) ?? 0) + (profile.timeDeltas?.[k] ?? 0)));
  for (const node of profile.nodes) {
    const f = node.callFrame;
    const key = `${f.functionName || '(anonymous)'} ${f.url.split('/').pop()}:${f.lineNumber + 1}:${f.columnNumber + 1}`;
    self.set(key, (self.get(key) ?? 0) + (dt.get(node.id) ?? 0) / 1000);
  }
  console.log('Main-thread self time (ms) over the 5 000 run:');
  for (const [key, ms] of [...self].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`${ms.toFixed(0).padStart(7)}  ${key}`);
}

/** The page's used JS heap after a garbage collection (MB), by the DevTools protocol. */
async function heapMb(page: Page): Promise<number> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('HeapProfiler.collectGarbage');
  const { usedSize } = await cdp.send('Runtime.getHeapUsage');
  await cdp.detach();
  return usedSize / 1e6;
}

async function signIn(page: Page): Promise<void> {
  await page.goto(`${BASE}/account/sign-in`);
  await page.getByTestId('sign-in-email').fill('maren@example.test');
  await page.getByTestId('sign-in-password').fill(DEMO_PASSWORD);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('account-menu').waitFor();
}

/** Fills the member's rack and shop, and saves the two sweeps; their ids (500, 5 000). */
async function makeRack(page: Page): Promise<[string, string]> {
  const send = async (method: 'post' | 'put', url: string, data: unknown) => {
    const token = decodeURIComponent((await page.context().cookies()).find((c) => c.name === 'XSRF-TOKEN')?.value ?? '');
    const res = await page.request[method](`${BASE}${url}`, { data, headers: { 'X-XSRF-TOKEN': token } });
    if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
    return res.json() as Promise<{ id: string }>;
  };
  for (let i = 0; i < 100; i++) {
    // Single sines and two-layer waves from 12 to 61 lobes: periods and heights as a real rack's spread.
    const layers = [{ lobes: 12 + (i % 50), amplitude: 0.6 + (i % 7) * 0.25, phase: 0, wave: { shape: 'sine' } }];
    if (i % 3 === 0) layers.push({ lobes: 2 * (12 + (i % 50)), amplitude: 0.3, phase: 0.25, wave: { shape: 'sine' } });
    await send('post', '/api/rack/rosettes', { name: `Bench rosette ${i + 1}`, units: 'mm', rosette: { baseRadius: 50, layers }, tags: i < 50 ? ['bench', 'half'] : ['bench'] });
  }
  const shop = {
    units: 'mm',
    rubbers: [{ shape: 'round', radius: 1 }, { shape: 'round', radius: 2 }],
    travels: [60, 80, 100, 120, 140].map((travelPerRev) => ({ travelPerRev, leverRatio: 1 })),
    cutters: [4.7625, 3.175, 6.35, 2, 8].map((diameter) => ({ diameter, flutes: 2 })),
    followers: [{ radius: 2.38125 }],
    vCutters: [{ vAngle: 120 }],
  };
  await send('put', '/api/rack/shop', shop);
  const choices = (tag: string, cutters: number) => ({
    units: 'mm',
    rosettes: { by: 'tags', tags: [tag] },
    rubbers: shop.rubbers,
    travels: shop.travels,
    cutters: shop.cutters.slice(0, cutters),
    follower: shop.followers[0],
    barLength: 150,
    study: { lineSpacing: 0.45, lines: 40, schedules: [{ kind: 'alternate' }], vAngle: 120, depth: 0.1 },
  });
  const small = await send('post', '/api/rack/sweeps', { name: 'Bench 500', choices: choices('half', 1) });
  const large = await send('post', '/api/rack/sweeps', { name: 'Bench 5000', choices: choices('bench', 5) });
  return [small.id, large.id];
}

function row(name: string, xs: number[], target = ''): void {
  const sorted = [...xs].sort((a, b) => a - b);
  console.log(`${name.padEnd(44)} ${xs.length > 1 ? `median ${sorted[Math.floor(sorted.length / 2)].toFixed(0)} ms (runs: ${xs.map((x) => x.toFixed(0)).join(', ')})` : `${xs[0].toFixed(0)} ms`}${target ? `   ${target}` : ''}`);
}

async function startServer(): Promise<ChildProcess> {
  fs.rmSync(DATA_DIR, { recursive: true, force: true });
  fs.mkdirSync(path.dirname(DATA_DIR), { recursive: true });
  const child = spawn(process.execPath, ['--import', 'tsx', 'apps/server/src/main.ts'], {
    cwd: ROOT,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, PORT: String(PORT), DATA_DIR, DEMO_DATA: 'true', NODE_ENV: 'test', WEB_DIST },
  });
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server stopped (exit ${child.exitCode})`);
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return child;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  child.kill('SIGTERM');
  throw new Error('The server did not answer /api/health within 2 minutes');
}

await main();
