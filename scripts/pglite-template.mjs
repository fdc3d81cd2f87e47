// Makes a pristine PGlite data directory once, at build time, as a tarball: initdb (14–20 s and
// about 700 MB at its peak) plus the committed migrations. A server starting on a new DATA_DIR
// loads it (PGlite's loadDataDir) instead of running initdb, and then applies any later migration
// as usual. Run in a process of its own (scripts/build.mjs does), so that memory goes with it.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';

const root = fileURLToPath(new URL('..', import.meta.url));
const out = path.resolve(process.argv[2] ?? path.join(root, 'dist/pglite-template/data.tar.gz'));
const started = performance.now();
const pg = new PGlite();
await migrate(drizzle(pg), { migrationsFolder: path.join(root, 'db/migrations') });
const dump = await pg.dumpDataDir('gzip');
await pg.close();
fs.mkdirSync(path.dirname(out), { recursive: true });
fs.writeFileSync(out + '.part', Buffer.from(await dump.arrayBuffer()));
fs.renameSync(out + '.part', out); // a server never reads half a file
console.log(`[barwright] new-database template: ${path.relative(root, out)} (${(fs.statSync(out).size / 1e6).toFixed(1)} MB) in ${((performance.now() - started) / 1000).toFixed(1)} s`);
