import { BlockList, isIP } from 'node:net';
import type { RequestHandler } from 'express';

const loopback = new BlockList();
loopback.addSubnet('127.0.0.0', 8, 'ipv4');
loopback.addAddress('::1', 'ipv6');

/**
 * True for 127.0.0.0/8 and ::1, in any spelling, and for IPv4-mapped 127.x (`::ffff:127.0.0.1`, how a
 * dual-stack socket reports an IPv4 loopback peer; BlockList matches those against the IPv4 subnet).
 * Anything else, unparsable or absent, is not loopback.
 */
export function isLoopbackAddress(address: string | undefined): boolean {
  const family = address ? isIP(address) : 0;
  if (!address || !family) return false;
  return loopback.check(address, family === 4 ? 'ipv4' : 'ipv6');
}

/**
 * Lets through only requests whose TCP peer is this machine; for any other, the router is skipped and
 * the request gets the same 404 as a route that does not exist. It reads the socket's address, never
 * X-Forwarded-For, so no header can pass it. A reverse proxy on the same machine counts as loopback:
 * the development mailbox must not sit behind one.
 */
export const loopbackOnly: RequestHandler = (req, _res, next) => {
  next(isLoopbackAddress(req.socket.remoteAddress) ? undefined : 'router');
};
