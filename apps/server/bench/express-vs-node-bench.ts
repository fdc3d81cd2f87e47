/**
 * Express against bare node:http, in the same run: `/api/health` and an Explore page (the same
 * query code, the same JSON body), each path loaded with autocannon in turns (Express, node:http,
 * Express, …), the median of the rounds reported with the ratio. The servers run in a child
 * process of their own so the load generator does not share their event loop. Two ratios: requests
 * per second (what a client sees; on a machine shared with other work it swings from run to run) and
 * the server process's CPU time per request (user + system, steadier under load: the throughput one
 * core would give).
 * Run with `node --import tsx apps/server/bench/express-vs-node-bench.ts` (part of `npm run bench -w apps/server`).
 * Target: Express at 50 % or more of node:http on both paths.
 */
import http from 'node:http';
import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { exploreQuery, type Health } from '@barwright/contracts';
import { explorePage } from '../src/explore/explore-query';
import { openTestDatabase } from '../src/testing/test-database';
import { startTestServer } from '../src/testing/test-app';
import { seedExplore } from './explore-bench-seed';
import { withLiveness } from '../src/http/liveness';

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 4);
const CONNECTIONS = 10;
const TARGET = 0.5;
const PATHS = ['/api/health', '/api/entries?sort=top&page=2'];

/** The child: both servers over one in-memory PGlite with 2 000 published entries; prints their ports. */
async function serve() {
  const database = await openTestDatabase('pglite');
  await seedExplore(database.db, { members: 200, entries: 2_000, ratingsPerEntry: 5 });
  const server = await startTestServer(database);
  // As main.ts serves it: liveness answered by the listener before Express, everything else by Express.
  const express = http.createServer(withLiveness(server.app, database.kind));
  // The bare server answers the same two paths with the same bodies: health as is, Explore through the
  // same query schema and query function.
  const bare = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://x');
    const send = (status: number, body: unknown) => {
      const text = JSON.stringify(body);
      res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'content-length': Buffer.byteLength(text) });
      res.end(text);
    };
    if (url.pathname === '/api/health') return send(200, { status: 'ok', database: database.kind } satisfies Health);
    if (url.pathname === '/api/entries') {
      const parsed = exploreQuery.safeParse(Object.fromEntries(url.searchParams));
      if (!parsed.success) return send(400, { error: { code: 'invalid_input' } });
      explorePage(database.db, parsed.data).then((page) => send(200, page), () => send(500, {}));
      return;
    }
    send(404, {});
  });
  await Promise.all([express, bare].map((s) => new Promise<void>((r) => s.listen(0, '127.0.0.1', r))));
  const port = (s: http.Server) => (s.address() as { port: number }).port;
  console.log(JSON.stringify({ express: port(express), bare: port(bare) }));
  for (const signal of ['SIGTERM', 'SIGINT']) process.on(signal, () => process.exit(0)); // exits normally, so --cpu-prof writes its profile
  process.on('message', () => process.send!(process.cpuUsage()));
}

/** The server process's CPU time so far (µs), asked over IPC. */
function serverCpu(child: ChildProcess): Promise<number> {
  return new Promise((resolve) => {
    child.once('message', (usage) => resolve((usage as NodeJS.CpuUsage).user + (usage as NodeJS.CpuUsage).system));
    child.send('cpu');
  });
}

async function load(child: ChildProcess, url: string): Promise<{ rps: number; cpuUs: number; bytes: number; errors: number }> {
  const before = await serverCpu(child);
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS });
  const cpu = (await serverCpu(child)) - before;
  return {
    rps: result.requests.average,
    cpuUs: cpu / Math.max(1, result.requests.total),
    bytes: result.throughput.average / Math.max(1, result.requests.average),
    errors: result.errors + result.non2xx,
  };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const child = spawn(process.execPath, ['--import', 'tsx', fileURLToPath(import.meta.url), '--serve'], { stdio: ['ignore', 'pipe', 'inherit', 'ipc'] });
  const ports = await new Promise<{ express: number; bare: number }>((resolve, reject) => {
    let out = '';
    child.stdout!.on('data', (chunk: Buffer) => {
      out += chunk;
      const line = out.split('\n').find((l) => l.startsWith('{'));
      if (line) resolve(JSON.parse(line));
    });
    child.on('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  let failed = false;
  try {
    console.log(`Express against bare node:http, ${CONNECTIONS} connections, ${SECONDS} s a run, ${ROUNDS} rounds in turns, medians:`);
    for (const path of PATHS) {
      const rps = { express: [] as number[], bare: [] as number[] };
      const cpu = { express: [] as number[], bare: [] as number[] };
      let bytes = { express: 0, bare: 0 };
      for (let round = 0; round < ROUNDS; round++) {
        for (const side of round % 2 ? (['bare', 'express'] as const) : (['express', 'bare'] as const)) {
          const r = await load(child, `http://127.0.0.1:${ports[side]}${path}`);
          if (r.errors) {
            console.error(`${side} ${path}: ${r.errors} errors or non-2xx answers`);
            failed = true;
          }
          rps[side].push(r.rps);
          cpu[side].push(r.cpuUs);
          bytes = { ...bytes, [side]: r.bytes };
        }
      }
      const ratio = median(rps.express) / median(rps.bare);
      const cpuRatio = median(cpu.bare) / median(cpu.express);
      const list = (xs: number[]) => xs.map((x) => x.toFixed(0)).join(', ');
      console.log(
        `${path}\n  requests/s: Express ${median(rps.express).toFixed(0)} (${list(rps.express)}), node:http ${median(rps.bare).toFixed(0)} (${list(rps.bare)}): ` +
          `${(ratio * 100).toFixed(0)} % (target ≥ ${TARGET * 100} %: ${ratio >= TARGET ? 'met' : 'not met'})\n` +
          `  CPU µs a request: Express ${median(cpu.express).toFixed(0)} (${list(cpu.express)}), node:http ${median(cpu.bare).toFixed(0)} (${list(cpu.bare)}): ` +
          `Express at ${(cpuRatio * 100).toFixed(0)} % of node:http's throughput a core (target ≥ ${TARGET * 100} %: ${cpuRatio >= TARGET ? 'met' : 'not met'})\n` +
          `  bytes a response: Express ${bytes.express.toFixed(0)}, node:http ${bytes.bare.toFixed(0)}`,
      );
    }
  } finally {
    child.kill('SIGTERM');
  }
  if (failed) process.exitCode = 1; // a wrong answer fails the run; a slow machine does not
}

if (process.argv.includes('--serve')) await serve();
else await main();
