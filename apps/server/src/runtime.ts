import fs from 'node:fs';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import type { Config } from './config';
import { lockDataDir } from './database/data-dir-lock';
import { openDatabase, PGLITE_TEMPLATE, type Database } from './database/database';
import { PhotoFiles } from './shop-log/photo-files';
import type { PhotoStorage } from './shop-log/photo-storage';

/** Opens the configured database: a PostgreSQL server when DATABASE_URL is set, else PGlite in DATA_DIR (locked). */
export async function openConfiguredDatabase(config: Config, log: (line: string) => void): Promise<{ database: Database; release: () => void; fresh: boolean }> {
  const release = lockDataDir(config.dataDir, log);
  try {
    if (config.databaseUrl) {
      return { database: await openDatabase({ kind: 'postgres', url: config.databaseUrl }), release, fresh: false };
    }
    const pgliteDir = path.join(config.dataDir, 'pglite');
    const fresh = !fs.existsSync(pgliteDir);
    return { database: await openDatabase({ kind: 'pglite', dataDir: pgliteDir, template: PGLITE_TEMPLATE }), release, fresh };
  } catch (error) {
    release();
    throw error;
  }
}

/** SESSION_SECRET, or one made once and kept in the data directory so sessions survive a restart. */
export function sessionSecretFor(config: Config): string {
  if (config.sessionSecret) return config.sessionSecret;
  const file = path.join(config.dataDir, 'session-secret');
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('base64url');
  fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

/**
 * Where photos go: the S3 bucket when S3_URL and S3_BUCKET are set (reached once now, so a wrong
 * setting stops the start), else DATA_DIR/uploads. The S3 client is loaded only when asked for.
 */
export async function openPhotoStorage(config: Config): Promise<PhotoStorage & { close?(): void }> {
  if (!config.s3) return new PhotoFiles(path.join(config.dataDir, 'uploads'));
  const { S3PhotoStorage } = await import('./shop-log/photo-s3-storage');
  const storage = new S3PhotoStorage(config.s3);
  await storage.verify();
  return storage;
}
