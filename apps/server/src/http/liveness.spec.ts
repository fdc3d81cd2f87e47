import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { withLiveness } from './liveness';

describe('liveness before the app', () => {
  let server: http.Server;
  let base: string;
  const reached: string[] = [];
  beforeAll(async () => {
    const app: http.RequestListener = (req, res) => {
      reached.push(`${req.method} ${req.url}`);
      res.writeHead(404).end();
    };
    server = http.createServer(withLiveness(app, 'pglite'));
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  it('answers GET and HEAD /api/health itself, with the body the health route sends', async () => {
    const get = await fetch(`${base}/api/health`);
    expect(get.status).toBe(200);
    expect(get.headers.get('cache-control')).toBe('no-store');
    expect(await get.json()).toEqual({ status: 'ok', database: 'pglite' });
    const withQuery = await fetch(`${base}/api/health?probe=1`);
    expect(withQuery.status).toBe(200);
    const head = await fetch(`${base}/api/health`, { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(await head.text()).toBe('');
    expect(reached).toEqual([]);
  });

  it('hands every other request to the app: readiness, look-alike paths, other methods', async () => {
    for (const path of ['/api/health/ready', '/api/healthz', '/api/health-check']) await fetch(`${base}${path}`);
    await fetch(`${base}/api/health`, { method: 'POST' });
    expect(reached).toEqual(['GET /api/health/ready', 'GET /api/healthz', 'GET /api/health-check', 'POST /api/health']);
  });
});
