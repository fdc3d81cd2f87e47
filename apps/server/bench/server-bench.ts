/**
 * Foundation figures: cold start on a new and on an existing data directory, the production
 * initial transfer size (gzip, fonts aside), sign-in throughput with argon2id, and /api/health
 * latency with 20 heavy exports in flight (the compute pool's budget), and the compiled server's
 * start against the tsx start.
 * Run with `npm run bench -w apps/server` (after `npm run build` for the transfer size).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { healthUnderHeavyExports } from './heavy-export-load';

const root = fileURLToPath(new URL('../../../', import.meta.url));

/** Starts main.ts through tsx, or with `compiled` the build in dist/server (node alone); `ms` runs from spawn to "ready". */
function startServer(dataDir: string, port: number, { compiled = false } = {}): Promise<{ ms: number; stop: () => Promise<void> }> {
  const started = performance.now();
  const child = spawn(process.execPath, compiled ? ['dist/server/main.js'] : ['--import', 'tsx', 'apps/server/src/main.ts'], {
    cwd: root,
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, HOST: '127.0.0.1' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    child.stdout.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('ready in')) {
        resolve({
          ms: performance.now() - started,
          stop: () => new Promise((r) => { child.on('exit', () => r()); child.kill('SIGTERM'); }),
        });
      }
    });
    child.on('exit', (code) => reject(new Error(`server exited with ${code}`)));
  });
}

/** Spawn-to-ready of the compiled server against the tsx start on the same data directory, taken in turns. */
async function compiledAgainstTsx(dataDir: string, port: number, runs = 3) {
  if (!fs.existsSync(path.join(root, 'dist/server/main.js'))) return undefined;
  const times = { compiled: [] as number[], tsx: [] as number[] };
  for (let i = 0; i < runs; i++) {
    for (const compiled of [true, false]) {
      const server = await startServer(dataDir, port, { compiled });
      times[compiled ? 'compiled' : 'tsx'].push(server.ms);
      await server.stop();
    }
  }
  const median = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  return { runs, compiled: median(times.compiled), tsx: median(times.tsx) };
}

function initialTransfer(): { files: number; gzipKb: number } | undefined {
  const dist = path.join(root, 'dist/web/browser');
  const indexFile = path.join(dist, 'index.html');
  if (!fs.existsSync(indexFile)) return undefined;
  const html = fs.readFileSync(indexFile, 'utf8');
  const refs = [...html.matchAll(/(?:src|href)="([^"]+\.(?:js|css))"/g)].map((m) => m[1]);
  let bytes = zlib.gzipSync(html).length;
  for (const ref of refs) bytes += zlib.gzipSync(fs.readFileSync(path.join(dist, ref))).length;
  return { files: refs.length + 1, gzipKb: bytes / 1024 };
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

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-bench-'));
const port = 3300 + Math.floor(Math.random() * 500);
const cold = await startServer(dataDir, port);
await cold.stop();
const warm = await startServer(dataDir, port);
// The sign-in limiter allows 30 per address per window; stay under it so argon2id is what is measured.
const perSecond = await signInThroughput(port, 25, 4);
const heavy = await healthUnderHeavyExports(`http://127.0.0.1:${port}`, 'maren@example.test', 'marsh-lathe-demo-2026');
await warm.stop();
const starts = await compiledAgainstTsx(dataDir, port);
fs.rmSync(dataDir, { recursive: true, force: true });
const transfer = initialTransfer();

console.log(`cold start, new data directory:      ${cold.ms.toFixed(0)} ms (migrate + seed + listen, tsx included)`);
console.log(`cold start, existing data directory: ${warm.ms.toFixed(0)} ms`);
console.log(starts ? `cold start, existing data directory, median of ${starts.runs}: compiled (node dist/server/main.js) ${starts.compiled.toFixed(0)} ms, tsx ${starts.tsx.toFixed(0)} ms` : 'compiled start: build the server first (npm run build)');
console.log(`/api/health with 20 heavy exports in flight: p95 ${heavy.p95.toFixed(1)} ms, max ${heavy.max.toFixed(1)} ms over ${heavy.probes} probes (after their arrival: p95 ${heavy.settledP95.toFixed(1)} ms; target < 100 ms); exports ${heavy.ok} × 200, ${heavy.busy} × 503${heavy.other ? `, ${heavy.other} other` : ''}`);
console.log(`sign-in throughput (argon2id m=19 MiB t=2 p=1, ${os.cpus().length} cores): ${perSecond.toFixed(1)} per second`);
console.log(transfer ? `initial transfer (gzip, fonts aside): ${transfer.gzipKb.toFixed(1)} kB in ${transfer.files} files (target < 250 kB)` : 'initial transfer: build the web app first (npm run build)');
