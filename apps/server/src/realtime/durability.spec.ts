import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import * as Y from 'yjs';
import { afterAll, describe, expect, it } from 'vitest';
import { readDesign } from '@barwright/contracts/design-doc';
import { HttpSession, startServerProcess } from '../testing/server-process';
import { collabClient, eventually } from '../testing/collab-client';

/**
 * The promise of the realtime contract: a server killed with SIGKILL in the middle of editing
 * loses nothing any client had sent it. Each update is stored before it is relayed, so a client
 * that never comes back still finds its edits after the restart.
 */
const burstEdits = (doc: Y.Doc) => [...doc.getMap('design').keys()].filter((k) => k.startsWith('edit-')).length;

describe('durability of edits', () => {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-kill-'));
  const port = String(3600 + Math.floor(Math.random() * 300));
  const started: { kill: () => void }[] = [];
  afterAll(() => {
    for (const s of started) s.kill(); // a server left by a failed run would hold its port and data directory
    fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('keeps every edit sent before a SIGKILL, and the killed server\'s lock does not block the restart', async () => {
    let server = await startServerProcess({ PORT: port, DATA_DIR: dataDir });
    started.push({ kill: () => server.child.kill('SIGKILL') });
    const http = new HttpSession(server.baseUrl);
    const password = 'quiet-walnut-crosscut-49';
    expect((await http.request('POST', '/api/auth/sign-up', { email: 'kill@example.test', password, displayName: 'Kit' })).status).toBe(201);
    expect((await http.request('POST', '/api/auth/sign-in', { email: 'kill@example.test', password })).status).toBe(200);
    const board = await http.request('POST', '/api/boards', { name: 'Kill test' });
    const design = await http.request('POST', `/api/boards/${board.body.id}/designs`, { title: 'Burst' });
    const cookie = http.cookieHeader;

    const writer = collabClient(server.baseUrl, design.body.id, cookie);
    const busy = collabClient(server.baseUrl, design.body.id, cookie);
    await Promise.all([writer.synced(), busy.synced()]);
    const burst = 150;
    // Keys the design does not know, in the design map (a document holds no other top-level types).
    for (let i = 0; i < burst; i++) writer.doc.getMap('design').set(`edit-${i}`, i);
    // The server relays an update only after storing it, so once another client has seen an edit it is on disk.
    await eventually(() => burstEdits(busy.doc) === burst, 20000, 'the burst to be relayed');
    writer.destroy(); // this client never comes back: only the server's storage can keep its edits

    // Another client is still typing when the process dies.
    let typed = 0;
    const typing = setInterval(() => busy.doc.getText('notes').insert(0, String(typed++ % 10)), 5);
    await new Promise((r) => setTimeout(r, 150));
    server.child.kill('SIGKILL');
    await new Promise((r) => server.child.once('exit', r));
    clearInterval(typing);

    server = await startServerProcess({ PORT: port, DATA_DIR: dataDir });
    try {
      expect(server.output()).toMatch(/stale lock/i);
      const reader = collabClient(server.baseUrl, design.body.id, cookie);
      await reader.synced();
      await eventually(() => burstEdits(reader.doc) === burst, 5000, 'all burst edits after restart');
      expect(readDesign(reader.doc)).toMatchObject({ format: 'barwright.design/1' });
      // The typist reconnects by itself and its edits made while the server was down merge in.
      await eventually(() => reader.doc.getText('notes').length === typed, 10000, 'the typist\'s edits to merge');
      reader.destroy();
    } finally {
      busy.destroy();
      server.child.kill('SIGTERM');
      await new Promise((r) => server.child.once('exit', r));
    }
  }, 120_000);
});
