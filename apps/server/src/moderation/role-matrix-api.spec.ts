import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { comments, showcaseItems } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar } from '../community/community-testing';
import { MODERATION_ROUTES } from '../openapi/moderation-routes';
import { commentOn, itemPath, person, report } from './moderation-testing';

const drivers = await availableDrivers();
type Who = 'anonymous' | 'member' | 'moderator' | 'admin';
const WHO: Who[] = ['anonymous', 'member', 'moderator', 'admin'];
/** The usual answers: the desk is for moderators and admins. */
const DESK: Record<Who, number> = { anonymous: 401, member: 403, moderator: 200, admin: 200 };

describe.each(drivers)('moderation role × route matrix on %s', (driver) => {
  // Every case signs five accounts in from one address: lift the sign-in limit, which is not under test here.
  const ctx = useTestServer(driver, { rateLimits: { signInPerAddress: 100_000 } });
  let database: TestDatabase;
  let server: TestServer;
  /** The fixtures every route acts on: a reported comment on a bar not featured yet, a hidden comment, a featured bar. */
  let ids: { comment: string; featured: string; hidden: string; fresh: string };
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    await makeUser(database, 'member@example.test', 'member');
    await makeUser(database, 'moderator@example.test', 'moderator');
    await makeUser(database, 'admin@example.test', 'admin');
    const maren = await person(database, server, 'maren');
    const ilse = await person(database, server, 'ilse');
    const fresh = (await publishedBar(maren, 'Sine 24')).entryId;
    const featured = (await publishedBar(maren, 'Basket weave 18')).entryId;
    const comment = await commentOn(ilse, fresh, 'Cheap rosettes at example.test');
    const hidden = await commentOn(ilse, fresh, 'More of the same');
    expect((await report(maren, 'comment', comment)).status).toBe(201);
    await database.db.insert(showcaseItems).values({ entryId: featured, note: 'A clean weave', position: 0 });
    await database.db.update(comments).set({ hiddenAt: new Date(), hiddenReason: 'advertising' }).where(eq(comments.id, hidden));
    ids = { comment, featured, hidden, fresh };
  });

  async function clientAs(who: Who) {
    const c = new Client(server.app);
    if (who !== 'anonymous') await c.signIn(`${who}@example.test`);
    return c;
  }

  const desk = (status: number) => ({ ...DESK, moderator: status, admin: status });
  const routes: { name: string; call: (c: Client) => Promise<{ status: number; body: any }>; expected: Record<Who, number> }[] = [
    { name: 'get /api/showcase', call: (c) => c.get('/api/showcase'), expected: { anonymous: 200, member: 200, moderator: 200, admin: 200 } },
    { name: 'post /api/reports', call: (c) => c.post('/api/reports', { target: { kind: 'comment', id: ids.comment }, reason: 'spam' }), expected: { anonymous: 401, member: 201, moderator: 201, admin: 201 } },
    { name: 'get /api/moderation/queue', call: (c) => c.get('/api/moderation/queue'), expected: DESK },
    { name: 'get /api/moderation/hidden', call: (c) => c.get('/api/moderation/hidden'), expected: DESK },
    { name: 'get /api/moderation/items/{kind}/{id}', call: (c) => c.get(itemPath('comment', ids.comment)), expected: DESK },
    { name: 'post /api/moderation/items/{kind}/{id}/dismiss', call: (c) => c.post(`${itemPath('comment', ids.comment)}/dismiss`, {}), expected: DESK },
    { name: 'post /api/moderation/items/{kind}/{id}/hide', call: (c) => c.post(`${itemPath('comment', ids.comment)}/hide`, { reason: 'Advertising' }), expected: DESK },
    { name: 'post /api/moderation/items/{kind}/{id}/restore', call: (c) => c.post(`${itemPath('comment', ids.hidden)}/restore`, {}), expected: DESK },
    {
      name: 'post /api/moderation/items/{kind}/{id}/suspend-author',
      call: (c) => c.post(`${itemPath('comment', ids.comment)}/suspend-author`, { reason: 'Spam account' }),
      expected: { ...DESK, moderator: 403 },
    },
    { name: 'get /api/moderation/showcase', call: (c) => c.get('/api/moderation/showcase'), expected: DESK },
    { name: 'post /api/moderation/showcase', call: (c) => c.post('/api/moderation/showcase', { entryId: ids.fresh, note: 'Crisp flats' }), expected: desk(201) },
    { name: 'put /api/moderation/showcase/order', call: (c) => c.send('put', '/api/moderation/showcase/order', { entryIds: [ids.featured] }), expected: DESK },
    { name: 'patch /api/moderation/showcase/{entryId}', call: (c) => c.patch(`/api/moderation/showcase/${ids.featured}`, { note: 'Still crisp' }), expected: DESK },
    { name: 'delete /api/moderation/showcase/{entryId}', call: (c) => c.send('delete', `/api/moderation/showcase/${ids.featured}`), expected: desk(204) },
    { name: 'get /api/moderation/audit', call: (c) => c.get('/api/moderation/audit'), expected: DESK },
    { name: 'get /api/moderation/audit/actors', call: (c) => c.get('/api/moderation/audit/actors'), expected: DESK },
  ];

  it('covers every moderation and showcase route', () => {
    expect(routes.map((r) => r.name).sort()).toEqual(MODERATION_ROUTES.map((r) => `${r.method} ${r.path}`).sort());
  });

  describe.each(routes)('$name', (route) => {
    it.each(WHO)('answers %s as the role allows', async (who) => {
      const res = await route.call(await clientAs(who));
      expect(res.status, JSON.stringify(res.body)).toBe(route.expected[who]);
      if (res.status === 401) expect(res.body.error.code).toBe('unauthenticated');
      if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
    });
  });

  it('takes a role away at once: the next request of the same session is refused, and a new role works at once too', async () => {
    const admin = await clientAs('admin');
    const moderator = await clientAs('moderator');
    const member = await clientAs('member');
    expect((await moderator.get('/api/moderation/queue')).status).toBe(200);
    const demoted = (await moderator.get('/api/auth/me')).body.id;
    const promoted = (await member.get('/api/auth/me')).body.id;
    expect((await admin.patch(`/api/admin/users/${demoted}`, { role: 'member' })).status).toBe(200);
    expect((await admin.patch(`/api/admin/users/${promoted}`, { role: 'moderator' })).status).toBe(200);
    expect((await moderator.get('/api/moderation/queue')).status).toBe(403);
    expect((await moderator.post(`${itemPath('comment', ids.comment)}/hide`, { reason: 'x' })).status).toBe(403);
    expect((await member.get('/api/moderation/queue')).status).toBe(200);
  });
});
