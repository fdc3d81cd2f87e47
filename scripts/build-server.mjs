// `npm run build` (second half): bundles the server into dist/server as plain JavaScript, so a
// production install (`npm ci --omit=dev`) runs it with node alone, no tsx.
//
// Our own code (apps/server, packages/*, db, seeds) is bundled; every npm package stays external and
// is loaded from node_modules at run time (native ones such as sharp and argon2 cannot be bundled).
// Entries: main.js (the server), compute-worker.js (piscina loads it by file name in each worker
// thread, so it must be a file of its own beside main.js), admin-cli.js and seed-cli.js. Chunks
// sit in the same folder, so `new URL('./…', import.meta.url)` means dist/server/ from any of them.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import * as esbuild from 'esbuild';

const root = fileURLToPath(new URL('..', import.meta.url));
const defaultOutdir = path.join(root, 'dist/server');

/** Bare imports are npm packages (external), except our workspaces, whose package.json points at TypeScript. */
const npmPackagesExternal = {
  name: 'npm-packages-external',
  setup(build) {
    build.onResolve({ filter: /^[^./]/ }, (args) => {
      if (args.path.startsWith('@barwright/')) return undefined;
      return { path: args.path, external: true };
    });
  },
};

/** `outdir`: dist/server unless given (a benchmark may build a copy of its own elsewhere). */
export async function buildServer({ quiet = false, outdir = defaultOutdir } = {}) {
  const started = performance.now();
  fs.rmSync(outdir, { recursive: true, force: true });
  const result = await esbuild.build({
    absWorkingDir: root,
    entryPoints: {
      main: 'apps/server/src/main.ts',
      'compute-worker': 'apps/server/src/compute/compute-worker.ts',
      'admin-cli': 'apps/server/src/admin-cli.ts',
      'seed-cli': 'seeds/seed-cli.ts',
    },
    outdir,
    bundle: true,
    splitting: true, // the S3 client is imported lazily; it stays out of a start that does not use it
    chunkNames: 'chunk-[hash]',
    platform: 'node',
    format: 'esm',
    target: 'node20',
    sourcemap: 'linked',
    tsconfig: 'tsconfig.json',
    plugins: [npmPackagesExternal],
    logLevel: quiet ? 'error' : 'warning',
    metafile: true,
  });
  // The migrations travel with the bundle (database.ts reads ./migrations beside it when compiled).
  fs.cpSync(path.join(root, 'db/migrations'), path.join(outdir, 'migrations'), { recursive: true });
  fs.writeFileSync(path.join(outdir, 'package.json'), JSON.stringify({ type: 'module', private: true }, null, 2) + '\n');
  if (!quiet) {
    const bytes = Object.values(result.metafile.outputs).reduce((sum, o) => sum + o.bytes, 0);
    console.log(`server: ${path.relative(root, outdir)} in ${Math.round(performance.now() - started)} ms (${(bytes / 1024).toFixed(0)} kB with source maps)`);
  }
  return result;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  await buildServer();
}
