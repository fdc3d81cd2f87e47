import { PDFParse } from 'pdf-parse';
import { beforeEach, describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, parseDesign } from '@barwright/contracts';
import { EXPORT_FORMATS } from '@barwright/engine';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';
import { editDesign, member, publishedBar, type Member } from '../community/community-testing';
import { entries } from '../../../../db/schema';
import { eq } from 'drizzle-orm';

const drivers = await availableDrivers();

/** Reads a response body as bytes (supertest leaves a PDF unparsed otherwise). */
const binary = (res: import('superagent').Response, done: (error: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

describe.each(drivers)('publishing API on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let author: Member;
  let other: Member;

  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    author = await member(database, server, 'maren');
    other = await member(database, server, 'tobias');
  });

  it('tells a board member which entry a design was published as', async () => {
    const { entryId, designId } = await publishedBar(author, 'Linked', { tags: ['sine'], description: 'Words.' });
    const link = await author.client.get(`/api/designs/${designId}/entry`);
    expect(link.body).toMatchObject({ entryId, title: 'Linked', description: 'Words.', tags: ['sine'], latestRevision: 1 });
    expect((await other.client.get(`/api/designs/${designId}/entry`)).status).toBe(404);
  });

  it('answers 200 with null for a design never published: the usual case, not an error', async () => {
    const fresh = (await author.client.post(`/api/boards/${author.boardId}/designs`, { title: 'Unpublished' })).body.id;
    const res = await author.client.get(`/api/designs/${fresh}/entry`);
    expect(res.status).toBe(200);
    expect(res.text).toBe('null');
  });

  it('publishes an immutable revision with the facts of the design and a thumbnail', async () => {
    const { entryId, designId } = await publishedBar(author, 'Sine 24 keeper', { tags: ['Barleycorn', 'a2 steel'], description: 'Cut on the club engine.' });
    const entry = (await new Client(server.app).get(`/api/entries/${entryId}`)).body;
    expect(entry).toMatchObject({
      id: entryId,
      title: 'Sine 24 keeper',
      tags: ['barleycorn', 'a2-steel'],
      lobes: 24,
      wave: 'sine',
      material: 'a2',
      cutterDiameterMm: 4.7625,
      author: { id: author.id, displayName: 'maren' },
      revisionCount: 1,
      rating: { count: 0, mean: null, score: 0 },
      parent: null,
      rootEntryId: entryId,
      source: null,
      viewer: { signedIn: false, canRate: false, canDelete: false },
    });
    expect(entry.latest.design).toEqual(EXAMPLE_DESIGN);
    expect((await author.client.get(`/api/entries/${entryId}`)).body.source).toEqual({ boardId: author.boardId, designId });
    const svg = await new Client(server.app).agent.get(`/api/entries/${entryId}/thumbnail.svg`).buffer(true);
    expect(svg.status).toBe(200);
    expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(svg.headers['x-content-type-options']).toBe('nosniff');
    expect(svg.body.toString()).toMatch(/^<\?xml[\s\S]*<svg[\s\S]*<image [^>]*href="data:image\/png;base64,/);
    expect(svg.body.toString()).not.toMatch(/<script/i);
  });

  it('adds a revision when the same design is published again, keeping the history', async () => {
    const { entryId, designId } = await publishedBar(author, 'Sine 24');
    await editDesign(database, designId, (d) => {
      d.rosette.layers[0].lobes = 36;
      d.cutter.diameter = 6;
    });
    const again = await author.client.post(`/api/designs/${designId}/publish`, { title: 'Sine 36', tags: ['plain'] });
    expect(again.body).toEqual({ entryId, revision: 2, created: false });
    const entry = (await other.client.get(`/api/entries/${entryId}`)).body;
    expect(entry).toMatchObject({ title: 'Sine 36', lobes: 36, cutterDiameterMm: 6, revisionCount: 2, latest: { number: 2 } });
    expect(entry.revisions.map((r: { number: number; title: string }) => [r.number, r.title])).toEqual([[2, 'Sine 36'], [1, 'Sine 24']]);
    const first = await other.client.get(`/api/entries/${entryId}/revisions/1`);
    expect(first.body).toMatchObject({ number: 1, lobes: 24, title: 'Sine 24', design: { cutter: { diameter: 4.7625 } } });
    expect((await other.client.get(`/api/entries/${entryId}/revisions/3`)).status).toBe(404);
    expect((await other.client.get(`/api/entries/${entryId}/revisions/x`)).status).toBe(404);
  });

  it('refuses viewers, outsiders, bad bodies and invalid designs', async () => {
    const design = (await author.client.post(`/api/boards/${author.boardId}/designs`, { title: 'Draft' })).body.id;
    expect((await other.client.post(`/api/designs/${design}/publish`, { title: 'Mine now' })).status).toBe(404);
    expect((await new Client(server.app).post(`/api/designs/${design}/publish`, { title: 'x' })).status).toBe(401);
    const bad = await author.client.post(`/api/designs/${design}/publish`, { title: '', tags: ['ok', 'not ok!'], extra: 1 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['extra', 'tags[1]', 'title']);
    await editDesign(database, design, (d) => {
      d.cutter.diameter = -1;
    });
    const invalid = await author.client.post(`/api/designs/${design}/publish`, { title: 'Broken' });
    expect(invalid.status).toBe(422);
    expect(invalid.body.error.fields['cutter.diameter']).toMatch(/between 0.1 mm and 50 mm/);
    expect((await author.client.get('/api/entries')).body.total).toBe(0);
  });

  it('exports the published file in every format, for visitors too', async () => {
    const { entryId } = await publishedBar(author, 'Sine 24 keeper');
    const visitor = new Client(server.app);
    for (const format of EXPORT_FORMATS) {
      const res = await visitor.agent.get(`/api/entries/${entryId}/export?format=${format}`).buffer(true);
      expect(res.status, format).toBe(200);
      expect(res.headers['content-disposition']).toMatch(/sine-24-keeper[.-]/);
    }
    expect((await visitor.get(`/api/entries/${entryId}/export?format=stl`)).body.error.fields.format).toMatch(/svg/);
  });

  it('prints the entry\'s name on the PDF, and the opposite blank when asked; the design file reads back as the design', async () => {
    const { entryId } = await publishedBar(author, 'Sine 24 keeper');
    const visitor = new Client(server.app);
    const pdf = async (format: string) => {
      const res = await visitor.agent.get(`/api/entries/${entryId}/export?format=${format}`).buffer(true).parse(binary);
      const parser = new PDFParse({ data: new Uint8Array(res.body as Buffer) });
      try {
        return (await parser.getText()).text;
      } finally {
        await parser.destroy();
      }
    };
    const plain = await pdf('pdf');
    expect(plain).toMatch(/^Sine 24 keeper/);
    expect(plain).not.toContain('Opposite blank');
    expect(await pdf('pdf-pair')).toContain('Opposite blank, turned over');
    const file = await visitor.agent.get(`/api/entries/${entryId}/export?format=json`).buffer(true);
    expect(parseDesign(JSON.parse(file.text)).ok).toBe(true);
  });

  it('keeps hidden and deleted entries from others; visitors only read', async () => {
    const { entryId } = await publishedBar(author, 'Sine 24');
    const visitor = new Client(server.app);
    expect((await visitor.post(`/api/entries/${entryId}/comments`, { body: 'hi' })).status).toBe(401);
    expect((await visitor.send('put', `/api/entries/${entryId}/rating`, { stars: 5 })).status).toBe(401);
    expect((await visitor.send('delete', `/api/entries/${entryId}`)).status).toBe(401);

    await database.db.update(entries).set({ hiddenAt: new Date(), hiddenReason: 'spam' }).where(eq(entries.id, entryId));
    expect((await visitor.get(`/api/entries/${entryId}`)).status).toBe(404);
    expect((await other.client.get(`/api/entries/${entryId}/thumbnail.svg`)).status).toBe(404);
    expect((await author.client.get(`/api/entries/${entryId}`)).body).toMatchObject({ hidden: true, hiddenReason: 'spam' });
    await makeUser(database, 'mod@example.test', 'moderator');
    const moderator = new Client(server.app);
    await moderator.signIn('mod@example.test');
    expect((await moderator.get(`/api/entries/${entryId}`)).status).toBe(200);
    expect((await visitor.get('/api/entries')).body.total).toBe(0);

    await database.db.update(entries).set({ hiddenAt: null }).where(eq(entries.id, entryId));
    expect((await other.client.send('delete', `/api/entries/${entryId}`)).status).toBe(403);
    expect((await author.client.send('delete', `/api/entries/${entryId}`)).status).toBe(204);
    for (const c of [visitor, other.client, author.client]) expect((await c.get(`/api/entries/${entryId}`)).status).toBe(404);
  });
});
