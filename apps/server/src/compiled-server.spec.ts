import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import WebSocket from 'ws';
import { CLOSE_CODES } from '@barwright/contracts';
import { DEMO_PASSWORD } from '../../../seeds/demo-scenario';
import { COMPILED_MAIN, HttpSession, startServerProcess } from './testing/server-process';

/** A port nothing listens on now (the server process is given it). */
const freePort = () =>
  new Promise<number>((resolve) => {
    const probe = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });

const root = fileURLToPath(new URL('../../../', import.meta.url));
const WEB_INDEX = 'dist/web/browser/index.html';

/**
 * The production image path: `npm run build` (run first by `npm test`) leaves dist/server and
 * dist/web; node alone (no tsx) starts the server from them, serves the app and the API, runs engine
 * work in the compiled worker file, and drains on SIGTERM.
 */
describe('the compiled server (dist/server from npm run build)', () => {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-compiled-'));
  afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

  it('starts with node alone, serves the app, computes in its worker, and drains on SIGTERM with 1001', async () => {
    for (const file of [COMPILED_MAIN, 'dist/server/compute-worker.js', 'dist/server/migrations/meta/_journal.json', WEB_INDEX]) {
      expect(fs.existsSync(path.join(root, file)), `${file} is missing: run \`npm run build\` first (npm test does)`).toBe(true);
    }
    expect(fs.readFileSync(path.join(root, COMPILED_MAIN), 'utf8')).not.toMatch(/from ["']tsx/);
    const port = String(await freePort());
    const server = await startServerProcess({ PORT: port, DATA_DIR: dataDir, DEMO_DATA: 'true' }, { compiled: true });
    try {
      const page = await fetch(`${server.baseUrl}/studio`);
      expect(page.status).toBe(200);
      expect(await page.text()).toBe(fs.readFileSync(path.join(root, WEB_INDEX), 'utf8'));
      const ready = await fetch(`${server.baseUrl}/api/health/ready`);
      expect(await ready.json()).toMatchObject({ status: 'ready', checks: { database: { ok: true } } });

      const maren = new HttpSession(server.baseUrl);
      expect((await maren.request('POST', '/api/auth/sign-in', { email: 'maren@example.test', password: DEMO_PASSWORD })).status).toBe(200);
      const { mine, shared } = (await maren.request('GET', '/api/boards')).body;
      let design: { id: string } | undefined;
      for (const board of [...mine, ...shared]) design ??= (await maren.request('GET', `/api/boards/${board.id}`)).body.designs[0];
      if (!design) throw new Error('the demo gives maren no design');
      const svg = await fetch(`${server.baseUrl}/api/designs/${design.id}/export?format=svg`, { headers: { cookie: maren.cookieHeader } });
      expect(svg.status).toBe(200);
      expect(await svg.text()).toMatch(/^<\?xml|<svg/);

      const socket = new WebSocket(`ws://127.0.0.1:${port}/collab/${design.id}`, { headers: { cookie: maren.cookieHeader, origin: `http://localhost:${port}` } });
      await new Promise((resolve, reject) => socket.once('open', resolve).once('error', reject));
      const closed = new Promise<number>((resolve) => socket.once('close', (code) => resolve(code)));
      const exited = new Promise<number | null>((resolve) => server.child.once('exit', (code) => resolve(code)));
      server.child.kill('SIGTERM');
      expect(await closed).toBe(CLOSE_CODES.goingAway);
      expect(await exited).toBe(0);
      expect(server.output()).toMatch(/SIGTERM: draining[\s\S]*stopped/);
    } finally {
      if (server.child.exitCode === null) server.child.kill('SIGKILL');
    }
  }, 120_000); // one start on a new data directory: about 8 s on an idle 2-core machine
});
