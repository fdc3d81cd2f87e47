/*
 * Studio redraw benchmark, measured from outside in Debian's Chromium:
 *  - edit to redraw, one maker: 30 edits typed into the studio with no other page on the design, from
 *    the input event to the frame after the last view on the screen changed, with the main-thread long
 *    tasks meanwhile; and to the frame after every view first showed the edit (the lit plate's quick
 *    surface counts: its anti-aliased one may follow). At 1280 × 900 the bar profile is the view on the
 *    screen (the study's plates, drawn only when in view, and the cut plan lie below it);
 *  - the same with every view on the screen (a 1280 × 2400 window: bar profile, flat and lit plates,
 *    cut plan), as on a tall screen or with the page scrolled;
 *  - two makers: 30 more edits with a second browser context on the same design (its redrawing shares
 *    the machine's two cores): the typing page's edit to redraw, and the other page's field holding
 *    the value and its views redrawn, from the typing page's input event and from the update's arrival.
 * It starts a real server on a fresh data directory with the demo data (WEB_DIST: the web build to
 * serve, default dist/web/browser). Run: node --import tsx apps/web/bench/studio-redraw-bench.ts
 * BENCH_CPU=1 adds the CPU of the bench's processes over the one-maker edits (the server, Chromium's
 * processes, the bench itself); BENCH_PROFILE_FILE=path keeps BENCH_PROFILE's raw CPU profile;
 * BENCH_SERVER_PROFILE_DIR=dir has the server write Node's own CPU profile there when it stops.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type CDPSession, type Page } from '@playwright/test';

const ROOT = path.resolve(import.meta.dirname, '../../..');
const PORT = Number(process.env.BENCH_PORT ?? 3304);
const BASE = `http://localhost:${PORT}`;
const DATA_DIR = path.resolve(ROOT, process.env.BENCH_DATA_DIR ?? '.tmp/bench-studio-redraw');
const WEB_DIST = path.resolve(ROOT, process.env.WEB_DIST ?? 'dist/web/browser');
const EDITS = Number(process.env.BENCH_EDITS ?? 30);
const DEMO_PASSWORD = 'marsh-lathe-demo-2026';
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const LOBES = 'field-rosette.layers[0].lobes';
const AMPLITUDE = 'field-rosette.layers[0].amplitude';
/** A window this tall shows every view of the studio at once (the cut plan ends near 2 100 px). */
const TALL_PX = 2400;
/** A view is taken as drawn once nothing in the drawings changed for this long (ms). */
const QUIET_MS = 700;
/**
 * How often the bench looks for the edit's redraw (ms). Playwright's default looks in every animation
 * frame, which asks the page for frames (and the bench's own process for a round trip each) throughout the
 * edit being timed; the times themselves are taken in the page, so looking seldom changes none of them.
 */
const POLL_MS = 100;
/** Between selecting a field's text and typing over it (ms): about the shortest a hand takes. */
const SELECTED_MS = 100;

/*
 * Installed in each page: times of the input events, of the drawings' changes (in the frame after), of
 * long tasks. Page scripts are strings: tsx would wrap named functions in a helper the page lacks.
 */
const INSTRUMENT = `(() => {
  const bench = (window.bench = { typed: 0, drawn: 0, first: {}, longTasks: [], fieldAt: 0, updates: [], log: [] });
  window.benchLog = ${JSON.stringify(!!process.env.BENCH_LOG)};
  // BENCH_SURFACE_FILE: the last study the lit plate was given, kept to replay outside the page.
  window.benchSurface = ${JSON.stringify(!!process.env.BENCH_SURFACE_FILE)};
  const now = () => performance.timeOrigin + performance.now();
  // When each document update (y-websocket's message type 0, not awareness) reaches the page, before Yjs reads it.
  const Native = window.WebSocket;
  window.WebSocket = class extends Native {
    constructor(...args) {
      super(...args);
      this.addEventListener('message', (e) => {
        if (e.data instanceof ArrayBuffer && new Uint8Array(e.data)[0] === 0) bench.updates.push(now());
      });
    }
  };
  // For BENCH_LOG: when the page posts to each worker and hears back, with the plate workers' own times (their replies carry them).
  const NativeWorker = window.Worker;
  window.Worker = class extends NativeWorker {
    constructor(...args) {
      super(...args);
      const name = (args[1] && args[1].name) || String(args[0]).split('/').pop();
      this.addEventListener('message', (e) => {
        const d = e.data;
        if (!window.benchLog || !bench.typed) return;
        const times = d && d.plate ? ': field ' + Math.round(d.fieldMs) + ' ms, paint ' + Math.round(d.paintMs) + ' ms' : d && d.views ? ': ' + d.views.stage + ' in ' + Math.round(d.views.ms) + ' ms' : '';
        bench.log.push([Math.round(now() - bench.typed), 0, 'reply from ' + name + times]);
      });
      const post = this.postMessage.bind(this);
      this.postMessage = (...m) => {
        if (window.benchLog && bench.typed) bench.log.push([Math.round(now() - bench.typed), 0, 'post to ' + name]);
        if (window.benchSurface && name === 'study-plates-flat' && m[0] && m[0].kind === 'surface') bench.lastSurface = { ...m[0], lines: m[0].lines.map((l) => Array.from(l)) };
        return post(...m);
      };
    }
  };
  document.addEventListener('input', () => (bench.typed = now()), true);
  const drawing = 'svg, canvas, [data-testid="plan-figures"], [data-testid="profile-warnings"], [data-testid="study-summary"]';
  new MutationObserver((records) => {
    const inDrawing = (r) => {
      const el = r.target instanceof Element ? r.target : r.target.parentElement;
      return !!(el && el.closest(drawing)) || [...r.addedNodes].some((n) => n instanceof Element && !!n.querySelector('svg, canvas'));
    };
    const changed = records.filter(inDrawing);
    if (window.benchLog) for (const r of changed) {
      const el = r.target instanceof Element ? r.target : r.target.parentElement;
      const at = now();
      requestAnimationFrame(() => bench.log.push([Math.round(at - bench.typed), Math.round(now() - bench.typed), (el?.closest('[data-testid]')?.dataset.testid ?? el?.tagName) + ' ' + r.type + ' ' + (r.attributeName ?? '')]));
    }
    if (changed.length) requestAnimationFrame(() => (bench.drawn = now()));
    // Each view's first change showing the edit: a plate's when its worker says it painted the study
    // (the lit plate's quick surface counts), any other view's first change.
    for (const r of changed) {
      const el = r.target instanceof Element ? r.target : r.target.parentElement;
      const key = el?.closest('[data-testid]')?.dataset.testid ?? el?.tagName;
      if (!key || key in bench.first) continue;
      if (el instanceof HTMLCanvasElement && r.attributeName !== (el.hasAttribute('data-shown') ? 'data-shown' : 'data-drawn')) continue;
      bench.first[key] = 0;
      requestAnimationFrame(() => (bench.first[key] = now()));
    }
  }).observe(document, { subtree: true, childList: true, attributes: true, characterData: true });
  new PerformanceObserver((list) => { for (const e of list.getEntries()) bench.longTasks.push(e.duration); }).observe({ type: 'longtask' });
})()`;

/** In the watching page: notes when the field is given `value` (Angular sets the property; no DOM mutation to observe). */
const watchField = (testId: string, value: string) => `(() => {
  const bench = window.bench;
  bench.fieldAt = 0;
  bench.drawn = 0;
  bench.first = {};
  const input = document.querySelector('[data-testid="${testId}"]');
  const proto = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value');
  Object.defineProperty(input, 'value', {
    configurable: true,
    get: () => proto.get.call(input),
    set: (v) => {
      proto.set.call(input, v);
      if (Number(v) === ${Number(value)} && !bench.fieldAt) bench.fieldAt = performance.timeOrigin + performance.now();
    },
  });
})()`;

interface BenchWindow {
  bench: { typed: number; drawn: number; first: Record<string, number>; log: [number, number, string][]; longTasks: number[]; fieldAt: number; updates: number[] };
}

async function main(): Promise<void> {
  if (!fs.existsSync(path.join(WEB_DIST, 'index.html'))) throw new Error(`No web build at ${WEB_DIST}: build it, or set WEB_DIST`);
  const server = await startServer();
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
  try {
    const [editor, watcher, url] = await twoStudios(browser);
    const edit = (i: number): [string, string] => (i % 2 === 0 ? [LOBES, String(20 + ((i / 2) % 10))] : [AMPLITUDE, (1 + (i % 7) * 0.1).toFixed(1)]);

    // One maker on the design: the other page is away, so the machine's two cores serve this page alone.
    await watcher.goto('about:blank');
    await settle(editor);
    await editor.evaluate(() => ((window as unknown as BenchWindow).bench.longTasks = []));
    const profiler = process.env.BENCH_PROFILE ? await startProfile(editor) : null;
    if (process.env.BENCH_TRACE) await browser.startTracing(editor, { categories: (process.env.BENCH_TRACE_CATEGORIES ?? 'devtools.timeline,disabled-by-default-devtools.timeline').split(',') });
    const cpuBefore = process.env.BENCH_CPU ? processCpu() : null;
    const solo: number[] = [];
    const soloShown: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const t = await timeLocalEdit(editor, ...edit(i));
      solo.push(t.drawn);
      soloShown.push(t.shown);
    }
    const soloLongTasks = await editor.evaluate(() => (window as unknown as BenchWindow).bench.longTasks);
    if (cpuBefore) printProcessCpu(cpuBefore, processCpu(), EDITS);
    if (profiler) await printProfile(profiler);
    if (process.env.BENCH_TRACE) {
      const trace = await browser.stopTracing();
      if (process.env.BENCH_TRACE_FILE) fs.writeFileSync(process.env.BENCH_TRACE_FILE, trace);
      printTrace(trace);
    }

    // One maker with every view on the screen: the plates are drawn on every edit too.
    await editor.setViewportSize({ width: 1280, height: TALL_PX });
    await settle(editor);
    await editor.evaluate(() => ((window as unknown as BenchWindow).bench.longTasks = []));
    const tall: number[] = [];
    const tallShown: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const t = await timeLocalEdit(editor, ...edit(EDITS + i)); // on from phase one's edits: repeating its last value would change nothing
      tall.push(t.drawn);
      tallShown.push(t.shown);
    }
    const tallLongTasks = await editor.evaluate(() => (window as unknown as BenchWindow).bench.longTasks);
    await editor.setViewportSize({ width: 1280, height: 900 });

    // Two makers: the same edits followed on a second page, which redraws too.
    await openStudio(watcher, url);
    const local: number[] = [];
    const localShown: number[] = [];
    const remoteShown: number[] = [];
    const remoteField: number[] = [];
    const remoteViews: number[] = [];
    const arrivedField: number[] = [];
    const arrivedViews: number[] = [];
    await settle(editor, watcher);
    for (const page of [editor, watcher]) await page.evaluate(() => ((window as unknown as BenchWindow).bench.longTasks = []));
    for (let i = 0; i < EDITS; i++) {
      const t = await timeEdit(editor, watcher, ...edit(2 * EDITS + i)); // on from the earlier phases' edits
      local.push(t.local);
      localShown.push(t.localShown);
      remoteShown.push(t.arrivedShown);
      remoteField.push(t.remoteField);
      remoteViews.push(t.remoteViews);
      arrivedField.push(t.arrivedField);
      arrivedViews.push(t.arrivedViews);
    }
    const watcherLongTasks = await watcher.evaluate(() => (window as unknown as BenchWindow).bench.longTasks);
    const longTasks = await editor.evaluate(() => (window as unknown as BenchWindow).bench.longTasks);
    const row = (name: string, xs: number[]) => `${name.padEnd(46)} p50 ${pct(xs, 50).toFixed(0).padStart(5)} ms   p95 ${pct(xs, 95).toFixed(0).padStart(5)} ms   max ${Math.max(...xs).toFixed(0).padStart(5)} ms`;
    const tasks = (name: string, xs: number[]) => `${name.padEnd(46)} ${xs.length} (longest ${xs.length ? Math.max(...xs).toFixed(0) : 0} ms)`;
    console.log(`Studio redraw, ${EDITS} edits (lobes and amplitude alternately), Chromium ${browser.version()}, ${WEB_DIST}`);
    console.log('One maker on the design:');
    console.log(row('  edit to every view showing it', soloShown));
    console.log(row('  edit to redraw (the last view settled)', solo));
    console.log(tasks('  long tasks', soloLongTasks));
    console.log(`One maker, every view on the screen (1280 × ${TALL_PX}):`);
    console.log(row('  edit to every view showing it', tallShown));
    console.log(row('  edit to redraw (the last view settled)', tall));
    console.log(tasks('  long tasks', tallLongTasks));
    console.log('Two makers (a second page on the design, redrawing too):');
    console.log(row('  edit to every view showing it (this page)', localShown));
    console.log(row('  edit to redraw (this page)', local));
    console.log(tasks('  long tasks on this page', longTasks));
    console.log(row('  remote edit to the field', remoteField));
    console.log(row('  remote edit to the views', remoteViews));
    console.log(row('  remote: arrived to the field', arrivedField));
    console.log(row('  remote: arrived to every view showing it', remoteShown));
    console.log(row('  remote: arrived to the views', arrivedViews));
    console.log(tasks('  long tasks on the other page', watcherLongTasks));
  } finally {
    await browser.close();
    await stopServer(server);
  }
}

/** Types `value` into the editor's field with no other page on the design; resolves with the ms from the input to the last view redrawn and to every view showing it. */
async function timeLocalEdit(editor: Page, testId: string, value: string): Promise<{ drawn: number; shown: number }> {
  await editor.evaluate(() => { const b = (window as unknown as BenchWindow).bench; b.drawn = 0; b.first = {}; b.log = []; });
  await typeOver(editor, testId, value);
  await whenDrawn(editor);
  await settle(editor);
  const e = await editor.evaluate(() => (window as unknown as BenchWindow).bench);
  if (process.env.BENCH_LOG) console.log(`${testId} = ${value}: ${[...new Set(e.log.map(([a, f, what]) => `${a}/${f} ${what}`))].join('; ')}`);
  if (process.env.BENCH_SURFACE_FILE) fs.writeFileSync(process.env.BENCH_SURFACE_FILE, JSON.stringify(await editor.evaluate(() => (window as unknown as { bench: { lastSurface: unknown } }).bench.lastSurface)));
  return { drawn: e.drawn - e.typed, shown: shownAt(e) - e.typed };
}

/**
 * Types `value` over the field's text as a maker does: the field chosen and its text selected first, then
 * the value typed, one input event. Playwright's fill() focuses, selects and types within a millisecond or
 * two, so the work of the focus and the selection (a frame, the presence sent to the server and back) fell
 * inside the edit being timed; a hand takes a tenth of a second or more between choosing a field and typing.
 */
async function typeOver(page: Page, testId: string, value: string): Promise<void> {
  await page.getByTestId(testId).selectText();
  await page.waitForTimeout(SELECTED_MS);
  await page.keyboard.insertText(value);
}

/** Resolves once the page has redrawn since its `drawn` was reset, looking every POLL_MS. */
async function whenDrawn(page: Page): Promise<void> {
  await page.waitForFunction(() => (window as unknown as BenchWindow).bench.drawn > 0, undefined, { timeout: 30_000, polling: POLL_MS });
}

/** When every view first showed the edit (the frame after the last of their first changes). */
function shownAt(b: BenchWindow['bench']): number {
  return Math.max(...Object.values(b.first));
}

/** Types `value` into the editor's field; resolves with the three times in ms. */
async function timeEdit(editor: Page, watcher: Page, testId: string, value: string) {
  await watcher.evaluate(watchField(testId, value));
  await editor.evaluate(() => { const b = (window as unknown as BenchWindow).bench; b.drawn = 0; b.first = {}; b.log = []; });
  await watcher.evaluate(() => ((window as unknown as BenchWindow).bench.updates = []));
  await typeOver(editor, testId, value);
  await whenDrawn(editor);
  await watcher.waitForFunction(() => (window as unknown as BenchWindow).bench.fieldAt > 0 && (window as unknown as BenchWindow).bench.drawn > 0, undefined, { timeout: 30_000, polling: POLL_MS }).catch(async (error) => {
    const state = await watcher.evaluate((id) => ({ bench: (window as unknown as BenchWindow).bench, value: document.querySelector<HTMLInputElement>(`[data-testid="${id}"]`)?.value, visible: document.visibilityState }), testId);
    throw new Error(`The other page did not follow the edit of ${testId} to ${value}: ${JSON.stringify(state)}`, { cause: error });
  });
  await settle(editor, watcher);
  const e = await editor.evaluate(() => (window as unknown as BenchWindow).bench);
  // BENCH_LOG=1: each drawing change of the edit (ms from the input event: changed, its frame; what changed).
  if (process.env.BENCH_LOG) console.log(`${testId} = ${value}: ${[...new Set(e.log.map(([a, f, what]) => `${a}/${f} ${what}`))].join('; ')}`);
  const w = await watcher.evaluate(() => (window as unknown as BenchWindow).bench);
  // The update that brought the value: the last to arrive before the field took it.
  const arrived = Math.max(...w.updates.filter((t) => t <= w.fieldAt));
  return { local: e.drawn - e.typed, localShown: shownAt(e) - e.typed, arrivedShown: shownAt(w) - arrived, remoteField: w.fieldAt - e.typed, remoteViews: w.drawn - e.typed, arrivedField: w.fieldAt - arrived, arrivedViews: w.drawn - arrived };
}

/** Waits until neither page has redrawn for QUIET_MS. */
async function settle(...pages: Page[]): Promise<void> {
  for (;;) {
    const last = Math.max(...(await Promise.all(pages.map((p) => p.evaluate(() => (window as unknown as BenchWindow).bench.drawn)))));
    const now = await pages[0].evaluate(() => performance.timeOrigin + performance.now());
    if (now - last >= QUIET_MS) return;
    await new Promise((r) => setTimeout(r, QUIET_MS - (now - last) + 20));
  }
}

/** Signs in twice (two contexts, the same member), makes a board and a design, opens it in both. */
async function twoStudios(browser: Browser): Promise<[Page, Page, string]> {
  const pages = await Promise.all([0, 1].map(async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await context.addInitScript({ content: INSTRUMENT });
    return context.newPage();
  }));
  for (const page of pages) {
    await page.goto(`${BASE}/account/sign-in`);
    await page.getByTestId('sign-in-email').fill('maren@example.test');
    await page.getByTestId('sign-in-password').fill(DEMO_PASSWORD);
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('account-menu').waitFor();
  }
  const [editor, watcher] = pages;
  await editor.goto(`${BASE}/boards`);
  await editor.getByTestId('board-create-name').fill(`Redraw bench ${Date.now()}`);
  await editor.getByTestId('board-create-submit').click();
  await editor.getByTestId('board-name').waitFor();
  await editor.getByTestId('design-new').click();
  await editor.getByTestId('new-design-title').fill('Redraw bench bar');
  await editor.getByTestId('new-design-preset').click();
  await editor.getByTestId('new-design-preset-example').click();
  await editor.getByTestId('new-design-create').click();
  await editor.getByTestId('studio-title').waitFor();
  const url = editor.url();
  await Promise.all([openStudio(editor, url), openStudio(watcher, url)]);
  return [editor, watcher, url];
}

/** Opens the design's studio at `url` and waits until it is live with its fields filled. */
async function openStudio(page: Page, url: string): Promise<void> {
  if (page.url() !== url) await page.goto(url);
  await page.locator('[data-testid="connection-status"][data-status="live"]').waitFor();
  await page.getByTestId('study-lit').waitFor();
  await page.waitForFunction((id) => /\d/.test(document.querySelector<HTMLInputElement>(`[data-testid="${id}"]`)?.value ?? ''), LOBES);
}

/** With BENCH_PROFILE set: the editing page's JavaScript sampled by Chromium's profiler (CDP), to find the main-thread work. */
async function startProfile(page: Page): Promise<CDPSession> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  return cdp;
}

/** The 25 functions with the most self time over the edits (a development build names them). */
async function printProfile(cdp: CDPSession): Promise<void> {
  const { profile } = await cdp.send('Profiler.stop');
  if (process.env.BENCH_PROFILE_FILE) fs.writeFileSync(process.env.BENCH_PROFILE_FILE, JSON.stringify(profile));
  const self = new Map<string, number>();
  const dt = new Map<number, number>();
  profile.samples?.forEach((id, k) => dt.set(id, (dt.get(id) ?? 0) + (profile.timeDeltas?.[k] ?? 0)));
  for (const node of profile.nodes) {
    const f = node.callFrame;
    const key = `${f.functionName || '(anonymous)'} ${f.url.split('/').pop()}:${f.lineNumber + 1}`;
    self.set(key, (self.get(key) ?? 0) + (dt.get(node.id) ?? 0) / 1000);
  }
  console.log('Main-thread self time (ms) over the edits:');
  for (const [key, ms] of [...self].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`${ms.toFixed(0).padStart(7)}  ${key}`);
}

/** With BENCH_TRACE set: the editing page's main-thread time by kind of work (Chromium's trace events, own time). */
function printTrace(buffer: Buffer): void {
  type Event = { name: string; ph: string; ts: number; dur?: number; tdur?: number; pid: number; tid: number; args?: { name?: string } };
  const events = (JSON.parse(buffer.toString()) as { traceEvents: Event[] }).traceEvents;
  // Per thread of both pages: the CPU its tasks took (thread time, which the machine's other load
  // barely changes, unlike the wall time the page's long-task observer sees) and the tasks over 50 ms of it.
  const threads = events.filter((e) => e.name === 'thread_name' && /^(CrRendererMain|DedicatedWorker thread)$/.test(e.args?.name ?? ''));
  console.log('CPU by thread over the edits (top-level tasks; thread time):');
  for (const t of threads) {
    const xs = events.filter((e) => e.pid === t.pid && e.tid === t.tid && e.ph === 'X' && e.dur).sort((a, b) => a.ts - b.ts || b.dur! - a.dur!);
    const tops: Event[] = [];
    for (const e of xs) if (!tops.length || e.ts >= tops[tops.length - 1].ts + tops[tops.length - 1].dur!) tops.push(e);
    const cpu = tops.map((e) => (e.tdur ?? e.dur!) / 1000);
    const sum = cpu.reduce((a, b) => a + b, 0);
    console.log(`  ${String(t.pid).padEnd(8)} ${t.args!.name!.padEnd(22)} ${sum.toFixed(0).padStart(6)} ms CPU, ${cpu.filter((c) => c > 50).length} tasks over 50 ms of CPU (longest ${Math.max(0, ...cpu).toFixed(0)} ms)`);
  }
  // The editing page's main thread: of the pages' main threads, the busiest (the other page is away).
  const onThread = (t: Event) => events.filter((e) => e.pid === t.pid && e.tid === t.tid && e.ph === 'X' && e.dur);
  const mains = events.filter((e) => e.name === 'thread_name' && e.args?.name === 'CrRendererMain').map(onThread);
  const mine = (mains.sort((a, b) => b.length - a.length)[0] ?? []).sort((a, b) => a.ts - b.ts);
  // Own time: an event's duration less that of the events nested in it.
  const own = new Map<string, number>();
  const stack: Event[] = [];
  for (const e of mine) {
    while (stack.length && stack[stack.length - 1].ts + stack[stack.length - 1].dur! <= e.ts) stack.pop();
    const parent = stack[stack.length - 1];
    if (parent) own.set(parent.name, (own.get(parent.name) ?? 0) - e.dur!);
    own.set(e.name, (own.get(e.name) ?? 0) + e.dur!);
    stack.push(e);
  }
  console.log('Main-thread own time by kind (ms) over the edits:');
  for (const [name, us] of [...own].sort((a, b) => b[1] - a[1]).slice(0, 15)) console.log(`${(us / 1000).toFixed(0).padStart(7)}  ${name}`);
}

/**
 * The CPU so far (Linux /proc: user plus system ticks) of this bench and every process it started (the
 * server, Chromium's processes), keyed by pid, named by what each is; other processes on the machine are
 * left out.
 */
function processCpu(): Map<string, { name: string; ms: number }> {
  const tick = 1000 / 100; // USER_HZ is 100 on Linux
  const all = new Map<string, { parent: string; name: string; ms: number }>();
  for (const pid of fs.readdirSync('/proc').filter((p) => /^\d+$/.test(p))) {
    try {
      const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' '); // fields[0] is the state, the stat's third field
      const args = fs.readFileSync(`/proc/${pid}/cmdline`, 'utf8').split(/[\0 ]/); // Chromium rewrites its own as one string
      const flag = (name: string) => args.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3);
      const program = path.basename(args[0] || stat.slice(stat.indexOf('(') + 1, stat.lastIndexOf(')')));
      const chromium = /chrom/.test(program) || args.some((a) => a.startsWith('--type='));
      const kind = chromium
        ? `chromium ${flag('type') ?? 'browser'}${flag('utility-sub-type') ? ` (${flag('utility-sub-type')})` : ''}`
        : args.some((a) => a.endsWith('main.ts')) ? 'server' : Number(pid) === process.pid ? 'bench (Playwright)' : program;
      all.set(pid, { parent: fields[1], name: kind, ms: (Number(fields[11]) + Number(fields[12])) * tick }); // ppid; utime and stime
    } catch {
      // gone meanwhile
    }
  }
  const ours = (pid: string): boolean => {
    for (let p: string | undefined = pid, hops = 0; p && hops < 64; p = all.get(p)?.parent, hops++) if (Number(p) === process.pid) return true;
    return false;
  };
  return new Map([...all].filter(([pid]) => ours(pid)).map(([pid, { name, ms }]) => [pid, { name, ms }]));
}

/** BENCH_CPU: the CPU of the bench's processes over the one-maker edits, by kind of process, per edit (a process that ended meanwhile is not counted). */
function printProcessCpu(before: Map<string, { name: string; ms: number }>, after: Map<string, { name: string; ms: number }>, edits: number): void {
  const byName = new Map<string, number>();
  for (const [pid, { name, ms }] of after) byName.set(name, (byName.get(name) ?? 0) + ms - (before.get(pid)?.ms ?? 0));
  const total = [...byName.values()].reduce((a, b) => a + b, 0);
  console.log(`CPU of the bench's processes over the one-maker edits, per edit (${(total / edits).toFixed(0)} ms in all; the bench's settling waits included):`);
  for (const [name, ms] of [...byName].sort((a, b) => b[1] - a[1]).filter(([, ms]) => ms > 0)) console.log(`${(ms / edits).toFixed(1).padStart(8)} ms  ${name}`);
}

async function startServer(): Promise<ChildProcess> {
  // A server left on the port (an earlier run's) would answer instead, with its own build.
  if (await fetch(`${BASE}/api/health`).then(() => true, () => false)) throw new Error(`Port ${PORT} already answers: stop that server or set BENCH_PORT`);
  fs.rmSync(DATA_DIR, { recursive: true, force: true });
  fs.mkdirSync(path.dirname(DATA_DIR), { recursive: true });
  const child = spawn(process.execPath, [...(process.env.BENCH_SERVER_PROFILE_DIR ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_SERVER_PROFILE_DIR}`] : []), '--import', 'tsx', 'apps/server/src/main.ts'], {
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

/** Stops the server and waits for it to go (forced after 10 s), so the next run finds the port free. */
async function stopServer(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const gone = new Promise((resolve) => child.once('exit', resolve));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
  await gone;
  clearTimeout(timer);
}

function pct(xs: number[], p: number): number {
  const sorted = [...xs].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

await main();
