import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from './app';
import { createMailer } from './mail/mailer';
import { openTestDatabase, type TestDatabase } from './testing/test-database';
import { Client, cookiesOf, startTestServer, type TestServer } from './testing/test-app';

describe('the app shell', () => {
  let database: TestDatabase;
  let server: TestServer;
  let dist: string;
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    dist = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-dist-'));
    fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Barwright</title><app-root></app-root>');
    fs.writeFileSync(path.join(dist, 'main-ABCDEFGH.js'), 'console.log(1)');
    server = await startTestServer(database, { webDist: dist });
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });

  it('reports health with the driver in use', async () => {
    expect((await request(server.app).get('/api/health')).body).toEqual({ status: 'ok', database: 'pglite' });
  });

  it('answers unknown API routes in the one error shape', async () => {
    const res = await request(server.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: expect.any(String) } });
  });

  it('serves the built app and falls back to index.html for client routes, under a strict CSP', async () => {
    const page = await request(server.app).get('/account/sign-in');
    expect(page.status).toBe(200);
    expect(page.text).toContain('<app-root>');
    expect(page.headers['content-security-policy']).toMatch(/script-src 'self'/);
    expect(page.headers['content-security-policy']).toMatch(/frame-ancestors 'none'/);
    const bundle = await request(server.app).get('/main-ABCDEFGH.js');
    expect(bundle.headers['cache-control']).toMatch(/immutable/);
    expect(page.headers['x-powered-by']).toBeUndefined();
  });

  it('shows the local mailbox only in local mail mode', async () => {
    const c = new Client(server.app);
    expect((await c.get('/api/dev/mailbox')).status).toBe(200);
    expect((await c.get('/api/config')).body).toEqual({ localMail: true, demo: false });
    const mailer = createMailer({ smtpUrl: 'smtp://127.0.0.1:9', from: 'x@example.test' });
    const real = createApp({ db: database.db, databaseKind: 'pglite', mailer, sessionSecret: 's'.repeat(32), publicUrl: 'https://turners.example', log: () => {}, compute: server.compute });
    const res = await request(real).get('/api/dev/mailbox');
    expect(res.status).toBe(404);
    const me = await request(real).get('/api/auth/me');
    expect(cookiesOf(me).join()).toMatch(/XSRF-TOKEN=.*Secure/);
    mailer.close();
  });

  it('never sends a stack trace', async () => {
    const boom = createApp({
      db: { select: () => { throw new Error('secret internals at /srv/x.ts:1'); } } as never,
      databaseKind: 'pglite',
      mailer: createMailer({ smtpUrl: 'smtp://127.0.0.1:9', from: 'x@example.test' }),
      sessionSecret: 's'.repeat(32),
      publicUrl: 'http://localhost:3000',
      log: () => {},
      compute: server.compute,
    });
    const res = await request(boom).get('/api/admin/users');
    expect(res.text).not.toMatch(/secret internals|\.ts:/);
  });
});
