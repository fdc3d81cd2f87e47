// `npm run build`: the web app (ng build, into dist/web), the server (esbuild, into dist/server) and the
// new-database template (dist/pglite-template, only remade when the migrations change).
// `--if-stale`: only what is missing or older than its sources (what `npm start` uses). Each part
// leaves a stamp with the time its build began; a source file newer than the stamp makes it stale.
import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const shared = ['packages/contracts/src', 'packages/engine/src', 'package-lock.json', 'tsconfig.json'];

/** What each part is built from and where its stamp lies. Spec files change no build. */
export const PARTS = {
  web: {
    stamp: 'dist/web/.built',
    sources: [...shared, 'apps/web/src', 'apps/web/public', 'apps/web/tools', 'apps/web/tsconfig.app.json', 'angular.json', 'scripts/precompress.mjs'],
    tool: 'node_modules/@angular/cli/bin/ng.js',
    build: async () => {
      const status = spawnSync(process.execPath, [path.join(root, 'node_modules/@angular/cli/bin/ng.js'), 'build', '--configuration', 'production'], { cwd: root, stdio: 'inherit' }).status;
      if (status !== 0) throw new Error(`ng build failed (exit ${status})`);
      // Brotli and gzip siblings of every text file, served by Accept-Encoding (apps/server/src/web/web-app.ts).
      const { precompress } = await import('./precompress.mjs');
      const { raw, br } = await precompress(path.join(root, 'dist/web/browser'));
      console.log(`[barwright] web app precompressed: ${(raw / 1024).toFixed(0)} kB of text, ${(br / 1024).toFixed(0)} kB as brotli`);
    },
  },
  server: {
    stamp: 'dist/server/.built',
    sources: [...shared, 'apps/server/src', 'db', 'seeds', 'scripts/build-server.mjs'],
    tool: 'node_modules/esbuild/package.json',
    build: async () => (await import('./build-server.mjs')).buildServer(),
  },
  // A pristine database (initdb + migrations) that a new data directory starts from (database/database.ts).
  template: {
    stamp: 'dist/pglite-template/.built',
    sources: ['db/migrations', 'package-lock.json', 'scripts/pglite-template.mjs'],
    tool: 'node_modules/@electric-sql/pglite/package.json',
    build: () => {
      const status = spawnSync(process.execPath, ['--liftoff-only', path.join(root, 'scripts/pglite-template.mjs')], { cwd: root, stdio: 'inherit' }).status;
      if (status !== 0) throw new Error(`the new-database template failed (exit ${status})`);
    },
  },
};

function newestSource(sources) {
  let newest = 0;
  const visit = (file) => {
    let stat;
    try {
      stat = fs.statSync(file);
    } catch {
      return;
    }
    if (stat.isDirectory()) {
      for (const name of fs.readdirSync(file)) if (name !== 'node_modules') visit(path.join(file, name));
    } else if (!file.endsWith('.spec.ts')) newest = Math.max(newest, stat.mtimeMs);
  };
  for (const s of sources) visit(path.join(root, s));
  return newest;
}

/** Why a part needs building, or undefined when its build is newer than every source. */
export function staleness(part) {
  const stampFile = path.join(root, part.stamp);
  if (!fs.existsSync(stampFile)) return 'not built yet';
  const builtAt = Number(fs.readFileSync(stampFile, 'utf8'));
  return newestSource(part.sources) > builtAt ? 'sources changed since the last build' : undefined;
}

/** Builds one part and stamps it with the time the build began. */
export async function buildPart(part) {
  const began = Date.now();
  await part.build();
  fs.writeFileSync(path.join(root, part.stamp), String(began));
}

/**
 * Builds the parts asked for (all, or only the stale ones). Without the build tools (a production
 * install, `npm ci --omit=dev`) a stale part that exists is served as it is, with a warning; a
 * missing one stops with what to run.
 */
export async function buildParts(names, { ifStale = false } = {}) {
  for (const name of names) {
    const part = PARTS[name];
    const why = ifStale ? staleness(part) : 'asked for';
    if (!why) continue;
    if (!fs.existsSync(path.join(root, part.tool))) {
      if (fs.existsSync(path.join(root, part.stamp))) {
        console.warn(`[barwright] ${name}: ${why}, but the build tools are not installed (production install); using the existing build`);
        continue;
      }
      throw new Error(`${name}: not built, and the build tools are not installed. Run \`npm ci && npm run build\` (then \`npm ci --omit=dev\` for a production install).`);
    }
    if (ifStale) console.log(`[barwright] building ${name}: ${why}`);
    await buildPart(part);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const ifStale = process.argv.includes('--if-stale');
  const names = process.argv.slice(2).filter((a) => !a.startsWith('--'));
  try {
    await buildParts(names.length ? names : ['web', 'server', 'template'], { ifStale });
  } catch (error) {
    console.error(error.message);
    process.exit(1);
  }
}
