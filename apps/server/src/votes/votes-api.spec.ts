import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { notifications, votes } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { boardWithMembers, inAWeek } from './votes-testing';

const drivers = await availableDrivers();

describe.each(drivers)('votes API on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let c: Record<string, Client>;
  let ids: Record<string, string>;
  let boardId: string;
  let designIds: string[];
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    ({ clients: c, ids, boardId, designIds } = await boardWithMembers(database, server));
  });
  const open = (who: Client, body: object = {}) => who.post(`/api/boards/${boardId}/votes`, { question: 'Which would you cut?', designIds, closesAt: inAWeek(), ...body });

  it('is opened by owners and editors only, over 3 to 30 designs of that board, closing in the future', async () => {
    expect((await open(c.owner)).status).toBe(201);
    expect((await open(c.editor)).status).toBe(201);
    expect((await open(c.viewer)).status).toBe(403);
    expect((await open(c.outsider)).status).toBe(404);
    expect((await open(new Client(server.app))).status).toBe(401);
    expect((await open(c.owner, { designIds: designIds.slice(0, 2) })).body.error.fields.designIds).toBe('needs at least 3 designs');
    expect((await open(c.owner, { designIds: [designIds[0], designIds[0], designIds[1]] })).body.error.fields.designIds).toBe('must not repeat a design');
    const elsewhere = (await c.outsider.post('/api/boards', { name: 'Other' })).body.id;
    const foreign = (await c.outsider.post(`/api/boards/${elsewhere}/designs`, { title: 'Not here' })).body.id;
    expect((await open(c.owner, { designIds: [...designIds.slice(0, 2), foreign] })).body.error.fields['designIds[2]']).toBe('is not a design of this board');
    expect((await open(c.owner, { closesAt: '2001-01-01T00:00:00Z' })).body.error.fields.closesAt).toBe('must be in the future');
    expect((await open(c.owner, { question: 'x'.repeat(201) })).body.error.fields.question).toBe('must be at most 200 characters');
    expect((await open(c.owner, { closesAt: 'soon' })).body.error.fields.closesAt).toMatch(/ISO 8601/);
  });

  it('is seen and answered by board members (invited by e-mail too), not by others; one answer per member per pair, changeable', async () => {
    const voteId = (await open(c.owner)).body.id;
    expect((await c.viewer.get(`/api/votes/${voteId}`)).body).toMatchObject({ question: 'Which would you cut?', closed: false, pairs: 6, answers: 0 });
    expect((await c.outsider.get(`/api/votes/${voteId}`)).status).toBe(404);
    expect((await c.outsider.get(`/api/votes/${voteId}/next-pair`)).status).toBe(404);
    expect((await c.outsider.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[1], pick: 'a' })).status).toBe(404);
    expect((await c.viewer.get(`/api/boards/${boardId}/votes`)).body).toMatchObject([{ id: voteId, closed: false }]);

    const put = (who: Client, a: string, b: string, pick: string) => who.send('put', `/api/votes/${voteId}/answers`, { a, b, pick });
    expect((await put(c.viewer, designIds[0], designIds[1], 'a')).body).toMatchObject({ answers: 1, myAnswers: 1 });
    // The same pair the other way round is the same question: the answer changes, none is added.
    expect((await put(c.viewer, designIds[1], designIds[0], 'tie')).body).toMatchObject({ answers: 1, myAnswers: 1 });
    expect((await put(c.editor, designIds[0], designIds[1], 'b')).body).toMatchObject({ answers: 2, myAnswers: 1 });
    expect((await put(c.viewer, designIds[0], designIds[0], 'a')).body.error.fields.b).toMatch(/another design/);
    const outside = (await c.owner.post(`/api/boards/${boardId}/designs`, { title: 'Late' })).body.id;
    expect((await put(c.viewer, designIds[0], outside, 'a')).body.error.fields.b).toBe('is not a design of this vote');
    expect((await put(c.viewer, designIds[0], designIds[2], 'maybe')).body.error.fields.pick).toMatch(/"a", "b" or "tie"/);
  });

  it('stops asking pairs of a design deleted while the vote is open, and keeps the answers given before', async () => {
    const voteId = (await open(c.owner)).body.id;
    const put = (who: Client, a: string, b: string, pick: string) => who.send('put', `/api/votes/${voteId}/answers`, { a, b, pick });
    expect((await put(c.viewer, designIds[0], designIds[3], 'a')).status).toBe(200);
    expect((await c.owner.send('delete', `/api/designs/${designIds[3]}`)).status).toBe(204);
    const seen = new Set<string>();
    for (;;) {
      const next = await c.viewer.get(`/api/votes/${voteId}/next-pair`);
      if (next.status === 204) break;
      seen.add(next.body.a).add(next.body.b);
      expect((await put(c.viewer, next.body.a, next.body.b, 'tie')).status).toBe(200);
    }
    expect(seen).toEqual(new Set(designIds.slice(0, 3)));
    const refused = await put(c.editor, designIds[1], designIds[3], 'b');
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.b).toMatch(/was deleted/);
    const vote = (await c.viewer.get(`/api/votes/${voteId}`)).body;
    expect(vote).toMatchObject({ pairs: 3, myAnswers: 3, answers: 4 });
    expect(vote.designs.find((d: { id: string }) => d.id === designIds[3]).title).toBe('Moiré (deleted)');
    expect(vote.ranking).toHaveLength(4);
  });

  it('hands each member the least-compared pair they have not answered, then 204', async () => {
    const voteId = (await open(c.owner, { designIds: designIds.slice(0, 3) })).body.id;
    const key = (p: { a: string; b: string }) => [p.a, p.b].sort().join(' ');
    // The editor answers two of the three pairs: the viewer's first pair is the one nobody answered.
    await c.editor.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[1], pick: 'a' });
    await c.editor.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[2], pick: 'a' });
    const first = (await c.viewer.get(`/api/votes/${voteId}/next-pair`)).body;
    expect(key(first)).toBe([designIds[1], designIds[2]].sort().join(' '));
    const seen = new Set<string>();
    for (let i = 0; i < 3; i++) {
      const pair = await c.viewer.get(`/api/votes/${voteId}/next-pair`);
      expect(pair.status).toBe(200);
      expect(seen.has(key(pair.body))).toBe(false);
      seen.add(key(pair.body));
      await c.viewer.send('put', `/api/votes/${voteId}/answers`, { ...pair.body, pick: 'a' });
    }
    expect((await c.viewer.get(`/api/votes/${voteId}/next-pair`)).status).toBe(204);
  });

  it('ranks by Bradley–Terry with wins (ties half) and comparisons, and refuses answers once closed', async () => {
    const voteId = (await open(c.owner, { designIds: designIds.slice(0, 3) })).body.id;
    const [x, y, z] = designIds;
    for (const who of [c.owner, c.editor, c.viewer]) {
      await who.send('put', `/api/votes/${voteId}/answers`, { a: x, b: y, pick: 'a' });
      await who.send('put', `/api/votes/${voteId}/answers`, { a: y, b: z, pick: 'tie' });
    }
    await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: x, b: z, pick: 'b' });
    const vote = (await c.viewer.get(`/api/votes/${voteId}`)).body;
    expect(vote.ranking.map((r: { designId: string }) => r.designId)[0]).toBe(x);
    expect(vote.ranking.find((r: { designId: string }) => r.designId === y)).toMatchObject({ wins: 1.5, comparisons: 6 });
    expect(vote.ranking.reduce((s: number, r: { strength: number }) => s + r.strength, 0)).toBeCloseTo(1, 12);

    expect((await c.viewer.post(`/api/votes/${voteId}/close`)).status).toBe(403);
    expect((await c.outsider.post(`/api/votes/${voteId}/close`)).status).toBe(404);
    const closed = await c.editor.post(`/api/votes/${voteId}/close`);
    expect(closed.body).toMatchObject({ closed: true });
    const late = await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: x, b: y, pick: 'b' });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('vote_closed');
    expect((await c.owner.get(`/api/votes/${voteId}/next-pair`)).status).toBe(204);
    expect((await c.viewer.get(`/api/votes/${voteId}`)).body.ranking).toEqual(vote.ranking);
  });

  it('closes by itself when its time has come, and tells the members when it opens and closes (in the app and by e-mail)', async () => {
    const since = new Date();
    const voteId = (await open(c.editor)).body.id;
    const mail = await server.smtp.waitFor('viewer@example.test', since);
    expect(mail.text).toContain('Which would you cut?');
    const told = async (userId: string, kind: string) => (await database.db.select().from(notifications).where(eq(notifications.userId, userId))).filter((n) => n.kind === kind).length;
    expect(await told(ids.owner, 'vote-opened')).toBe(1);
    expect(await told(ids.viewer, 'vote-opened')).toBe(1);
    expect(await told(ids.editor, 'vote-opened')).toBe(0); // nobody is told of their own doing
    expect(await told(ids.outsider, 'vote-opened')).toBe(0);
    const bell = (await c.viewer.get('/api/notifications')).body.items[0];
    expect(bell).toMatchObject({ kind: 'vote-opened', link: `/boards/${boardId}/votes/${voteId}` });

    await database.db.update(votes).set({ closesAt: new Date(Date.now() - 1000) }).where(eq(votes.id, voteId));
    const answer = await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[1], pick: 'a' });
    expect(answer.status).toBe(409);
    expect((await c.viewer.get(`/api/votes/${voteId}`)).body.closed).toBe(true);
    expect(await told(ids.viewer, 'vote-closed')).toBe(1);
    expect(await told(ids.owner, 'vote-closed')).toBe(1);
    (await c.viewer.get(`/api/votes/${voteId}`), await c.owner.get(`/api/boards/${boardId}/votes`));
    expect(await told(ids.viewer, 'vote-closed')).toBe(1); // once
  });
});
