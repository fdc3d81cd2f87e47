import http from 'node:http';
import type { AddressInfo } from 'node:net';
import httpProxy from 'http-proxy';

/**
 * A load balancer for tests: each HTTP request and each WebSocket upgrade goes to the next target in
 * turn (no stickiness). A target that refuses a connection (or is marked down) is skipped from then
 * on, as a real balancer's health check would; the request that met it is answered 502.
 */
export async function startRoundRobinProxy(targets: string[]): Promise<{ url: string; markDown(target: string): void; close(): Promise<void> }> {
  const down = new Set<string>();
  let turn = 0;
  const next = () => {
    const alive = targets.filter((t) => !down.has(t));
    if (!alive.length) return undefined;
    return alive[turn++ % alive.length];
  };
  const proxy = httpProxy.createProxyServer({ ws: true, xfwd: true });
  const server = http.createServer((req, res) => {
    const target = next();
    if (!target) return void res.writeHead(502).end();
    proxy.web(req, res, { target }, (error) => {
      if ((error as NodeJS.ErrnoException).code === 'ECONNREFUSED') down.add(target);
      if (!res.headersSent) res.writeHead(502).end();
    });
  });
  server.on('upgrade', (req, socket, head) => {
    const target = next();
    if (!target) return void socket.destroy();
    socket.on('error', () => socket.destroy());
    proxy.ws(req, socket, head, { target }, (error) => {
      if ((error as NodeJS.ErrnoException).code === 'ECONNREFUSED') down.add(target);
      socket.destroy();
    });
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    markDown: (target) => down.add(target),
    close: async () => {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      proxy.close();
    },
  };
}
