import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { startTestServer, type TestServer } from '../testing/test-app';
import { READINESS_TIMEOUT_MS } from './health-router';

describe('health: liveness and readiness', () => {
  let database: TestDatabase;
  const servers: TestServer[] = [];
  const start = async (overrides: Parameters<typeof startTestServer>[1] = {}) => {
    const server = await startTestServer(database, overrides);
    servers.push(server);
    return server.app;
  };
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
  });
  afterAll(async () => {
    for (const s of servers) await s.close();
    await database?.close();
  });

  it('is ready when the database answers, and says how long each check took', async () => {
    const res = await request(await start()).get('/api/health/ready');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.body).toEqual({ status: 'ready', checks: { database: { ok: true, ms: expect.any(Number) } } });
  });

  it('is unavailable (503) naming the dependency that fails or hangs, while liveness still answers', async () => {
    const app = await start({
      readinessChecks: {
        redis: () => Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:6379')),
        hanging: () => new Promise(() => {}),
      },
    });
    const res = await request(app).get('/api/health/ready');
    expect(res.status).toBe(503);
    expect(res.body.status).toBe('unavailable');
    expect(res.body.checks.database.ok).toBe(true);
    expect(res.body.checks.redis).toMatchObject({ ok: false, error: 'connect ECONNREFUSED 127.0.0.1:6379' });
    expect(res.body.checks.hanging).toMatchObject({ ok: false, error: `no answer in ${READINESS_TIMEOUT_MS} ms` });
    expect((await request(app).get('/api/health')).status).toBe(200);
  });

  it('answers 503 draining once shutdown has begun', async () => {
    let draining = false;
    const app = await start({ isDraining: () => draining });
    expect((await request(app).get('/api/health/ready')).status).toBe(200);
    draining = true;
    const res = await request(app).get('/api/health/ready');
    expect(res.status).toBe(503);
    expect(res.body.status).toBe('draining');
  });

  it('touches the database: closed, readiness fails while liveness answers', async () => {
    const own = await openTestDatabase('pglite');
    const server = await startTestServer(own);
    await own.close();
    const ready = await request(server.app).get('/api/health/ready');
    expect(ready.status).toBe(503);
    expect(ready.body.checks.database.ok).toBe(false);
    expect((await request(server.app).get('/api/health')).body).toEqual({ status: 'ok', database: 'pglite' });
    await server.close();
  });
});
