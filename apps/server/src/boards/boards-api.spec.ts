import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';

const drivers = await availableDrivers();
const tokenIn = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';

describe.each(drivers)('boards API on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let owner: Client;
  let boardId: string;
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    for (const name of ['owner', 'editor', 'viewer', 'outsider']) await makeUser(database, `${name}@example.test`);
    owner = new Client(server.app);
    await owner.signIn('owner@example.test');
    boardId = (await owner.post('/api/boards', { name: 'Winter bars' })).body.id;
  });

  async function join(email: string, role: 'editor' | 'viewer') {
    const since = new Date();
    expect((await owner.post(`/api/boards/${boardId}/invitations`, { email, role })).status).toBe(201);
    const mail = await server.smtp.waitFor(email, since);
    const c = new Client(server.app);
    await c.signIn(email);
    const res = await c.post('/api/invitations/accept', { token: tokenIn(mail.text) });
    expect(res.status).toBe(200);
    return { c, token: tokenIn(mail.text) };
  }

  it('creates, lists, renames and archives a board', async () => {
    const list = await owner.get('/api/boards');
    expect(list.body.mine).toMatchObject([{ id: boardId, name: 'Winter bars', role: 'owner', designCount: 0 }]);
    const renamed = await owner.patch(`/api/boards/${boardId}`, { name: 'Spring bars', archived: true });
    expect(renamed.body).toMatchObject({ name: 'Spring bars', archived: true });
    expect((await owner.post('/api/boards', { name: '' })).body.error.fields.name).toMatch(/required/);
    expect((await owner.post('/api/boards', { name: 'x'.repeat(81) })).body.error.fields.name).toMatch(/at most 80/);
  });

  it('invites by e-mail with a single-use link addressed to that person', async () => {
    const { c, token } = await join('editor@example.test', 'editor');
    expect((await c.get('/api/boards')).body.shared).toMatchObject([{ id: boardId, role: 'editor' }]);
    expect((await c.post('/api/invitations/accept', { token })).status).toBe(400);
    const since = new Date();
    await owner.post(`/api/boards/${boardId}/invitations`, { email: 'viewer@example.test', role: 'viewer' });
    const mail = await server.smtp.waitFor('viewer@example.test', since);
    const outsider = new Client(server.app);
    await outsider.signIn('outsider@example.test');
    const wrong = await outsider.post('/api/invitations/accept', { token: tokenIn(mail.text) });
    expect(wrong.status).toBe(403);
    expect((await owner.post(`/api/boards/${boardId}/invitations`, { email: 'editor@example.test', role: 'viewer' })).status).toBe(409);
  });

  it('hides a board from non-members and enforces roles on every route', async () => {
    const { c: editor } = await join('editor@example.test', 'editor');
    const { c: viewer } = await join('viewer@example.test', 'viewer');
    const outsider = new Client(server.app);
    await outsider.signIn('outsider@example.test');
    expect((await outsider.get(`/api/boards/${boardId}`)).status).toBe(404);
    expect((await new Client(server.app).get(`/api/boards/${boardId}`)).status).toBe(401);
    expect((await viewer.get(`/api/boards/${boardId}`)).status).toBe(200);
    expect((await viewer.post(`/api/boards/${boardId}/designs`, { title: 'Mine' })).status).toBe(403);
    expect((await editor.patch(`/api/boards/${boardId}`, { name: 'Taken over' })).status).toBe(403);
    expect((await editor.post(`/api/boards/${boardId}/invitations`, { email: 'x@example.test', role: 'editor' })).status).toBe(403);
    const created = await editor.post(`/api/boards/${boardId}/designs`, { title: 'Basket trial', preset: 'basket-weave' });
    expect(created.status).toBe(201);
    expect((await outsider.get(`/api/designs/${created.body.id}`)).status).toBe(404);
    expect((await viewer.get(`/api/designs/${created.body.id}`)).body.study.schedule.kind).toBe('ramp');
    expect((await editor.send('delete', `/api/designs/${created.body.id}`)).status).toBe(403);
  });

  it('changes a role, removes a member, and lets a member leave', async () => {
    const { c: editor } = await join('editor@example.test', 'editor');
    const detail = (await owner.get(`/api/boards/${boardId}`)).body;
    const editorId = detail.members.find((m: { email: string }) => m.email === 'editor@example.test').userId;
    const changed = await owner.patch(`/api/boards/${boardId}/members/${editorId}`, { role: 'viewer' });
    expect(changed.body.members.find((m: { userId: string }) => m.userId === editorId).role).toBe('viewer');
    expect((await editor.post(`/api/boards/${boardId}/designs`, { title: 'Nope' })).status).toBe(403);
    expect((await editor.send('delete', `/api/boards/${boardId}/members/${editorId}`)).status).toBe(204);
    expect((await editor.get(`/api/boards/${boardId}`)).status).toBe(404);
    const ownerId = detail.members.find((m: { role: string }) => m.role === 'owner').userId;
    expect((await owner.send('delete', `/api/boards/${boardId}/members/${ownerId}`)).status).toBe(409);
  });

  it('creates designs from presets, duplicates, deletes into a 30-day bin and restores', async () => {
    const { id } = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Sine 24' })).body;
    expect((await owner.get(`/api/designs/${id}`)).body).toEqual(EXAMPLE_DESIGN);
    expect((await owner.post(`/api/boards/${boardId}/designs`, { title: 'X', preset: 'spirograph' })).body.error.fields.preset).toMatch(/one of/);
    const copy = (await owner.post(`/api/designs/${id}/duplicate`)).body.id;
    expect((await owner.get(`/api/designs/${copy}`)).body).toEqual(EXAMPLE_DESIGN);
    expect((await owner.send('delete', `/api/designs/${id}`)).status).toBe(204);
    expect((await owner.get(`/api/designs/${id}`)).status).toBe(404);
    const detail = (await owner.get(`/api/boards/${boardId}`)).body;
    const binned = detail.designs.find((d: { id: string }) => d.id === id);
    expect(new Date(binned.purgeAt).getTime() - new Date(binned.deletedAt).getTime()).toBe(30 * 86_400_000);
    expect((await owner.post(`/api/designs/${id}/restore`)).status).toBe(200);
    expect((await owner.get(`/api/designs/${id}`)).status).toBe(200);
  });

  it('creates a design from a whole file, validated field by field', async () => {
    const file = { ...EXAMPLE_DESIGN, rosette: { baseRadius: 40, layers: [{ lobes: 20, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] } };
    const { id } = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Imported', file })).body;
    expect((await owner.get(`/api/designs/${id}`)).body.rosette.baseRadius).toBe(40);
    const bad = await owner.post(`/api/boards/${boardId}/designs`, { title: 'Bad', file: { ...file, rubber: { shape: 'round', radius: -1 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['file.rubber.radius']).toMatch(/negative/);
  });

  it('exports a design in every format and refuses an unknown one', async () => {
    const { id } = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Sine 24 keeper' })).body;
    for (const format of ['svg', 'dxf', 'gcode', 'csv', 'pdf']) {
      const res = await owner.agent.get(`/api/designs/${id}/export?format=${format}`).buffer(true);
      expect(res.status, format).toBe(200);
      expect(res.headers['content-disposition']).toMatch(/sine-24-keeper\./);
    }
    const bad = await owner.get(`/api/designs/${id}/export?format=stl`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.format).toMatch(/svg/);
  });

  it('keeps named versions and restores one as a new edit', async () => {
    const { id } = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Versions' })).body;
    const v = await owner.post(`/api/designs/${id}/versions`, { name: 'First try' });
    expect(v.status).toBe(201);
    expect((await owner.get(`/api/designs/${id}/versions`)).body).toMatchObject([{ name: 'First try', authorName: 'owner' }]);
    const restored = await owner.post(`/api/designs/${id}/versions/${v.body.id}/restore`);
    expect(restored.body).toEqual(EXAMPLE_DESIGN);
    expect((await owner.get(`/api/designs/${id}/versions/${v.body.id}`)).body.design).toEqual(EXAMPLE_DESIGN);
  });
});
