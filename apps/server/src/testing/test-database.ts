import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { sql } from 'drizzle-orm';
import { openDatabase, type Database } from '../database/database';

export const TEST_POSTGRES_URL = process.env.TEST_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5432/test';

/** True when a PostgreSQL server answers at TEST_POSTGRES_URL (checked once per test file). */
export async function postgresAnswers(): Promise<boolean> {
  const client = new pg.Client({ connectionString: TEST_POSTGRES_URL, connectionTimeoutMillis: 1500 });
  try {
    await client.connect();
    await client.query('select 1');
    return true;
  } catch {
    return false;
  } finally {
    await client.end().catch(() => {});
  }
}

export type Driver = 'pglite' | 'postgres';

export interface TestDatabase extends Database {
  /** The connection string of the PostgreSQL-server database (undefined on PGlite). */
  url?: string;
  /** Empties every table between tests (cheaper than a new database). */
  reset(): Promise<void>;
}

async function onServer(statement: string) {
  const client = new pg.Client({ connectionString: TEST_POSTGRES_URL });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}

/** An empty database of its own on the test PostgreSQL server, named `<prefix>_<random>`; `drop` removes it. */
export async function createServerDatabase(prefix: string): Promise<{ url: string; drop(): Promise<void> }> {
  const name = `${prefix}_${randomBytes(6).toString('hex')}`;
  await onServer(`CREATE DATABASE "${name}"`);
  const u = new URL(TEST_POSTGRES_URL);
  u.pathname = `/${name}`;
  return { url: u.toString(), drop: () => onServer(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`) };
}

/** An in-memory PGlite, or a database of its own on the PostgreSQL server (dropped on close), so test files never meet. */
export async function openTestDatabase(driver: Driver): Promise<TestDatabase> {
  const server = driver === 'postgres' ? await createServerDatabase('barwright_test') : undefined;
  const url = server?.url;
  const database = await openDatabase(url ? { kind: 'postgres', url } : { kind: 'pglite' });
  return {
    ...database,
    url,
    reset: async () => {
      await database.db.execute(sql`TRUNCATE users, sessions, account_tokens, boards, board_members, board_invitations, designs, design_updates, design_versions, entries, entry_revisions, design_origins, entry_ratings, comments, photos, notifications, notification_settings, showcase_items, reports, audit_log RESTART IDENTITY CASCADE`);
    },
    close: async () => {
      await database.close();
      await server?.drop();
    },
  };
}

/** The drivers to run a suite against: PGlite always, PostgreSQL when a server answers (else said so). */
export async function availableDrivers(): Promise<Driver[]> {
  if (await postgresAnswers()) return ['pglite', 'postgres'];
  console.warn(`PostgreSQL server not reachable at ${TEST_POSTGRES_URL}: the postgres-driver runs of this suite are skipped.`);
  return ['pglite'];
}
