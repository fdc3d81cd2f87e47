import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { accountTokens, sessions, users } from '../../../../db/schema';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, cookiesOf, sidOf, makeUser, startTestServer, TEST_PASSWORD, useTestServer, type TestServer } from '../testing/test-app';

const drivers = await availableDrivers();
const linkToken = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';

describe.each(drivers)('accounts API on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  beforeAll(() => void ({ database, server } = ctx));

  async function signUpAndVerify(email: string) {
    const c = new Client(server.app);
    const since = new Date();
    const res = await c.post('/api/auth/sign-up', { email, password: TEST_PASSWORD, displayName: 'Nell Ridley' });
    expect(res.status).toBe(201);
    const mail = await server.smtp.waitFor(email, since);
    return { c, mail };
  }

  describe('sign-up and verification', () => {
    it('creates an unverified account and mails a link with text and HTML parts', async () => {
      const { c, mail } = await signUpAndVerify('nell@example.test');
      expect(mail.subject).toMatch(/confirm/i);
      expect(mail.text).toContain('http://localhost:3000/account/verify?token=');
      expect(mail.html).toContain('Barwright');
      const signIn = await c.signIn('nell@example.test');
      expect(signIn.body).toMatchObject({ email: 'nell@example.test', displayName: 'Nell Ridley', role: 'member', emailVerified: false });
      const verify = await c.post('/api/auth/verify', { token: linkToken(mail.text) });
      expect(verify.status).toBe(200);
      expect((await c.get('/api/auth/me')).body.emailVerified).toBe(true);
    });

    it('refuses a used verification link', async () => {
      const { c, mail } = await signUpAndVerify('reuse@example.test');
      expect((await c.post('/api/auth/verify', { token: linkToken(mail.text) })).status).toBe(200);
      const again = await c.post('/api/auth/verify', { token: linkToken(mail.text) });
      expect(again.status).toBe(400);
      expect(again.body.error.code).toBe('invalid_token');
    });

    it('answers a taken e-mail exactly like a new one and mails the owner instead', async () => {
      await makeUser(database, 'taken@example.test');
      const c = new Client(server.app);
      const since = new Date();
      const res = await c.post('/api/auth/sign-up', { email: 'Taken@Example.test', password: TEST_PASSWORD, displayName: 'Someone' });
      expect(res.status).toBe(201);
      expect(res.body).toEqual({ ok: true });
      const mail = await server.smtp.waitFor('taken@example.test', since);
      expect(mail.subject).toMatch(/already|tried/i);
    });

    it.each([
      [{ email: 'x@example.test', password: 'short', displayName: 'A' }, 'password', /at least 12/],
      [{ email: 'x@example.test', password: 'p'.repeat(129), displayName: 'A' }, 'password', /at most 128/],
      [{ email: 'x@example.test', password: 'password1234', displayName: 'A' }, 'password', /too easy/],
      [{ email: 'not-an-address', password: TEST_PASSWORD, displayName: 'A' }, 'email', /e-mail address/],
      [{ email: 'x@example.test', password: TEST_PASSWORD, displayName: '' }, 'displayName', /required/],
      [{ email: 'x@example.test', password: TEST_PASSWORD, displayName: 'A', admin: true }, 'admin', /not a known field/],
      [{ email: 42, password: TEST_PASSWORD, displayName: 'A' }, 'email', /./],
    ])('refuses %j with a message on %s', async (body, field, message) => {
      const res = await new Client(server.app).post('/api/auth/sign-up', body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.fields[field]).toMatch(message);
      expect(await database.db.select().from(users)).toHaveLength(0);
    });

    it('answers malformed JSON with 400, not 500', async () => {
      const c = new Client(server.app);
      await c.get('/api/auth/me');
      const res = await c.agent.post('/api/auth/sign-up').set('Content-Type', 'application/json').set('X-XSRF-TOKEN', 'x').send('{"email":');
      expect([400, 403]).toContain(res.status);
      const withToken = await c.post('/api/auth/sign-in', undefined);
      expect(withToken.status).toBe(400);
    });
  });

  describe('sign-in, sessions and sign-out', () => {
    it('gives a new session id at sign-in and keeps the error the same for unknown e-mail and wrong password', async () => {
      await makeUser(database, 'ada@example.test');
      const c = new Client(server.app);
      const before = sidOf(await c.get('/api/auth/me'));
      const wrong = await c.post('/api/auth/sign-in', { email: 'ada@example.test', password: 'wrong-password-123' });
      const unknown = await c.post('/api/auth/sign-in', { email: 'nobody@example.test', password: 'wrong-password-123' });
      expect(wrong.status).toBe(401);
      expect(unknown.status).toBe(401);
      expect(unknown.body).toEqual(wrong.body);
      const ok = await c.signIn('ada@example.test');
      const after = cookiesOf(ok).find((s) => s.startsWith('barwright.sid'));
      expect(after).toBeDefined();
      expect(after!.split(';')[0]).not.toBe(before);
      const cookie = cookiesOf(ok).find((s) => s.startsWith('barwright.sid'))!;
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
      expect(cookie).not.toMatch(/Secure/);
      expect((await c.get('/api/auth/me')).body.email).toBe('ada@example.test');
    });

    it('answers a visitor 200 with null: being signed out is not an error', async () => {
      const res = await new Client(server.app).get('/api/auth/me');
      expect(res.status).toBe(200);
      expect(res.type).toBe('application/json');
      expect(res.text).toBe('null');
    });

    it('destroys the session on the server at sign-out', async () => {
      await makeUser(database, 'bo@example.test');
      const c = new Client(server.app);
      const res = await c.signIn('bo@example.test');
      const sid = sidOf(res)!;
      expect((await c.post('/api/auth/sign-out')).status).toBe(204);
      const replay = await new Client(server.app).agent.get('/api/auth/me').set('Cookie', sid);
      expect(replay.status).toBe(200);
      expect(replay.body).toBeNull();
      expect((await database.db.select().from(sessions)).filter((s) => s.userId)).toHaveLength(0);
    });

    it('keeps sessions in the database so they survive a restart', async () => {
      await makeUser(database, 'cy@example.test');
      const c = new Client(server.app);
      const res = await c.signIn('cy@example.test');
      const sid = sidOf(res)!;
      const restarted = await startTestServer(database);
      const me = await new Client(restarted.app).agent.get('/api/auth/me').set('Cookie', sid);
      await restarted.close();
      expect(me.status).toBe(200);
      expect(me.body.email).toBe('cy@example.test');
    });

    it('lets members change their display name and units, with field messages for bad values', async () => {
      await makeUser(database, 'di@example.test');
      const c = new Client(server.app);
      await c.signIn('di@example.test');
      const ok = await c.patch('/api/auth/me', { displayName: 'Di Marsh', units: 'in' });
      expect(ok.body).toMatchObject({ displayName: 'Di Marsh', units: 'in' });
      const bad = await c.patch('/api/auth/me', { units: 'furlong' });
      expect(bad.status).toBe(400);
      expect(bad.body.error.fields.units).toBeDefined();
      expect((await new Client(server.app).patch('/api/auth/me', { units: 'mm' })).status).toBe(401);
    });
  });

  describe('CSRF', () => {
    it('refuses an unsafe request without the header, or with a token that is not the session\'s', async () => {
      await makeUser(database, 'eve@example.test');
      const c = new Client(server.app);
      const none = await c.post('/api/auth/sign-in', { email: 'eve@example.test', password: TEST_PASSWORD }, { csrf: false });
      expect(none.status).toBe(403);
      expect(none.body.error.code).toBe('csrf');
      const forged = await c.agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', 'forged-token').send({ email: 'eve@example.test', password: TEST_PASSWORD });
      expect(forged.status).toBe(403);
      const other = new Client(server.app);
      await other.get('/api/auth/me');
      const foreign = await c.agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', (other as any).xsrf).send({ email: 'eve@example.test', password: TEST_PASSWORD });
      expect(foreign.status).toBe(403);
    });
  });

  describe('password reset', () => {
    it('answers 202 whether or not the e-mail is registered', async () => {
      await makeUser(database, 'fay@example.test');
      const c = new Client(server.app);
      const known = await c.post('/api/auth/password-reset/request', { email: 'fay@example.test' });
      const unknown = await c.post('/api/auth/password-reset/request', { email: 'ghost@example.test' });
      expect(known.status).toBe(202);
      expect(unknown.status).toBe(202);
      expect(unknown.body).toEqual(known.body);
    });

    it('resets once with a token stored only as a hash, ends old sessions, and refuses reuse', async () => {
      await makeUser(database, 'gus@example.test');
      const old = new Client(server.app);
      await old.signIn('gus@example.test');
      const c = new Client(server.app);
      const since = new Date();
      await c.post('/api/auth/password-reset/request', { email: 'gus@example.test' });
      const token = linkToken((await server.smtp.waitFor('gus@example.test', since)).text);
      const stored = await database.db.select().from(accountTokens);
      expect(stored.map((t) => t.tokenHash)).not.toContain(token);
      const weak = await c.post('/api/auth/password-reset/confirm', { token, password: 'password1234' });
      expect(weak.status).toBe(400);
      const newPassword = 'ember-gauge-tinplate-77';
      expect((await c.post('/api/auth/password-reset/confirm', { token, password: newPassword })).status).toBe(200);
      expect((await old.get('/api/auth/me')).body).toBeNull(); // the session ended: a visitor now
      expect((await c.post('/api/auth/password-reset/confirm', { token, password: newPassword })).body.error.code).toBe('invalid_token');
      await c.signIn('gus@example.test', newPassword);
    });

    it('refuses an expired token', async () => {
      await makeUser(database, 'hal@example.test');
      const c = new Client(server.app);
      const since = new Date();
      await c.post('/api/auth/password-reset/request', { email: 'hal@example.test' });
      const token = linkToken((await server.smtp.waitFor('hal@example.test', since)).text);
      await database.db.update(accountTokens).set({ expiresAt: new Date(Date.now() - 1000) });
      const res = await c.post('/api/auth/password-reset/confirm', { token, password: 'ember-gauge-tinplate-77' });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_token');
    });
  });

  describe('suspension', () => {
    it('ends a suspended user\'s live session at once and refuses their sign-in', async () => {
      await makeUser(database, 'root@example.test', 'admin');
      const target = await makeUser(database, 'ivy@example.test');
      const ivy = new Client(server.app);
      await ivy.signIn('ivy@example.test');
      const admin = new Client(server.app);
      await admin.signIn('root@example.test');
      const res = await admin.patch(`/api/admin/users/${target.id}`, { suspended: true });
      expect(res.body.suspended).toBe(true);
      expect((await ivy.get('/api/auth/me')).body).toBeNull();
      const again = await new Client(server.app).post('/api/auth/sign-in', { email: 'ivy@example.test', password: TEST_PASSWORD });
      expect(again.status).toBe(403);
      expect(again.body.error.code).toBe('suspended');
      await admin.patch(`/api/admin/users/${target.id}`, { suspended: false });
      await new Client(server.app).signIn('ivy@example.test');
    });

    it('stops a session whose user was suspended directly in the database', async () => {
      const u = await makeUser(database, 'jo@example.test');
      const c = new Client(server.app);
      await c.signIn('jo@example.test');
      await database.db.update(users).set({ suspendedAt: new Date() }).where(eq(users.id, u.id));
      expect((await c.get('/api/auth/me')).body).toBeNull();
    });
  });
});

describe('sign-in rate limits', () => {
  let database: TestDatabase;
  let server: TestServer;
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    server = await startTestServer(database, { rateLimits: { signInPerAccount: 3, signInPerAddress: 6 } });
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });

  it('limits failed sign-ins per account, then per address', async () => {
    await makeUser(database, 'kit@example.test');
    const c = new Client(server.app);
    const tries = [];
    for (let i = 0; i < 4; i++) tries.push((await c.post('/api/auth/sign-in', { email: 'kit@example.test', password: 'not-the-password' })).status);
    expect(tries).toEqual([401, 401, 401, 429]);
    const locked = await c.post('/api/auth/sign-in', { email: 'kit@example.test', password: TEST_PASSWORD });
    expect(locked.status).toBe(429);
    expect(locked.body.error.code).toBe('locked');
    const others = [];
    for (let i = 0; i < 3; i++) others.push((await c.post('/api/auth/sign-in', { email: `other${i}@example.test`, password: 'x' })).status);
    expect(others.at(-1)).toBe(429);
  });

  it('does not count successful sign-ins against the address (a club signing in from one workshop)', async () => {
    const emails = ['ada@example.test', 'bo@example.test', 'cy@example.test'];
    for (const email of emails) await makeUser(database, email);
    const fresh = await startTestServer(database, { rateLimits: { signInPerAccount: 3, signInPerAddress: 2 } });
    try {
      const statuses = [];
      for (let i = 0; i < 8; i++) statuses.push((await new Client(fresh.app).post('/api/auth/sign-in', { email: emails[i % 3], password: TEST_PASSWORD })).status);
      expect(statuses).toEqual(Array(8).fill(200));
    } finally {
      await fresh.close();
    }
  });
});
