import { beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { COMMENT_MAX, renderCommentHtml } from '@barwright/contracts';
import { comments } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { member, publishedBar, type Member } from '../community/community-testing';

const drivers = await availableDrivers();
const XSS = ['<script>alert(1)</script>', '<img src=x onerror=alert(1)>', 'https://example.test/"><svg onload=alert(1)>'];

describe.each(drivers)('comments API on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let author: Member;
  let reader: Member;
  let entryId: string;
  const path = () => `/api/entries/${entryId}/comments`;

  const ctx = useTestServer(driver, { communityLimits: { commentsPerMinute: 4 } });
  beforeEach(async () => {
    ({ database, server } = ctx);
    author = await member(database, server, 'maren');
    reader = await member(database, server, 'tobias');
    entryId = (await publishedBar(author, 'Sine 24')).entryId;
  });

  it('threads one level deep and counts comments for "most discussed"', async () => {
    const top = await reader.client.post(path(), { body: 'Lovely barleycorn.' });
    expect(top.status).toBe(201);
    expect(top.body).toMatchObject({ parentId: null, author: { displayName: 'tobias' }, body: 'Lovely barleycorn.', deleted: false, replies: [] });
    const reply = await author.client.post(path(), { body: 'Thanks, cut in A2.', parentId: top.body.id });
    expect(reply.status).toBe(201);
    const deeper = await reader.client.post(path(), { body: 'Deeper', parentId: reply.body.id });
    expect(deeper.status).toBe(400);
    expect(deeper.body.error.fields.parentId).toMatch(/top-level/);
    const thread = (await new Client(server.app).get(path())).body;
    expect(thread.count).toBe(2);
    expect(thread.comments).toHaveLength(1);
    expect(thread.comments[0].replies.map((r: { body: string }) => r.body)).toEqual(['Thanks, cut in A2.']);
    expect((await new Client(server.app).get(`/api/entries/${entryId}`)).body.commentCount).toBe(2);
    expect((await reader.client.post(path(), { body: ' ' })).body.error.fields.body).toMatch(/required/);
    expect((await reader.client.post(path(), { body: 'x'.repeat(COMMENT_MAX + 1) })).body.error.fields.body).toMatch(/at most 2000/);
  });

  it('returns plain text, so script stays text whichever way it is shown', async () => {
    for (const payload of XSS) {
      const res = await reader.client.post(path(), { body: payload });
      expect(res.body.body).toBe(payload);
      expect(res.headers['content-type']).toMatch(/application\/json/);
    }
    const thread = (await reader.client.get(path())).body;
    for (const c of thread.comments) {
      const html = renderCommentHtml(c.body);
      expect(html).not.toMatch(/<(script|img|svg)/i);
      expect(html).not.toMatch(/<a [^>]*on\w+=/i);
    }
  });

  it('lets the author edit within the window and delete, keeping the thread shape', async () => {
    const top = (await reader.client.post(path(), { body: 'Frist' })).body;
    await author.client.post(path(), { body: 'A reply', parentId: top.id });
    expect((await author.client.patch(`/api/comments/${top.id}`, { body: 'Hijack' })).status).toBe(403);
    const edited = await reader.client.patch(`/api/comments/${top.id}`, { body: 'First' });
    expect(edited.body).toMatchObject({ body: 'First', editedAt: expect.any(String) });
    await database.db.update(comments).set({ createdAt: new Date(Date.now() - 16 * 60_000) }).where(eq(comments.id, top.id));
    const late = await reader.client.patch(`/api/comments/${top.id}`, { body: 'Too late' });
    expect(late.status).toBe(403);
    expect(late.body.error.code).toBe('edit_window_closed');
    expect((await author.client.send('delete', `/api/comments/${top.id}`)).status).toBe(403);
    expect((await reader.client.send('delete', `/api/comments/${top.id}`)).status).toBe(204);
    const thread = (await reader.client.get(path())).body;
    expect(thread.comments[0]).toMatchObject({ id: top.id, deleted: true, body: null, author: null });
    expect(thread.comments[0].replies).toHaveLength(1);
    expect(thread.count).toBe(1);
    expect((await reader.client.post(path(), { body: 'to the deleted', parentId: top.id })).status).toBe(409);
  });

  it('limits how fast a member may comment', async () => {
    for (let i = 0; i < 4; i++) expect((await reader.client.post(path(), { body: `note ${i}` })).status).toBe(201);
    const fifth = await reader.client.post(path(), { body: 'one too many' });
    expect(fifth.status).toBe(429);
    expect(fifth.body.error.message).toMatch(/at most 4 comments a minute/);
    expect((await author.client.post(path(), { body: 'others may still' })).status).toBe(201);
  });
});
