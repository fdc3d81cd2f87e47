import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';

const drivers = await availableDrivers();
type Who = 'anonymous' | 'member' | 'moderator' | 'admin';
const WHO: Who[] = ['anonymous', 'member', 'moderator', 'admin'];

describe.each(drivers)('admin API on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let targetId: string;
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    await makeUser(database, 'member@example.test', 'member');
    await makeUser(database, 'moderator@example.test', 'moderator');
    await makeUser(database, 'admin@example.test', 'admin');
    targetId = (await makeUser(database, 'target@example.test')).id;
  });

  async function clientAs(who: Who) {
    const c = new Client(server.app);
    if (who !== 'anonymous') await c.signIn(`${who}@example.test`);
    return c;
  }

  const routes = [
    { name: 'GET /api/admin/users', call: (c: Client) => c.get('/api/admin/users') },
    { name: 'PATCH /api/admin/users/:id', call: (c: Client) => c.patch(`/api/admin/users/${targetId}`, { role: 'moderator' }) },
  ];
  const expected: Record<Who, number> = { anonymous: 401, member: 403, moderator: 403, admin: 200 };

  describe.each(routes)('$name', (route) => {
    it.each(WHO)('answers %s as the role allows', async (who) => {
      const res = await route.call(await clientAs(who));
      expect(res.status).toBe(expected[who]);
      if (res.status !== 200) expect(res.body.error.code).toBe(who === 'anonymous' ? 'unauthenticated' : 'forbidden');
    });
  });

  it('lists users without password hashes and changes a role', async () => {
    const admin = await clientAs('admin');
    const list = await admin.get('/api/admin/users');
    expect(list.body).toHaveLength(4);
    expect(JSON.stringify(list.body)).not.toMatch(/argon2|passwordHash/);
    const res = await admin.patch(`/api/admin/users/${targetId}`, { role: 'moderator' });
    expect(res.body).toMatchObject({ id: targetId, role: 'moderator', suspended: false });
    const target = new Client(server.app);
    expect((await target.signIn('target@example.test')).body.role).toBe('moderator');
  });

  it('refuses bad bodies with field messages, unknown ids with 404, and self-demotion with 409', async () => {
    const admin = await clientAs('admin');
    const bad = await admin.patch(`/api/admin/users/${targetId}`, { role: 'emperor' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toMatch(/member, moderator, admin/);
    expect((await admin.patch(`/api/admin/users/${targetId}`, {})).status).toBe(400);
    expect((await admin.patch('/api/admin/users/00000000-0000-0000-0000-000000000000', { role: 'member' })).status).toBe(404);
    expect((await admin.patch('/api/admin/users/not-a-uuid', { role: 'member' })).status).toBe(404);
    const me = (await admin.get('/api/auth/me')).body.id;
    expect((await admin.patch(`/api/admin/users/${me}`, { suspended: true })).status).toBe(409);
    const long = await admin.patch(`/api/admin/users/${targetId}`, { role: 'moderator', reason: 'x'.repeat(501) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.reason).toBe('must be at most 500 characters');
    expect((await admin.patch(`/api/admin/users/${targetId}`, { reason: 'no change given' })).status).toBe(400);
    expect((await admin.patch(`/api/admin/users/${targetId}`, { role: 'moderator', undo: false })).body.error.fields.undo).toMatch(/must be true/);
    expect((await admin.get('/api/admin/users')).body.find((u: { id: string }) => u.id === targetId).role).toBe('member'); // nothing half-saved
  });

  it('writes the reason of a role change into the audit log, and its undo as an undo', async () => {
    const admin = await clientAs('admin');
    expect((await admin.patch(`/api/admin/users/${targetId}`, { role: 'admin', reason: '  Runs the club server now  ' })).status).toBe(200);
    expect((await admin.patch(`/api/admin/users/${targetId}`, { role: 'member', reason: 'Undo', undo: true })).body.role).toBe('member');
    const lines = (await admin.get(`/api/moderation/audit?item=${targetId}`)).body.items;
    expect(lines).toMatchObject([
      { action: 'user.role', reason: 'Undo', details: { from: 'admin', to: 'member', undo: true } },
      { action: 'user.role', reason: 'Runs the club server now', details: { from: 'member', to: 'admin' } },
    ]);
    expect(lines[1].details).not.toHaveProperty('undo');
  });
});
