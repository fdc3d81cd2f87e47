import net from 'node:net';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { startServerProcess } from './server-process';
import { startRoundRobinProxy } from './round-robin-proxy';
import { createServerDatabase } from './test-database';

type ServerProcess = Awaited<ReturnType<typeof startServerProcess>>;

/** A free TCP port on loopback (released before the server takes it). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** An empty database of its own on the test PostgreSQL server; `drop` removes it. */
export const createTestDatabaseUrl = () => createServerDatabase('barwright_pair');

export interface ServerPair {
  a: ServerProcess;
  b: ServerProcess;
  /** The round-robin proxy in front of both. */
  proxyUrl: string;
  databaseUrl: string;
  markDown(server: ServerProcess): void;
  close(): Promise<void>;
}

/**
 * Two real server processes (main.ts) on one new PostgreSQL database, started together, with
 * `env` (REDIS_URL, …) and a shared SESSION_SECRET, behind a round-robin proxy.
 */
export async function startServerPair(env: Record<string, string> = {}): Promise<ServerPair> {
  const database = await createTestDatabaseUrl();
  const secret = randomBytes(32).toString('base64url');
  const dirs = [0, 1].map(() => fs.mkdtempSync(path.join(os.tmpdir(), 'bw-pair-')));
  const ports = [await freePort(), await freePort()];
  // A Redis prefix of its own: rate-limit counters and socket.io streams of other runs stay apart.
  const common = { DATABASE_URL: database.url, SESSION_SECRET: secret, REDIS_PREFIX: `barwright-test-${randomBytes(4).toString('hex')}`, ...env };
  const started = await Promise.allSettled(
    dirs.map((dir, i) => startServerProcess({ PORT: String(ports[i]), DATA_DIR: dir, ...common })),
  );
  const servers = started.flatMap((s) => (s.status === 'fulfilled' ? [s.value] : []));
  const cleanup = async () => {
    await Promise.all(servers.map((s) => stopProcess(s)));
    for (const dir of dirs) fs.rmSync(dir, { recursive: true, force: true });
    await database.drop();
  };
  const failed = started.find((s) => s.status === 'rejected');
  if (failed) {
    await cleanup();
    throw (failed as PromiseRejectedResult).reason;
  }
  const [a, b] = servers;
  const proxy = await startRoundRobinProxy([a.baseUrl, b.baseUrl]);
  return {
    a,
    b,
    proxyUrl: proxy.url,
    databaseUrl: database.url,
    markDown: (s) => proxy.markDown(s.baseUrl),
    close: async () => {
      await proxy.close();
      await cleanup();
    },
  };
}

/** SIGTERM, then SIGKILL after 5 s; resolves once the process has gone. */
export async function stopProcess(s: ServerProcess): Promise<void> {
  if (s.child.exitCode !== null || s.child.signalCode !== null) return;
  const gone = new Promise((r) => s.child.once('exit', r));
  s.child.kill('SIGTERM');
  const timer = setTimeout(() => s.child.kill('SIGKILL'), 5000);
  await gone;
  clearTimeout(timer);
}
