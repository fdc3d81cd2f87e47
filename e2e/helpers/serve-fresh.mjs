// Starts the server on a new, empty data directory (removed first), as one process Playwright can stop.
import fs from 'node:fs';
import { spawn } from 'node:child_process';

const dataDir = process.env.DATA_DIR ?? '.tmp/e2e-data';
fs.rmSync(dataDir, { recursive: true, force: true });
const child = spawn(process.execPath, ['--import', 'tsx', 'apps/server/src/main.ts'], { stdio: 'inherit', env: process.env });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
child.on('exit', (code) => process.exit(code ?? 0));
