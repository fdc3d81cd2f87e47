import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { sessions } from '../../../../db/schema';
import { DatabaseSessionStore, TOUCH_AFTER_MS } from './session-store';
import { Client, makeUser, sidOf, useTestServer } from '../testing/test-app';

type Db = ReturnType<typeof useTestServer>['database']['db'];
const sessionRows = (db: Db) => db.select().from(sessions);
const count = async (db: Db) => (await sessionRows(db)).length;

describe('sessions: a row only when there is something to keep', () => {
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-dist-'));
  fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Barwright</title><app-root></app-root>');
  fs.writeFileSync(path.join(dist, 'main-ABCDEFGH.js'), 'console.log(1)');
  const ctx = useTestServer('pglite', { webDist: dist });
  afterAll(() => fs.rmSync(dist, { recursive: true, force: true }));

  it('1 000 anonymous requests leave the sessions table as it was', async () => {
    const { app } = ctx.server;
    await makeUser(ctx.database, 'kept@example.test');
    const member = new Client(app);
    await member.signIn('kept@example.test');
    const before = await sessionRows(ctx.database.db);
    expect(before).toHaveLength(1);

    const paths = ['/api/health', '/api/health/ready', '/api/auth/me', '/api/config', '/api/entries', '/api/showcase', '/', '/explore', '/main-ABCDEFGH.js', '/api/nothing-here'];
    const visitor = new Client(app); // keeps its cookies, as a browser does
    for (let i = 0; i < 1000; i++) {
      const p = paths[i % paths.length];
      const res = i % 2 ? await visitor.get(p) : await request(app).get(p); // with and without cookies
      expect(res.status).toBeLessThan(500);
      expect(sidOf(res)).toBeUndefined();
    }
    expect(await sessionRows(ctx.database.db)).toEqual(before);
  });

  it('a visitor\'s failed sign-in and reset request write no row; signing in writes one, signing out removes it', async () => {
    await makeUser(ctx.database, 'ann@example.test');
    const visitor = new Client(ctx.server.app);
    expect((await visitor.post('/api/auth/sign-in', { email: 'ann@example.test', password: 'not-the-password-1' })).status).toBe(401);
    expect((await visitor.post('/api/auth/password-reset/request', { email: 'ann@example.test' })).status).toBe(202);
    expect(await count(ctx.database.db)).toBe(0);
    const signedIn = await visitor.signIn('ann@example.test');
    expect(sidOf(signedIn)).toBeDefined();
    expect(await count(ctx.database.db)).toBe(1);
    // The signed-in session's token is bound to it: unsafe requests go through with the new cookie.
    expect((await visitor.patch('/api/auth/me', { displayName: 'Ann Marsh' })).status).toBe(200);
    // Signing out ends the row and hands a visitor's token, so signing in again needs no reload.
    expect((await visitor.post('/api/auth/sign-out')).status).toBe(204);
    expect(await count(ctx.database.db)).toBe(0);
    expect((await visitor.post('/api/auth/sign-in', { email: 'ann@example.test', password: 'quiet-walnut-crosscut-49' })).status).toBe(200);
  });

  it('refuses a signed-in request carrying a visitor token, or another session\'s token', async () => {
    await makeUser(ctx.database, 'bea@example.test');
    await makeUser(ctx.database, 'cal@example.test');
    const bea = new Client(ctx.server.app);
    const cal = new Client(ctx.server.app);
    await bea.signIn('bea@example.test');
    await cal.signIn('cal@example.test');
    const visitor = new Client(ctx.server.app);
    await visitor.get('/api/auth/me');
    for (const token of [(visitor as unknown as { xsrf: string }).xsrf, (cal as unknown as { xsrf: string }).xsrf]) {
      const res = await bea.agent.patch('/api/auth/me').set('X-XSRF-TOKEN', token).send({ displayName: 'Forged' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('csrf');
    }
  });

  it('writes a rolling session\'s expiry at most once a minute, and sweeps expired rows', async () => {
    await makeUser(ctx.database, 'dot@example.test');
    const member = new Client(ctx.server.app);
    const sid = decodeURIComponent(sidOf(await member.signIn('dot@example.test'))!.split('=')[1]).slice(2).split('.')[0];
    const [first] = await ctx.database.db.select().from(sessions).where(eq(sessions.sid, sid));
    for (let i = 0; i < 20; i++) expect((await member.get('/api/auth/me')).body.email).toBe('dot@example.test');
    const [after] = await ctx.database.db.select().from(sessions).where(eq(sessions.sid, sid));
    expect(after.expiresAt.getTime()).toBe(first.expiresAt.getTime());

    // The store writes once the expiry has moved past TOUCH_AFTER_MS.
    const store = new DatabaseSessionStore(ctx.database.db);
    const data = (await new Promise<Record<string, unknown>>((resolve, reject) => store.get(sid, (e, v) => (e ? reject(e) : resolve(v as never)))));
    const later = new Date(first.expiresAt.getTime() + TOUCH_AFTER_MS + 1000);
    await new Promise<void>((resolve, reject) => store.touch(sid, { ...data, cookie: { expires: later } } as never, (e) => (e ? reject(e) : resolve())));
    const [touched] = await ctx.database.db.select().from(sessions).where(eq(sessions.sid, sid));
    expect(touched.expiresAt.getTime()).toBe(later.getTime());

    await ctx.database.db.insert(sessions).values({ sid: 'long-gone', data: {}, expiresAt: new Date(Date.now() - 1000) });
    expect(await store.pruneExpired()).toBe(1);
    expect((await sessionRows(ctx.database.db)).map((r) => r.sid)).toEqual([sid]);
  });
});
