// `npm start`: builds the web app and the server when missing or older than their sources, then runs
// the compiled server (dist/server/main.js) in this process: one PID, plain JavaScript, no tsx.
// `node scripts/start.mjs admin-cli …` / `seed-cli` run the compiled command-line tools the same way;
// `--no-build` runs what is built as it is (`npm run serve`).
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const args = process.argv.slice(2);
const noBuild = args[0] === '--no-build';
if (noBuild) args.shift();
const entry = args[0] && !args[0].startsWith('-') ? args.shift() : 'main';
process.argv.splice(2, process.argv.length - 2, ...args); // the tools read their own options from argv

const compiled = path.join(root, 'dist/server', `${entry}.js`);
if (!noBuild) {
  const { buildParts } = await import('./build.mjs');
  try {
    await buildParts(entry === 'main' ? ['web', 'server', 'template'] : ['server', 'template'], { ifStale: true });
  } catch (error) {
    console.error(`[barwright] ${error.message}`);
    process.exit(1);
  }
}
if (!fs.existsSync(compiled)) {
  console.error(`[barwright] ${path.relative(root, compiled)} is missing: run \`npm run build\` first.`);
  process.exit(1);
}
await import(pathToFileURL(compiled).href);
