/**
 * Realtime figures (issue: the studio): edit-to-remote-apply latency through the server with 2, 20
 * and 100 clients on one document (p50, p95), bytes stored per edit, memory per open document and
 * of the server with 100 clients on 10 documents, and load time of a document with 10 000 stored
 * updates with and without compaction. Everything on loopback, in one process.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import * as Y from 'yjs';
import { setDesignField } from '@barwright/contracts/design-doc';
import { designUpdates } from '../../../db/schema';
import type { AppLocals } from '../src/app';
import { BoardAccessEvents } from '../src/boards/board-access';
import { CollabGateway } from '../src/realtime/collab-gateway';
import { openTestDatabase } from '../src/testing/test-database';
import { Client, makeUser, sidOf, startTestServer } from '../src/testing/test-app';
import { collabClient } from '../src/testing/collab-client';
import { percentile, timeLobeEdit } from './edit-latency';

process.setMaxListeners(0); // every y-websocket client adds an exit listener


const database = await openTestDatabase('pglite');
const accessEvents = new BoardAccessEvents();
const server = await startTestServer(database, { accessEvents });
const httpServer = http.createServer(server.app);
// One account opens all the benchmark's sockets and makes every edit: lift its socket caps and update allowance (the latency is measured, not the limits).
const gateway = new CollabGateway({ db: database.db, sessionParser: (server.app.locals as AppLocals).sessionParser, accessEvents, limits: { socketsPerSession: 1000, socketsPerUser: 1000, updates: { burst: 100_000, perSecond: 100_000 } } });
gateway.attach(httpServer);
await new Promise<void>((r) => httpServer.listen(0, '127.0.0.1', r));
const baseUrl = `http://127.0.0.1:${(httpServer.address() as AddressInfo).port}`;
await makeUser(database, 'bench@example.test');
const owner = new Client(server.app);
const cookie = sidOf(await owner.signIn('bench@example.test'))!;
const boardId = (await owner.post('/api/boards', { name: 'Bench' })).body.id;
const newDesign = async () => (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Bench' })).body.id as string;

async function latency(clients: number, edits: number) {
  const designId = await newDesign();
  const peers = Array.from({ length: clients }, () => collabClient(baseUrl, designId, cookie));
  await Promise.all(peers.map((p) => p.synced()));
  const samples: number[] = [];
  const watcher = peers[peers.length - 1];
  for (let i = 0; i < edits; i++) {
    samples.push(await timeLobeEdit(peers[i % (peers.length - 1)], watcher, i));
  }
  for (const p of peers) p.destroy();
  return { p50: percentile(samples, 50), p95: percentile(samples, 95) };
}

for (const n of [2, 20, 100]) {
  const r = await latency(n, n === 100 ? 100 : 200);
  console.log(`edit-to-remote-apply, ${String(n).padStart(3)} clients: p50 ${r.p50.toFixed(1)} ms, p95 ${r.p95.toFixed(1)} ms (target p95 < 50 ms at 100)`);
}

// Several instances: 100 clients over two server processes on PostgreSQL and Redis against one, and memory per instance.
await (await import('./instances-bench')).benchInstances();

// Bytes stored per edit: one lobe change as the y-websocket client sends it.
{
  const doc = new Y.Doc();
  const designId = await newDesign();
  Y.applyUpdate(doc, await gateway.store.loadUpdate(designId));
  const sizes: number[] = [];
  doc.on('update', (u: Uint8Array) => sizes.push(u.length));
  for (let i = 0; i < 100; i++) setDesignField(doc, ['rosette', 'layers', 0, 'lobes'], 3 + i);
  for (let i = 0; i < 100; i++) doc.getText('notes').insert(i, 'a');
  console.log(`bytes stored per edit: lobe change ${percentile(sizes.slice(0, 100), 50)} B, one typed character ${percentile(sizes.slice(100), 50)} B (plus a row's overhead)`);
}

// Memory: the real server as its own process, with 100 clients on 10 documents (its resident set from /proc),
// on embedded PGlite (which holds the whole database engine in the process) and on a PostgreSQL server.
for (const mode of ['pglite', 'postgres'] as const) {
  let databaseUrl: string | undefined;
  let dropDb = async () => {};
  if (mode === 'postgres') {
    const { postgresAnswers, TEST_POSTGRES_URL } = await import('../src/testing/test-database');
    if (!(await postgresAnswers())) {
      console.log('server memory on PostgreSQL: skipped (no server at 127.0.0.1:5432)');
      continue;
    }
    const pg = (await import('pg')).default;
    const name = `barwright_bench_${Date.now()}`;
    const admin = new pg.Client({ connectionString: TEST_POSTGRES_URL });
    await admin.connect();
    await admin.query(`CREATE DATABASE "${name}"`);
    await admin.end();
    const u = new URL(TEST_POSTGRES_URL);
    u.pathname = `/${name}`;
    databaseUrl = u.toString();
    dropDb = async () => {
      const c = new pg.Client({ connectionString: TEST_POSTGRES_URL });
      await c.connect();
      await c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await c.end();
    };
  }
  const fs = await import('node:fs');
  const os = await import('node:os');
  const path = await import('node:path');
  const { HttpSession, startServerProcess } = await import('../src/testing/server-process');
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-mem-'));
  const proc = await startServerProcess({ PORT: String(3900 + Math.floor(Math.random() * 90)), DATA_DIR: dataDir, ...(databaseUrl ? { DATABASE_URL: databaseUrl, SESSION_SECRET: 'bench-'.padEnd(40, 'x') } : {}) });
  const rss = () => Number(fs.readFileSync(`/proc/${proc.child.pid}/status`, 'utf8').match(/VmRSS:\s+(\d+)/)![1]) / 1024;
  const s = new HttpSession(proc.baseUrl);
  const password = 'quiet-walnut-crosscut-49';
  await s.request('POST', '/api/auth/sign-up', { email: 'mem@example.test', password, displayName: 'Mem' });
  await s.request('POST', '/api/auth/sign-in', { email: 'mem@example.test', password });
  const board = (await s.request('POST', '/api/boards', { name: 'Memory' })).body.id;
  const ids: string[] = [];
  for (let i = 0; i < 10; i++) ids.push((await s.request('POST', `/api/boards/${board}/designs`, { title: `M${i}` })).body.id);
  // A session may open 16 collab sockets and an account 48 (realtime-limits.ts): 3 members, 4 sessions each.
  const cookies: string[] = [];
  for (const who of ['mem', 'mem2', 'mem3']) {
    const email = `${who}@example.test`;
    if (who !== 'mem') {
      const invitee = new HttpSession(proc.baseUrl);
      await invitee.request('POST', '/api/auth/sign-up', { email, password, displayName: who });
      await s.request('POST', `/api/boards/${board}/invitations`, { email, role: 'editor' });
      const mail = ((await s.request('GET', '/api/dev/mailbox')).body as { to: string[]; text: string }[]).find((m) => m.to.includes(email) && /invitations\/accept\?token=/.test(m.text))!;
      await invitee.request('POST', '/api/auth/sign-in', { email, password });
      await invitee.request('POST', '/api/invitations/accept', { token: mail.text.match(/accept\?token=([A-Za-z0-9_-]+)/)![1] });
    }
    for (let i = 0; i < 4; i++) {
      const session = new HttpSession(proc.baseUrl);
      await session.request('POST', '/api/auth/sign-in', { email, password });
      cookies.push(session.cookieHeader);
    }
  }
  const idle = rss();
  const peers = ids.flatMap((id, d) => Array.from({ length: 10 }, (_, i) => collabClient(proc.baseUrl, id, cookies[(d * 10 + i) % cookies.length])));
  await Promise.all(peers.map((p) => p.synced()));
  for (const [i, p] of peers.entries()) setDesignField(p.doc, ['bar', 'length'], 100 + i);
  await new Promise((r) => setTimeout(r, 1000));
  const busy = rss();
  console.log(`server memory on ${mode}: ${idle.toFixed(0)} MB resident idle, ${busy.toFixed(0)} MB with 100 clients on 10 documents (target < 400 MB); about ${(((busy - idle) * 1024) / 10).toFixed(0)} kB per open document with its 10 sockets (target < 1 MB)`);
  for (const p of peers) p.destroy();
  proc.child.kill('SIGTERM');
  await new Promise((r) => proc.child.once('exit', r));
  fs.rmSync(dataDir, { recursive: true, force: true });
  await dropDb();
}

// Load time with 10 000 stored updates, before and after compaction.
{
  const designId = await newDesign();
  const doc = new Y.Doc();
  Y.applyUpdate(doc, await gateway.store.loadUpdate(designId));
  const rows: Uint8Array[] = [];
  doc.on('update', (u: Uint8Array) => rows.push(u));
  for (let i = 0; i < 10_000; i++) {
    if (i % 2) setDesignField(doc, ['rosette', 'layers', 0, 'lobes'], 1 + (i % 300));
    else doc.getText('notes').insert(doc.getText('notes').length, String(i % 10));
  }
  for (let i = 0; i < rows.length; i += 500) {
    await database.db.insert(designUpdates).values(rows.slice(i, i + 500).map((update) => ({ designId, update })));
  }
  const time = async () => {
    const t = performance.now();
    await gateway.store.loadDoc(designId);
    return performance.now() - t;
  };
  const raw = await time();
  const t0 = performance.now();
  await gateway.store.compact(designId);
  const compactMs = performance.now() - t0;
  const compacted = await time();
  console.log(`load with 10 000 stored updates: ${raw.toFixed(0)} ms uncompacted, ${compacted.toFixed(1)} ms compacted (target < 200 ms); compaction took ${compactMs.toFixed(0)} ms`);
}

await gateway.close();
httpServer.closeAllConnections();
httpServer.close();
await server.close();
await database.close();
process.exit(0);
