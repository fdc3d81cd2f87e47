import { beforeAll, describe, expect, it } from 'vitest';
import type { Mailer } from '../mail/mailer';
import type { MailContent } from '../mail/mail-layout';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';
import { consumeToken, issueToken, revokeTokens } from './account-tokens';

const drivers = await availableDrivers();
const linkToken = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';
const NEW_PASSWORD = 'ember-gauge-tinplate-77';

describe.each(drivers)('reset links on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  beforeAll(() => void ({ database, server } = ctx));

  async function requestLink(c: Client, email: string) {
    const since = new Date();
    expect((await c.post('/api/auth/password-reset/request', { email })).status).toBe(202);
    return linkToken((await server.smtp.waitFor(email, since)).text);
  }

  it('a used reset link uses up every other outstanding link of that user, and no one else\'s', async () => {
    await makeUser(database, 'lena@example.test');
    await makeUser(database, 'otto@example.test');
    const c = new Client(server.app);
    const older = await requestLink(c, 'lena@example.test');
    const newer = await requestLink(c, 'lena@example.test');
    const othersLink = await requestLink(c, 'otto@example.test');
    expect((await c.post('/api/auth/password-reset/confirm', { token: newer, password: NEW_PASSWORD })).status).toBe(200);
    const stale = await c.post('/api/auth/password-reset/confirm', { token: older, password: 'walnut-ferrule-quench-31' });
    expect(stale.status).toBe(400);
    expect(stale.body.error.code).toBe('invalid_token');
    await c.signIn('lena@example.test', NEW_PASSWORD);
    expect((await c.post('/api/auth/password-reset/confirm', { token: othersLink, password: NEW_PASSWORD })).status).toBe(200);
  });

  it('of two links of one user confirmed at the same moment, exactly one sets the password', async () => {
    await makeUser(database, 'pia@example.test');
    const c = new Client(server.app);
    const links = [await requestLink(c, 'pia@example.test'), await requestLink(c, 'pia@example.test')];
    const passwords = ['walnut-ferrule-quench-31', 'tallow-bevel-grindstone-58'];
    const answers = await Promise.all(links.map((token, i) => new Client(server.app).post('/api/auth/password-reset/confirm', { token, password: passwords[i] })));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 400]);
  });

  it('a password set by other means (the admin command) uses up the reset links, not the verification links', async () => {
    const user = await makeUser(database, 'rui@example.test');
    const resets = [await issueToken(database.db, user.id, 'reset'), await issueToken(database.db, user.id, 'reset')];
    const verify = await issueToken(database.db, user.id, 'verify');
    await revokeTokens(database.db, user.id, 'reset');
    for (const token of resets) expect(await consumeToken(database.db, token, 'reset')).toBeUndefined();
    expect(await consumeToken(database.db, verify, 'verify')).toBe(user.id);
  });
});

/** A mailer whose sends stay pending until the test lets them go, as a slow SMTP server would. */
function heldMailer() {
  const sent: string[] = [];
  const held: (() => void)[] = [];
  const mailer: Mailer = {
    send: (to: string, _content: MailContent) => {
      sent.push(to);
      return new Promise<void>((resolve) => held.push(resolve));
    },
    close: () => {},
  };
  return { mailer, sent, release: () => held.splice(0).forEach((resolve) => resolve()) };
}

describe('a reset request', () => {
  const held = heldMailer();
  const logged: unknown[] = [];
  const ctx = useTestServer('pglite', { mailer: held.mailer, log: (e) => logged.push(e) });

  it('is answered before the address is looked up or any mail sent, known address or not', async () => {
    await makeUser(ctx.database, 'sol@example.test');
    const c = new Client(ctx.server.app);
    // Were the answer to wait for the mail, it would never come: the mailer holds every send.
    const known = await c.post('/api/auth/password-reset/request', { email: 'sol@example.test' });
    const unknown = await c.post('/api/auth/password-reset/request', { email: 'nobody@example.test' });
    expect([known.status, unknown.status]).toEqual([202, 202]);
    expect(known.body).toEqual(unknown.body);
    await expect.poll(() => held.sent).toEqual(['sol@example.test']);
    held.release();
  });

  it('logs a mail that fails after the answer', async () => {
    await makeUser(ctx.database, 'tam@example.test');
    const send = held.mailer.send;
    held.mailer.send = () => Promise.reject(new Error('SMTP down'));
    try {
      const res = await new Client(ctx.server.app).post('/api/auth/password-reset/request', { email: 'tam@example.test' });
      expect(res.status).toBe(202);
      await expect.poll(() => logged.map(String)).toEqual(['Error: SMTP down']);
    } finally {
      held.mailer.send = send;
    }
  });
});
