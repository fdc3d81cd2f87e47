/**
 * Express against bare node:http, in the same run: `/api/health` and an Explore page (the same
 * query code, the same JSON body), each path loaded with autocannon in turns (Express, node:http,
 * Express, …), the median of the rounds reported with the ratio. The servers run in a child
 * process of their own so the load generator does not share their event loop.
 * Run with `node --import tsx apps/server/bench/express-vs-node-bench.ts` (part of `npm run bench -w apps/server`).
 * Target: Express at 50 % or more of node:http on both paths.
 */
import http from 'node:http';
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { exploreQuery, type Health } from '@barwright/contracts';
import { explorePage } from '../src/explore/explore-query';
import { openTestDatabase } from '../src/testing/test-database';
import { startTestServer } from '../src/testing/test-app';
import { seedExplore } from './explore-bench-seed';

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
  const express = http.createServer(server.app);
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
}

async function load(url: string): Promise<{ rps: number; bytes: number; errors: number }> {
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS });
  return { rps: result.requests.average, bytes: result.throughput.average / Math.max(1, result.requests.average), errors: result.errors + result.non2xx };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const child = spawn(process.execPath, ['--import', 'tsx', fileURLToPath(import.meta.url), '--serve'], { stdio: ['ignore', 'pipe', 'inherit'] });
  const ports = await new Promise<{ express: number; bare: number }>((resolve, reject) => {
    let out = '';
    child.stdout.on('data', (chunk: Buffer) => {
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
      let bytes = { express: 0, bare: 0 };
      for (let round = 0; round < ROUNDS; round++) {
        for (const side of round % 2 ? (['bare', 'express'] as const) : (['express', 'bare'] as const)) {
          const r = await load(`http://127.0.0.1:${ports[side]}${path}`);
          if (r.errors) {
            console.error(`${side} ${path}: ${r.errors} errors or non-2xx answers`);
            failed = true;
          }
          rps[side].push(r.rps);
          bytes = { ...bytes, [side]: r.bytes };
        }
      }
      const ratio = median(rps.express) / median(rps.bare);
      console.log(
        `${path.padEnd(30)} Express ${median(rps.express).toFixed(0).padStart(6)} req/s (${rps.express.map((x) => x.toFixed(0)).join(', ')}), ` +
          `node:http ${median(rps.bare).toFixed(0).padStart(6)} req/s (${rps.bare.map((x) => x.toFixed(0)).join(', ')}); ` +
          `ratio ${(ratio * 100).toFixed(0)} % (target ≥ ${TARGET * 100} %: ${ratio >= TARGET ? 'met' : 'not met'}); bytes a response ${bytes.express.toFixed(0)} / ${bytes.bare.toFixed(0)}`,
      );
    }
  } finally {
    child.kill('SIGTERM');
  }
  if (failed) process.exitCode = 1; // a wrong answer fails the run; a slow machine does not
}

if (process.argv.includes('--serve')) await serve();
else await main();
