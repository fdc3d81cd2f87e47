import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, startTestServer, type TestServer } from '../testing/test-app';

/** Sign-in attempts from `address` as a proxy on loopback reports it (X-Forwarded-For); the statuses answered. */
async function attempts(server: TestServer, address: string, n: number): Promise<number[]> {
  const c = new Client(server.app);
  await c.get('/api/auth/me');
  const xsrf = (c as unknown as { xsrf: string }).xsrf;
  const statuses: number[] = [];
  for (let i = 0; i < n; i++) {
    const res = await c.agent.post('/api/auth/sign-in').set('X-XSRF-TOKEN', xsrf).set('X-Forwarded-For', address).send({ email: `nobody${i}@example.test`, password: 'not-the-password' });
    statuses.push(res.status);
  }
  return statuses;
}

describe('TRUST_PROXY and the per-address limits', () => {
  let database: TestDatabase;
  const servers: TestServer[] = [];
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
  });
  afterAll(async () => {
    for (const s of servers) await s.close();
    await database.close();
  });

  it('counts each visitor behind a trusted proxy apart', async () => {
    const server = await startTestServer(database, { trustProxy: 'loopback', rateLimits: { signInPerAddress: 2 } });
    servers.push(server);
    expect(await attempts(server, '203.0.113.7', 3)).toEqual([401, 401, 429]);
    expect(await attempts(server, '203.0.113.8', 1)).toEqual([401]);
  });

  it('without it, every visitor behind the proxy shares the proxy\'s address', async () => {
    const server = await startTestServer(database, { rateLimits: { signInPerAddress: 2 } });
    servers.push(server);
    expect(await attempts(server, '203.0.113.7', 2)).toEqual([401, 401]);
    expect(await attempts(server, '203.0.113.8', 1)).toEqual([429]);
  });
});
