import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { notifications, notificationSettings } from '../../../../db/schema';
import type { Mailer } from '../mail/mailer';
import { makeUser } from '../testing/test-app';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { sendDueDigests } from './digests';

const drivers = await availableDrivers();

/** A mailer that takes a while, as SMTP does, and counts what it sent; `failing` makes the next send throw. */
function slowMailer() {
  const sent: string[] = [];
  let failing = false;
  const mailer: Mailer = {
    send: async (to) => {
      await new Promise((r) => setTimeout(r, 100));
      if (failing) {
        failing = false;
        throw new Error('SMTP down');
      }
      sent.push(to);
    },
    close: () => {},
  };
  return { mailer, sent, failNext: () => (failing = true) };
}

describe.each(drivers)('digests on %s', (driver) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(driver);
  });
  beforeEach(() => database.reset());
  afterAll(() => database?.close());

  const waiting = async (email: string) => {
    const user = await makeUser(database, email);
    await database.db.insert(notificationSettings).values({ userId: user.id, email: 'digest' });
    await database.db.insert(notifications).values({ userId: user.id, kind: 'invitation', digestPending: true, data: { boardName: 'Club', actorName: 'Ada', role: 'viewer' } });
    return user;
  };

  it('two runs at once (two instances) send one e-mail per member', async () => {
    await waiting('one@example.test');
    await waiting('two@example.test');
    const { mailer, sent } = slowMailer();
    const deps = { db: database.db, mailer, publicUrl: 'http://localhost:3000', secret: 'x'.repeat(32) };
    const counts = await Promise.all([sendDueDigests(deps), sendDueDigests(deps), sendDueDigests(deps)]);
    expect(counts.reduce((a, b) => a + b, 0)).toBe(2);
    expect(sent.sort()).toEqual(['one@example.test', 'two@example.test']);
  });

  it('hands the claim back when the mail cannot be sent, so the next run sends it', async () => {
    await waiting('retry@example.test');
    const { mailer, sent, failNext } = slowMailer();
    const deps = { db: database.db, mailer, publicUrl: 'http://localhost:3000', secret: 'x'.repeat(32) };
    failNext();
    await expect(sendDueDigests(deps)).rejects.toThrow('SMTP down');
    expect(await sendDueDigests(deps)).toBe(1);
    expect(sent).toEqual(['retry@example.test']);
  });
});
