import type { IncomingMessage } from 'node:http';

const LOOPBACK = ['localhost', '127.0.0.1', '[::1]'];

/**
 * The origins a browser may open the realtime sockets from: PUBLIC_URL's origin and the extra ones
 * configured (EXTRA_ORIGINS). A loopback PUBLIC_URL also admits the other loopback spellings of the
 * same port, since they reach the same server (http://127.0.0.1:3000 for http://localhost:3000).
 */
export function allowedOrigins(publicUrl: string, extra: readonly string[] = []): Set<string> {
  const origins = new Set<string>();
  const url = new URL(publicUrl);
  origins.add(url.origin);
  if (LOOPBACK.includes(url.hostname)) for (const host of LOOPBACK) origins.add(`${url.protocol}//${host}${url.port ? `:${url.port}` : ''}`);
  for (const origin of extra) origins.add(new URL(origin).origin);
  return origins;
}

/**
 * Whether a handshake may go on. Browsers always send Origin on a WebSocket upgrade and on
 * socket.io's requests (RFC 6455 §4.1; Fetch standard), so an Origin that is not ours is refused.
 * A request without one comes from a non-browser client, which cannot carry a victim's cookies
 * across sites, and is let through.
 */
export function originAllowed(req: IncomingMessage, origins: ReadonlySet<string>): boolean {
  const origin = req.headers.origin;
  return origin === undefined || origins.has(origin);
}
