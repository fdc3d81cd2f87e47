import fs from 'node:fs';
import v8 from 'node:v8';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type pg from 'pg';
import * as schema from '../../../../db/schema';
import { ADVISORY_LOCKS } from './advisory-locks';

export type Schema = typeof schema;
/** The one database type the services use, whichever driver is underneath. */
export type Db = PgDatabase<PgQueryResultHKT, Schema>;

export interface Database {
  db: Db;
  kind: 'pglite' | 'postgres';
  close(): Promise<void>;
}

// The repository's db/migrations under tsx; the copy beside the bundle in a build (dist/server/migrations).
export const MIGRATIONS_FOLDER = fileURLToPath(new URL(import.meta.url.endsWith('.ts') ? '../../../../db/migrations' : './migrations', import.meta.url));

// The pristine database scripts/pglite-template.mjs makes at build time (dist/pglite-template), the same
// file from apps/server/src/database under tsx and from dist/server in a build.
export const PGLITE_TEMPLATE = fileURLToPath(new URL(import.meta.url.endsWith('.ts') ? '../../../../dist/pglite-template/data.tar.gz' : '../pglite-template/data.tar.gz', import.meta.url));

export type DatabaseTarget =
  // no dataDir: in memory. `template`: a tarball a new data directory starts from instead of running initdb.
  | { kind: 'pglite'; dataDir?: string; template?: string }
  | { kind: 'postgres'; url: string };

/**
 * PostgreSQL settings for the embedded database, sized for one server process rather than a database
 * server of its own: initdb writes shared_buffers = 128MB into a new data directory, and PGlite's
 * memory (WebAssembly, never given back) grows into it. With these the process idles near a third
 * of its former size; Explore's pages stay within their target (apps/server/bench/explore-bench.ts).
 */
export const PGLITE_SETTINGS: Record<string, string> = {
  shared_buffers: '16MB',
  work_mem: '4MB',
  maintenance_work_mem: '16MB',
  temp_buffers: '2MB',
  wal_buffers: '1MB',
  max_connections: '5', // one backend in single-user mode; shared memory is sized by this
};

/** PGlite's own start parameters (its defaults, which `startParams` replaces) and ours. */
function pgliteStartParams(): string[] {
  const defaults = (PGlite as unknown as { defaultStartParams?: string[] }).defaultStartParams ?? [];
  return [...defaults, ...Object.entries(PGLITE_SETTINGS).flatMap(([name, value]) => ['-c', `${name}=${value}`])];
}

/**
 * PGlite's WebAssembly is compiled by V8's baseline compiler only (Liftoff): the optimising tier
 * would recompile the whole of PostgreSQL in the background, which costs about 100 MB of resident
 * memory and seconds of CPU at every start, for queries that spend their time elsewhere. Set before
 * the first module is compiled; it applies to this process (the engine's worker threads run no wasm).
 */
export function useBaselineWasmCompiler(): void {
  v8.setFlagsFromString('--liftoff-only');
}

/**
 * A PGlite client on the data directory. A new directory starts from the template when there is one
 * (seconds, a few hundred MB, instead of initdb's 14–20 s and 700 MB); should loading it fail, the
 * half-made directory is removed and initdb runs as it would without a template.
 */
async function openPglite(target: { dataDir?: string; template?: string }): Promise<PGlite> {
  const options = { startParams: pgliteStartParams() };
  const fromTemplate = target.dataDir && target.template && !fs.existsSync(target.dataDir) && fs.existsSync(target.template);
  if (fromTemplate) {
    try {
      const client = new PGlite(target.dataDir, { ...options, loadDataDir: new Blob([fs.readFileSync(target.template!)]) });
      await client.waitReady;
      return client;
    } catch (error) {
      console.error(`[barwright] the new-database template did not load (${(error as Error).message}); creating the database from scratch`);
      fs.rmSync(target.dataDir!, { recursive: true, force: true });
    }
  }
  const client = new PGlite(target.dataDir, options);
  await client.waitReady;
  return client;
}

/** Opens the database and applies the committed migrations. */
export async function openDatabase(target: DatabaseTarget): Promise<Database> {
  if (target.kind === 'pglite') {
    useBaselineWasmCompiler();
    const client = await openPglite(target);
    const db = drizzlePglite(client, { schema });
    await migratePglite(db, { migrationsFolder: MIGRATIONS_FOLDER });
    return { db: db as unknown as Db, kind: 'pglite', close: () => client.close() };
  }
  // The PostgreSQL driver is loaded only in this mode (an embedded start does without it).
  const [{ default: pgDriver }, { drizzle: drizzlePg }, { migrate: migratePg }] = await Promise.all([
    import('pg'),
    import('drizzle-orm/node-postgres'),
    import('drizzle-orm/node-postgres/migrator'),
  ]);
  const pool = new pgDriver.Pool({ connectionString: target.url, max: 10 });
  // An idle client the server drops (restart, failover) is replaced on the next query; it must not crash us.
  pool.on('error', (error) => console.error(`[barwright] database connection lost: ${error.message}`));
  const db = drizzlePg(pool, { schema });
  await migrateUnderLock(pool, () => migratePg(db, { migrationsFolder: MIGRATIONS_FOLDER }));
  return { db: db as unknown as Db, kind: 'postgres', close: () => pool.end() };
}

/**
 * Runs the migrations while holding a session-level advisory lock on a connection of its own:
 * instances starting together on an empty database would otherwise race on CREATE TABLE (duplicate
 * key in pg_type). The others wait, then find every migration applied.
 */
async function migrateUnderLock(pool: pg.Pool, migrate: () => Promise<void>): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query('select pg_advisory_lock($1, 0)', [ADVISORY_LOCKS.migrations]);
    await migrate();
  } finally {
    await client.query('select pg_advisory_unlock($1, 0)', [ADVISORY_LOCKS.migrations]).catch(() => {});
    client.release();
  }
}
