/**
 * Foundation figures, each as a client sees it: spawn to `/api/health/ready` answering 200 for the
 * compiled server (`node dist/server/main.js`, what `npm start` runs) on a new and on an existing
 * data directory (medians of several starts), its resident memory idle and at its peak, the initial
 * transfer as sent (index.html and the files it names, fetched with `Accept-Encoding: br, gzip`, the
 * bytes on the wire), sign-in throughput with argon2id, and /api/health latency with 20 heavy exports
 * in flight (the compute pool's budget). Route chunks a page loads later are in the browser benchmark
 * (apps/web/bench). Run with `npm run bench -w apps/server` after `npm run build`.
 */
import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { healthUnderHeavyExports } from './heavy-export-load';
import { measureStart, type StartFigures } from './start-memory';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const COMPILED = 'dist/server/main.js';
const STARTS = Number(process.env.BENCH_STARTS ?? 3);
const TARGETS = { existingReadyS: 3, newReadyS: 10, idleMb: 300, newPeakMb: 500 };

const startCompiled = (dataDir: string, port: number): Promise<StartFigures> =>
  measureStart({ cwd: root, args: [COMPILED], env: { DATA_DIR: dataDir }, port, idleMs: 3000, timeoutMs: 180_000 });

/** The GET's bytes as they arrive (no decoding), with the encoding the server chose. */
function wireBytes(url: string): Promise<{ bytes: number; encoding?: string; body: Buffer }> {
  return new Promise((resolve, reject) => {
    http.get(url, { headers: { 'accept-encoding': 'br, gzip' } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ bytes: Buffer.concat(chunks).length, encoding: res.headers['content-encoding'], body: Buffer.concat(chunks) }));
    }).on('error', reject);
  });
}

/** index.html and the scripts and styles it names, as the server sends them (fonts aside). */
async function initialTransfer(base: string): Promise<{ files: number; kB: number; rawKB: number; encodings: string } | undefined> {
  const dist = path.join(root, 'dist/web/browser');
  const indexFile = path.join(dist, 'index.html');
  if (!fs.existsSync(indexFile)) return undefined;
  const html = fs.readFileSync(indexFile, 'utf8');
  const refs = ['/', ...[...html.matchAll(/(?:src|href)="([^"]+\.(?:js|css))"/g)].map((m) => '/' + m[1].replace(/^\//, ''))];
  let bytes = 0;
  let raw = 0;
  const encodings = new Set<string>();
  for (const ref of refs) {
    const got = await wireBytes(base + ref);
    bytes += got.bytes;
    encodings.add(got.encoding ?? 'none');
    raw += fs.statSync(path.join(dist, ref === '/' ? 'index.html' : ref)).size;
  }
  return { files: refs.length, kB: bytes / 1024, rawKB: raw / 1024, encodings: [...encodings].join('/') };
}

async function signInThroughput(port: number, total: number, concurrency: number) {
  const base = `http://127.0.0.1:${port}`;
  const one = async () => {
    const first = await fetch(`${base}/api/auth/me`);
    const cookies = first.headers.getSetCookie().map((c) => c.split(';')[0]);
    const xsrf = cookies.find((c) => c.startsWith('XSRF-TOKEN='))!.slice('XSRF-TOKEN='.length);
    const res = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-xsrf-token': xsrf, cookie: cookies.join('; '), 'x-forwarded-for': '' },
      body: JSON.stringify({ email: 'maren@example.test', password: 'marsh-lathe-demo-2026' }),
    });
    if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
  };
  const started = performance.now();
  let next = 0;
  await Promise.all(Array.from({ length: concurrency }, async () => { while (next++ < total) await one(); }));
  return (total / (performance.now() - started)) * 1000;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const mb = (x?: number) => (x === undefined ? 'n/a' : `${x.toFixed(0)} MB`);
if (!fs.existsSync(path.join(root, COMPILED))) {
  console.error(`${COMPILED} is missing: run \`npm run build\` first`);
  process.exit(1);
}
const base = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-bench-'));
const port = 3300 + Math.floor(Math.random() * 500);
const fresh: StartFigures[] = [];
for (let i = 0; i < Math.max(1, STARTS - 1); i++) {
  const s = await startCompiled(path.join(base, `new-${i}`), port);
  fresh.push(s);
  await s.stop();
}
const existingDir = path.join(base, 'new-0');
const existing: StartFigures[] = [];
for (let i = 0; i < STARTS; i++) {
  const s = await startCompiled(existingDir, port);
  existing.push(s);
  if (i < STARTS - 1) await s.stop();
}
const running = existing[existing.length - 1];
const url = `http://127.0.0.1:${port}`;
const transfer = await initialTransfer(url);
// The sign-in limiter allows 30 per address per window; stay under it so argon2id is what is measured.
const perSecond = await signInThroughput(port, 25, 4);
const heavy = await healthUnderHeavyExports(url, 'maren@example.test', 'marsh-lathe-demo-2026');
await running.stop();
fs.rmSync(base, { recursive: true, force: true });

const readyNew = median(fresh.map((s) => s.readyMs)) / 1000;
const readyExisting = median(existing.map((s) => s.readyMs)) / 1000;
const idle = median(existing.map((s) => s.idleRssMb ?? NaN));
const peakNew = Math.max(...fresh.map((s) => s.peakRssMb ?? NaN));
const met = (ok: boolean) => (ok ? 'met' : 'not met');
console.log(`compiled server, spawn to ready (GET /api/health/ready 200), ${os.cpus().length} cores, load average ${os.loadavg()[0].toFixed(1)}:`);
console.log(`  new data directory (template + migrations + demo seed): median ${readyNew.toFixed(1)} s of ${fresh.length} (${fresh.map((s) => (s.readyMs / 1000).toFixed(1)).join(', ')}) (target < ${TARGETS.newReadyS} s: ${met(readyNew < TARGETS.newReadyS)})`);
console.log(`  existing data directory: median ${readyExisting.toFixed(1)} s of ${existing.length} (${existing.map((s) => (s.readyMs / 1000).toFixed(1)).join(', ')}) (target < ${TARGETS.existingReadyS} s: ${met(readyExisting < TARGETS.existingReadyS)})`);
console.log(`resident memory: idle on the existing demo directory ${mb(idle)} (target < ${TARGETS.idleMb} MB: ${met(idle < TARGETS.idleMb)}); creating a new directory, peak ${mb(peakNew)} (target < ${TARGETS.newPeakMb} MB: ${met(peakNew < TARGETS.newPeakMb)}), then idle ${mb(median(fresh.map((s) => s.idleRssMb ?? NaN)))}`);
console.log(`/api/health with 20 heavy exports in flight: p95 ${heavy.p95.toFixed(1)} ms, max ${heavy.max.toFixed(1)} ms over ${heavy.probes} probes (after their arrival: p95 ${heavy.settledP95.toFixed(1)} ms; target < 100 ms); exports ${heavy.ok} × 200, ${heavy.busy} × 503${heavy.other ? `, ${heavy.other} other` : ''}`);
console.log(`sign-in throughput (argon2id m=19 MiB t=2 p=1, ${os.cpus().length} cores): ${perSecond.toFixed(1)} per second`);
console.log(transfer ? `initial transfer as sent (index.html and the ${transfer.files - 1} files it names, ${transfer.encodings}; fonts and route chunks aside): ${transfer.kB.toFixed(1)} kB (${transfer.rawKB.toFixed(0)} kB as built; target < 250 kB)` : 'initial transfer: build the web app first (npm run build)');
