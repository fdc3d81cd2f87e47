import { beforeEach, describe, expect, it } from 'vitest';
import type { Notification } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, type Member } from '../community/community-testing';
import { commentOn, itemPath, person } from './moderation-testing';

const drivers = await availableDrivers();
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** An author hears of what the moderators did to their items: in the app, and by mail as their setting says (the real fake SMTP server). */
describe.each(drivers)('moderation notifications on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let ilse: Member;
  let tobias: Member;
  let entryId: string;

  const ctx = useTestServer(driver, { rateLimits: { signInPerAddress: 1000 } });
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    tobias = await person(database, server, 'tobias', 'moderator');
    entryId = (await publishedBar(maren, 'Sine 24')).entryId;
  });

  const listOf = async (m: Member) => (await m.client.get('/api/notifications')).body.items as Notification[];
  const mailsTo = (m: Member, since: Date) => server.smtp.messages().filter((x) => x.to.includes(m.email) && new Date(x.sentAt) >= since);

  it('tells the author of a hidden bar, with the reason, in the app and at once by e-mail, and again when it is restored', async () => {
    const since = new Date();
    expect((await tobias.client.post(`${itemPath('entry', entryId)}/hide`, { reason: 'Copies another member’s bar without credit' })).status).toBe(200);
    const [hidden] = await listOf(maren);
    expect(hidden).toMatchObject({ kind: 'item-hidden', entryId, link: `/entries/${entryId}`, actor: null, read: false });
    expect(hidden.text).toBe('The moderators hid your bar “Sine 24”. Reason: Copies another member’s bar without credit. Others no longer see it; you still do, and it is not deleted.');
    const mail = await server.smtp.waitFor(maren.email, since);
    expect(mail.text).toContain(hidden.text);
    expect(mail.subject).toBe(`${hidden.text.slice(0, 87)}…`); // long sentences are cut in the subject only
    expect(mail.text).toContain(`/entries/${entryId}`);
    expect(mail.text).not.toContain('tobias'); // the decision is the moderators’, not one person’s

    expect((await tobias.client.post(`${itemPath('entry', entryId)}/restore`, { note: 'Credit added' })).status).toBe(200);
    const [restored] = await listOf(maren);
    expect(restored).toMatchObject({ kind: 'item-restored', text: 'The moderators restored your bar “Sine 24”: everyone sees it again.', link: `/entries/${entryId}` });
    await expect.poll(() => mailsTo(maren, since).map((m) => m.subject)).toContain(restored.text); // mail goes out after the answer
    expect((await maren.client.get('/api/notifications')).body.unread).toBe(2);
  });

  it('tells a comment’s author, linking to the thread, and keeps the notice although the comment is hidden', async () => {
    const comment = await commentOn(ilse, entryId, 'Buy cheap rosettes at example.test');
    expect((await tobias.client.post(`${itemPath('comment', comment)}/hide`, { reason: 'advertising' })).status).toBe(200);
    const notices = await listOf(ilse);
    expect(notices).toMatchObject([{ kind: 'item-hidden', link: `/entries/${entryId}#comments` }]);
    expect(notices[0].text).toBe('The moderators hid your comment on “Sine 24”. Reason: advertising. Others no longer see it; you still do, and it is not deleted.');
  });

  it('tells the author when their bar is featured, with the curator’s note and name', async () => {
    const since = new Date();
    expect((await tobias.client.post('/api/moderation/showcase', { entryId, note: 'A clean first keeper' })).status).toBe(201);
    const [featured] = await listOf(maren);
    expect(featured).toMatchObject({ kind: 'entry-featured', entryId, link: `/entries/${entryId}`, actor: { id: tobias.id } });
    expect(featured.text).toBe('tobias featured your bar “Sine 24” in the showcase: “A clean first keeper”');
    expect((await server.smtp.waitFor(maren.email, since)).subject).toBe(featured.text);
  });

  it('follows the author’s e-mail setting: the digest waits, off sends nothing; the bell tells either way', async () => {
    await maren.client.send('put', '/api/notifications/settings', { email: 'digest' });
    await ilse.client.send('put', '/api/notifications/settings', { email: 'off' });
    const comment = await commentOn(ilse, entryId, 'Off topic');
    const since = new Date();
    expect((await tobias.client.post('/api/moderation/showcase', { entryId, note: 'Worth a look' })).status).toBe(201);
    await tobias.client.post(`${itemPath('comment', comment)}/hide`, { reason: 'off topic' });
    await pause(300);
    expect(mailsTo(maren, since)).toEqual([]);
    expect(mailsTo(ilse, since)).toEqual([]);
    expect((await listOf(maren)).map((n) => n.kind)).toContain('entry-featured');
    expect((await listOf(ilse)).map((n) => n.kind)).toEqual(['item-hidden']);
  });

  it('tells nobody of their own doings: a moderator featuring their own bar hears nothing', async () => {
    const own = (await publishedBar(tobias, 'Moderator’s own')).entryId;
    expect((await tobias.client.post('/api/moderation/showcase', { entryId: own, note: 'Worth a look' })).status).toBe(201);
    expect(await listOf(tobias)).toEqual([]);
  });
});
