import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { MailboxMessage } from '@barwright/contracts';

/**
 * An in-process fake SMTP server for local use and tests: it accepts every message on loopback,
 * parses it and keeps it in memory (newest first) for the development mailbox page.
 */
export interface LocalSmtp {
  port: number;
  messages(): MailboxMessage[];
  /** Resolves with the next message sent to `address` (or one already kept, when `since` allows). */
  waitFor(address: string, since?: Date, timeoutMs?: number): Promise<MailboxMessage>;
  close(): Promise<void>;
}

const KEEP = 500;

export async function startLocalSmtp(): Promise<LocalSmtp> {
  const kept: MailboxMessage[] = [];
  const waiters = new Set<(m: MailboxMessage) => void>();
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const to = [mail.to ?? []].flat().flatMap((a) => a.value.map((v) => v.address ?? ''));
          const message: MailboxMessage = {
            id: randomUUID(),
            to,
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            sentAt: new Date().toISOString(), // when it arrived; the Date header has whole seconds only
          };
          kept.unshift(message);
          kept.length = Math.min(kept.length, KEEP);
          for (const w of waiters) w(message);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const port = ((server as unknown as { server: { address(): AddressInfo } }).server.address()).port;
  return {
    port,
    messages: () => [...kept],
    waitFor(address, since = new Date(0), timeoutMs = 5000) {
      const match = (m: MailboxMessage) => m.to.includes(address.toLowerCase()) && new Date(m.sentAt) >= since;
      const found = kept.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => {
          waiters.delete(listener);
          reject(new Error(`no mail to ${address} within ${timeoutMs} ms`));
        }, timeoutMs);
        const listener = (m: MailboxMessage) => {
          if (!match(m)) return;
          clearTimeout(timer);
          waiters.delete(listener);
          resolve(m);
        };
        waiters.add(listener);
      });
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
