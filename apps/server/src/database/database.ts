import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import pg from 'pg';
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

export type DatabaseTarget =
  | { kind: 'pglite'; dataDir?: string } // no dataDir: in memory
  | { kind: 'postgres'; url: string };

/** Opens the database and applies the committed migrations. */
export async function openDatabase(target: DatabaseTarget): Promise<Database> {
  if (target.kind === 'pglite') {
    const client = target.dataDir ? new PGlite(target.dataDir) : new PGlite();
    await client.waitReady;
    const db = drizzlePglite(client, { schema });
    await migratePglite(db, { migrationsFolder: MIGRATIONS_FOLDER });
    return { db: db as unknown as Db, kind: 'pglite', close: () => client.close() };
  }
  const pool = new pg.Pool({ connectionString: target.url, max: 10 });
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
