import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, startTestServer, TEST_PASSWORD, type TestServer } from '../testing/test-app';

const linkToken = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';

describe('an account locked by failed sign-ins', () => {
  let database: TestDatabase;
  let server: TestServer;
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    server = await startTestServer(database, { rateLimits: { signInPerAccount: 3, signInPerAddress: 100 } });
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });

  async function lockOut(c: Client, email: string) {
    for (let i = 0; i < 3; i++) expect((await c.post('/api/auth/sign-in', { email, password: 'not-the-password' })).status).toBe(401);
  }

  it('refuses the right password too, and says it is locked, for how long, and where to reset', async () => {
    await makeUser(database, 'lou@example.test');
    const c = new Client(server.app);
    await lockOut(c, 'lou@example.test');
    const res = await c.post('/api/auth/sign-in', { email: 'LOU@example.test', password: TEST_PASSWORD });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('locked');
    expect(res.body.error.message).toMatch(/locked for 15 minutes, even with the right password/);
    expect(res.body.error.message).toContain('/account/forgot-password');
    // Another account from the same address is not locked.
    await makeUser(database, 'mo@example.test');
    await c.signIn('mo@example.test');
  });

  it('opens again once a new password is chosen through a reset link', async () => {
    await makeUser(database, 'ned@example.test');
    const c = new Client(server.app);
    await lockOut(c, 'ned@example.test');
    const since = new Date();
    await c.post('/api/auth/password-reset/request', { email: 'ned@example.test' });
    const token = linkToken((await server.smtp.waitFor('ned@example.test', since)).text);
    expect((await c.post('/api/auth/password-reset/confirm', { token, password: 'ember-gauge-tinplate-77' })).status).toBe(200);
    await c.signIn('ned@example.test', 'ember-gauge-tinplate-77');
  });
});
