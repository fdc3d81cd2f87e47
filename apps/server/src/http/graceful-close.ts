import type http from 'node:http';

/**
 * Stops accepting connections and lets the requests in flight finish (their writes reach the
 * database); idle keep-alive connections close at once. Whatever is still open after `deadlineMs`
 * is cut. Upgraded sockets (WebSocket) are the gateways' to close: the promise waits for them too.
 */
export function closeHttpServer(server: http.Server, deadlineMs: number): Promise<void> {
  return new Promise((resolve) => {
    const cut = setTimeout(() => server.closeAllConnections(), deadlineMs);
    server.close(() => {
      clearTimeout(cut);
      resolve();
    });
    server.closeIdleConnections();
  });
}
