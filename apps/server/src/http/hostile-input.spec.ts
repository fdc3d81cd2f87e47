import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import type request from 'supertest';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';
import { member, publishedBar, upload, xsrfOf, type Member } from '../community/community-testing';
import { smallPng } from '../shop-log/test-images';

/**
 * Requests found to answer 500 by a hostile probe; each must now answer a 4xx in the API's error
 * shape. PostgreSQL's text type refuses U+0000 and its uuid type refuses a malformed id, so both
 * must be caught before a query is made.
 */
const drivers = await availableDrivers();
const NUL = 'a\u0000b';
const LOOSE_IDS = ['0'.repeat(36), '-'.repeat(36), 'abcdef01-2345-6789-abcd-ef0123456789'.replace(/-/g, 'a')];

describe.each(drivers)('hostile input on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let mod: Client;
  let entryId: string;
  let designId: string;
  let commentId: string;
  let tobias: Member;

  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-hostile-'));
  const logged: unknown[] = [];
  const ctx = useTestServer(driver, { uploadsDir, rateLimits: { signInPerAddress: 1000 }, log: (e) => logged.push(e) });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await member(database, server, 'maren');
    ({ entryId, designId } = await publishedBar(maren, 'Sine'));
    tobias = await member(database, server, 'tobias');
    commentId = (await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'Nice' })).body.id;
    await makeUser(database, 'mod@example.test', 'admin');
    mod = new Client(server.app);
    await mod.signIn('mod@example.test');
  });

  /** Asserts a 4xx in the error shape, naming the request when it is not. */
  function expectRefused(label: string, res: request.Response, status?: number) {
    const seen = `${label}: ${res.status} ${JSON.stringify(res.body)} ${logged.splice(0).map(String).join(' / ')}`;
    expect.soft(res.status, seen).toBeGreaterThanOrEqual(400);
    expect.soft(res.status, seen).toBeLessThan(500);
    if (status) expect.soft(res.status, seen).toBe(status);
    expect.soft(res.body?.error?.code, seen).toEqual(expect.any(String));
    expect.soft(res.body?.error?.message, seen).toEqual(expect.any(String));
    expect.soft(JSON.stringify(res.body), seen).not.toMatch(/at .*\.(ts|js):\d+/);
  }

  it('refuses U+0000 in every text that is stored or searched, naming the field', async () => {
    const anonymous = new Client(server.app);
    expect((await maren.client.post('/api/reports', { target: { kind: 'comment', id: commentId }, reason: 'spam' })).status).toBe(201);
    const cases: Array<[string, () => Promise<request.Response>, string]> = [
      ['sign-up', () => anonymous.post('/api/auth/sign-up', { email: 'new@example.test', password: 'quiet-walnut-crosscut-49', displayName: NUL }), 'displayName'],
      ['sign-in', () => anonymous.post('/api/auth/sign-in', { email: `x${NUL}@example.test`, password: 'x' }), 'email'],
      ['reset request', () => anonymous.post('/api/auth/password-reset/request', { email: `x${NUL}@example.test` }), 'email'],
      ['profile', () => maren.client.patch('/api/auth/me', { displayName: NUL }), 'displayName'],
      ['new board', () => maren.client.post('/api/boards', { name: NUL }), 'name'],
      ['rename board', () => maren.client.patch(`/api/boards/${maren.boardId}`, { name: NUL }), 'name'],
      ['invite', () => maren.client.post(`/api/boards/${maren.boardId}/invitations`, { email: `x${NUL}@example.test`, role: 'editor' }), 'email'],
      ['accept invitation', () => maren.client.post('/api/invitations/accept', { token: `${'t'.repeat(20)}${NUL}` }), 'token'],
      ['new design', () => maren.client.post(`/api/boards/${maren.boardId}/designs`, { title: NUL }), 'title'],
      ['rename design', () => maren.client.patch(`/api/designs/${designId}`, { title: NUL }), 'title'],
      ['version', () => maren.client.post(`/api/designs/${designId}/versions`, { name: NUL }), 'name'],
      ['publish', () => maren.client.post(`/api/designs/${designId}/publish`, { title: 'Sine', description: NUL, tags: [] }), 'description'],
      ['publish tag', () => maren.client.post(`/api/designs/${designId}/publish`, { title: 'Sine', description: '', tags: [NUL] }), 'tags[0]'],
      ['comment', () => maren.client.post(`/api/entries/${entryId}/comments`, { body: NUL }), 'body'],
      ['edit comment', () => tobias.client.patch(`/api/comments/${commentId}`, { body: NUL }), 'body'],
      ['report', () => maren.client.post('/api/reports', { target: { kind: 'comment', id: commentId }, reason: 'other', details: NUL }), 'details'],
      ['hide', () => mod.post(`/api/moderation/items/entry/${entryId}/hide`, { reason: NUL }), 'reason'],
      ['dismiss', () => mod.post(`/api/moderation/items/comment/${commentId}/dismiss`, { note: NUL }), 'note'],
      ['feature', () => mod.post('/api/moderation/showcase', { entryId, note: NUL }), 'note'],
      ['key', () => maren.client.post('/api/boards', { name: 'Fine', [NUL]: 1 }), 'body'],
    ];
    for (const [label, send, field] of cases) {
      const res = await send();
      expectRefused(label, res, 400);
      expect.soft(Object.keys(res.body?.error?.fields ?? {}), label).toContain(field);
    }
  });

  it('refuses U+0000 in query parameters', async () => {
    const anonymous = new Client(server.app);
    const cases: Array<[string, string]> = [
      ['explore q', '/api/entries?q=a%00b'],
      ['explore tags', '/api/entries?tags=a%00b'],
      ['unsubscribe', '/api/notifications/unsubscribe?token=a%00b'],
      ['export format', `/api/designs/${designId}/export?format=svg%00`],
      ['entry export', `/api/entries/${entryId}/export?format=svg&revision=1%00`],
    ];
    for (const [label, path] of cases) expectRefused(label, label === 'unsubscribe' || label.startsWith('explore') ? await anonymous.get(path) : await maren.client.get(path), 400);
    expectRefused('audit', await mod.get('/api/moderation/audit?action=a%00b'), 400);
    expectRefused('notifications', await maren.client.get('/api/notifications?before=a%00b'), 400);
  });

  it('answers 4xx for body-parser and router errors (gzip on a plain body, a malformed % escape, bad JSON)', async () => {
    const token = await xsrfOf(maren.client);
    const gz = await maren.client.agent.post('/api/boards').set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json').set('Content-Encoding', 'gzip').send('{"name":"x"}');
    expectRefused('gzip', gz, 400);
    const br = await maren.client.agent.post('/api/boards').set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json').set('Content-Encoding', 'x-unknown').send('{"name":"x"}');
    expectRefused('unknown encoding', br, 415);
    const charset = await maren.client.agent.post('/api/boards').set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json; charset=x-nothing').send('{"name":"x"}');
    expectRefused('unknown charset', charset, 415);
    const json = await maren.client.agent.post('/api/boards').set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json').send('{"name":');
    expectRefused('bad json', json, 400);
    for (const path of ['/api/designs/%E0%A4%A', `/api/entries/%ZZ`, '/api/photos/%']) expectRefused(path, await maren.client.get(path));
    expectRefused('malformed escape, anonymous', await new Client(server.app).get('/api/entries/%E0%A4%A/comments'));
  });

  it('refuses an out-of-range date in the notifications query, naming the parameter', async () => {
    for (const before of ['0000-01-01T00:00:00Z', '1969-12-31T23:59:59Z', '+275760-09-13T00:00:00Z', '2024-02-30T00:00:00Z']) {
      const res = await maren.client.get(`/api/notifications?before=${encodeURIComponent(before)}`);
      expectRefused(before, res, 400);
      expect(res.body.error.fields, before).toHaveProperty('before');
    }
    expect((await maren.client.get(`/api/notifications?before=${encodeURIComponent('2024-02-01T00:00:00Z')}`)).status).toBe(200);
  });

  it('takes the last day of the range in the audit query (its day after is past what the database keeps)', async () => {
    for (const to of ['9999-12-31', '9999-12-31T23:59:59.999Z']) {
      expect((await mod.get(`/api/moderation/audit?to=${encodeURIComponent(to)}`)).status, to).toBe(200);
    }
  });

  it('answers 404 for malformed ids in every path', async () => {
    const token = await xsrfOf(maren.client);
    for (const bad of LOOSE_IDS) {
      expectRefused(`admin ${bad}`, await mod.patch(`/api/admin/users/${bad}`, { role: 'member' }), 404);
      expectRefused(`design ${bad}`, await maren.client.get(`/api/designs/${bad}`), 404);
      expectRefused(`version ${bad}`, await maren.client.get(`/api/designs/${designId}/versions/${bad}`), 404);
      expectRefused(`restore version ${bad}`, await maren.client.post(`/api/designs/${designId}/versions/${bad}/restore`), 404);
      expectRefused(`board ${bad}`, await maren.client.get(`/api/boards/${bad}`), 404);
      expectRefused(`member ${bad}`, await maren.client.patch(`/api/boards/${maren.boardId}/members/${bad}`, { role: 'viewer' }), 404);
      expectRefused(`remove member ${bad}`, await maren.client.agent.delete(`/api/boards/${maren.boardId}/members/${bad}`).set('X-XSRF-TOKEN', token), 404);
      expectRefused(`invitation ${bad}`, await maren.client.agent.delete(`/api/boards/${maren.boardId}/invitations/${bad}`).set('X-XSRF-TOKEN', token), 404);
      expectRefused(`entry ${bad}`, await maren.client.get(`/api/entries/${bad}`), 404);
      expectRefused(`comment ${bad}`, await maren.client.patch(`/api/comments/${bad}`, { body: 'x' }), 404);
      expectRefused(`photo ${bad}`, await maren.client.get(`/api/photos/${bad}`), 404);
      expectRefused(`showcase ${bad}`, await mod.patch(`/api/moderation/showcase/${bad}`, { note: 'x' }), 404);
      expectRefused(`case ${bad}`, await mod.get(`/api/moderation/items/entry/${bad}`));
    }
  });

  it('refuses U+0000 in an uploaded file name and in multipart fields', async () => {
    const png = await smallPng();
    const fields = { kind: 'trial', date: '2024-01-01' };
    expectRefused('photo name', await upload(maren.client, `/api/designs/${designId}/photos`, { data: png, name: `a${NUL}.png` }, fields));
    expectRefused('photo caption', await upload(maren.client, `/api/designs/${designId}/photos`, { data: png, name: 'a.png' }, { ...fields, caption: NUL }));
    expectRefused('table name', await upload(maren.client, '/api/rosettes/measured/preview', { field: 'table', data: Buffer.from('0,1\n90,1\n'), name: `t${NUL}.csv` }, {}));
  });

  it('refuses a body nested deeper than the limit before anything recurses over it', async () => {
    const depth = 20_000;
    const file = `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;
    const token = await xsrfOf(maren.client);
    const send = (path: string, body: string, method: 'post' | 'patch' = 'post') =>
      maren.client.agent[method](path).set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json').send(body);
    const deep = await send(`/api/boards/${maren.boardId}/designs`, `{"title":"Deep","file":${file}}`);
    expectRefused('deep design', deep, 400);
    expect(deep.body.error.message).toMatch(/64/);
    expectRefused('deep array', await send('/api/boards', `{"name":${'['.repeat(depth)}${']'.repeat(depth)}}`), 400);
    expectRefused('deep publish', await send(`/api/designs/${designId}/publish`, `{"title":"x","tags":${'['.repeat(100)}${']'.repeat(100)}}`), 400);
    // Brackets inside strings do not count.
    expect((await send('/api/boards', JSON.stringify({ name: '{'.repeat(30) + '"[' }))).status).toBe(201);
  });
});
