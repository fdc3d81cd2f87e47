/**
 * Several instances: edit-to-remote-apply latency (p50, p95) with 100 clients on one design spread
 * over two server processes on PostgreSQL and Redis (the edit made on A, watched on B), against
 * one process on the same database kind in the same run; and each instance's resident memory.
 * Skipped, and said so, when PostgreSQL or Redis does not answer. Run by collab-bench.ts, or alone.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { collabClient } from '../src/testing/collab-client';
import { percentile, timeLobeEdit } from './edit-latency';
import { createTestDatabaseUrl, freePort, startServerPair, stopProcess } from '../src/testing/server-pair';
import { startServerProcess } from '../src/testing/server-process';
import { signedUpAccount } from '../src/testing/pair-accounts';
import { postgresAnswers } from '../src/testing/test-database';
import { redisAnswers, TEST_REDIS_URL } from '../src/testing/test-redis';

process.setMaxListeners(0);
const rssMb = (pid: number) => Number(fs.readFileSync(`/proc/${pid}/status`, 'utf8').match(/VmRSS:\s+(\d+)/)![1]) / 1024;
const CLIENTS = 100;
const EDITS = 100;

/** 100 clients, alternating between `writerBase` and `watcherBase`; one on each side writes and watches. */
async function latency(writerBase: string, watcherBase: string, designId: string, cookies: string[]) {
  const peers = Array.from({ length: CLIENTS }, (_, i) => collabClient(i % 2 ? watcherBase : writerBase, designId, cookies[i % cookies.length]));
  await Promise.all(peers.map((p) => p.synced()));
  const writer = peers[0];
  const watcher = peers[1];
  const samples: number[] = [];
  for (let i = 0; i < EDITS; i++) {
    samples.push(await timeLobeEdit(writer, watcher, i));
  }
  for (const p of peers) p.destroy();
  return { p50: percentile(samples, 50), p95: percentile(samples, 95) };
}

/** A design on a board of 10 members (a session may open 16 collab sockets, realtime-limits.ts): 10 clients each. */
async function designFor(baseUrl: string, databaseUrl: string) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: 2 });
  const owner = await signedUpAccount(baseUrl, pool, 'Bench');
  const board = (await owner.http.request('POST', '/api/boards', { name: 'Bench' })).body.id;
  const designId = (await owner.http.request('POST', `/api/boards/${board}/designs`, { title: 'Bench' })).body.id as string;
  const cookies = [owner.cookie()];
  for (let i = 1; i < 10; i++) {
    const member = await signedUpAccount(baseUrl, pool, `Member${i}`);
    await pool.query(`insert into board_members (board_id, user_id, role) values ($1, $2, 'editor')`, [board, member.id]);
    cookies.push(member.cookie());
  }
  await pool.end();
  return { designId, cookies };
}

export async function benchInstances(): Promise<void> {
  if (!(await postgresAnswers()) || !(await redisAnswers())) {
    console.log(`two instances: skipped (needs PostgreSQL at 127.0.0.1:5432 and Redis at ${TEST_REDIS_URL})`);
    return;
  }
  // One instance on PostgreSQL, no Redis.
  const database = await createTestDatabaseUrl();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-one-'));
  const one = await startServerProcess({ PORT: String(await freePort()), DATA_DIR: dataDir, DATABASE_URL: database.url, SESSION_SECRET: randomBytes(32).toString('hex') });
  const single = await designFor(one.baseUrl, database.url);
  const alone = await latency(one.baseUrl, one.baseUrl, single.designId, single.cookies);
  await stopProcess(one);
  fs.rmSync(dataDir, { recursive: true, force: true });
  await database.drop();

  const pair = await startServerPair({ REDIS_URL: TEST_REDIS_URL });
  const shared = await designFor(pair.a.baseUrl, pair.databaseUrl);
  const idle = [pair.a, pair.b].map((s) => rssMb(s.child.pid!));
  const across = await latency(pair.a.baseUrl, pair.b.baseUrl, shared.designId, shared.cookies);
  const busy = [pair.a, pair.b].map((s) => rssMb(s.child.pid!));
  await pair.close();

  const f = (x: number) => x.toFixed(1);
  console.log(`edit-to-remote-apply, ${CLIENTS} clients, one instance (PostgreSQL): p50 ${f(alone.p50)} ms, p95 ${f(alone.p95)} ms`);
  console.log(`edit-to-remote-apply, ${CLIENTS} clients over two instances (PostgreSQL + Redis, edit on A, seen on B): p50 ${f(across.p50)} ms, p95 ${f(across.p95)} ms (target p95 < 50 ms and within 2× of one instance: ${f(across.p95 / alone.p95)}×)`);
  console.log(`memory per instance: ${idle.map((m) => m.toFixed(0)).join(' / ')} MB resident idle, ${busy.map((m) => m.toFixed(0)).join(' / ')} MB after the run with 50 clients each`);
}

if (path.resolve(process.argv[1] ?? '') === fileURLToPath(import.meta.url)) {
  await benchInstances();
  process.exit(0);
}
