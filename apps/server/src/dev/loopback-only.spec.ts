import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { LocalSmtp } from '../mail/local-smtp';
import { apiNotFound } from '../http/error-middleware';
import { isLoopbackAddress } from './loopback-only';
import { mailboxRouter } from './mailbox-router';

/** The mailbox mounted as app.ts mounts it, with every connection reported as coming from `peer`. */
function mailboxSeenFrom(peer: string) {
  const smtp = { messages: () => [{ subject: 'Reset your Barwright password' }] } as unknown as LocalSmtp;
  const app = express();
  app.use((req, _res, next) => {
    // supertest always connects over loopback; this stands in for a peer on the network.
    Object.defineProperty(req.socket, 'remoteAddress', { value: peer, configurable: true });
    next();
  });
  app.use('/api/dev', mailboxRouter(smtp));
  app.use('/api', apiNotFound);
  return app;
}

describe('the loopback check', () => {
  it('knows loopback addresses in every spelling a socket reports (RFC 1122 127/8, RFC 4291 ::1 and IPv4-mapped)', () => {
    for (const a of ['127.0.0.1', '127.255.10.3', '::1', '0:0:0:0:0:0:0:1', '::ffff:127.0.0.1', '::FFFF:127.1.2.3']) {
      expect(isLoopbackAddress(a), a).toBe(true);
    }
    for (const a of ['10.0.0.1', '192.168.1.20', '::ffff:10.0.0.1', 'fe80::1', '::', '0.0.0.0', '128.0.0.1', 'localhost', '', undefined]) {
      expect(isLoopbackAddress(a), String(a)).toBe(false);
    }
  });

  it('lets a loopback client read the mailbox', async () => {
    for (const peer of ['127.0.0.1', '::1', '::ffff:127.0.0.1']) {
      const res = await request(mailboxSeenFrom(peer)).get('/api/dev/mailbox');
      expect(res.status, peer).toBe(200);
      expect(res.body).toHaveLength(1);
    }
  });

  it('answers any other client 404, as if there were no such route, whatever X-Forwarded-For says', async () => {
    for (const peer of ['192.0.2.7', '::ffff:198.51.100.4', '2001:db8::1']) {
      const res = await request(mailboxSeenFrom(peer)).get('/api/dev/mailbox').set('X-Forwarded-For', '127.0.0.1');
      expect(res.status, peer).toBe(404);
      expect(res.body.error.code).toBe('not_found');
      expect(res.text).not.toMatch(/Reset/);
    }
  });
});
