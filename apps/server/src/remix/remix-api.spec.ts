import { beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { entries } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { editDesign, member, publishedBar, type Member } from '../community/community-testing';
import { refreshRemixCount } from '../publishing/entry-counts';

const drivers = await availableDrivers();
type Node = { id: string; available: boolean; children?: Node[] };

describe.each(drivers)('remix and lineage on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let tobias: Member;
  let ilse: Member;
  let original: string;

  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await member(database, server, 'maren');
    tobias = await member(database, server, 'tobias');
    ilse = await member(database, server, 'ilse');
    original = (await publishedBar(maren, 'Sine 24')).entryId;
  });

  /** Remixes an entry onto the member's board, changes it, publishes it; returns the new entry id. */
  async function remixAndPublish(m: Member, entryId: string, title: string, change: Parameters<typeof editDesign>[2]) {
    const remix = await m.client.post(`/api/entries/${entryId}/remix`, { boardId: m.boardId });
    expect(remix.status).toBe(201);
    await editDesign(database, remix.body.designId, change);
    const published = await m.client.post(`/api/designs/${remix.body.designId}/publish`, { title });
    expect(published.body.created).toBe(true);
    return { entryId: published.body.entryId as string, remix: remix.body };
  }

  it('copies the latest revision into a live design on the member’s board', async () => {
    const res = await tobias.client.post(`/api/entries/${original}/remix`, { boardId: tobias.boardId });
    expect(res.body).toMatchObject({ boardId: tobias.boardId, parentEntryId: original, parentRevision: 1 });
    const design = (await tobias.client.get(`/api/designs/${res.body.designId}`)).body;
    expect(design.rosette.layers[0].lobes).toBe(24);
    expect((await tobias.client.get(`/api/designs/${res.body.designId}/meta`)).body.title).toBe('Sine 24 (remix)');
    expect((await tobias.client.post(`/api/entries/${original}/remix`, { boardId: maren.boardId })).status).toBe(404);
    expect((await new Client(server.app).post(`/api/entries/${original}/remix`, { boardId: tobias.boardId })).status).toBe(401);
    expect((await tobias.client.post(`/api/entries/${original}/remix`, {})).body.error.fields.boardId).toBeTruthy();
  });

  it('records parent and root through a remix of a remix, and says what changed', async () => {
    const child = await remixAndPublish(tobias, original, 'Sine 36, 6 mm cutter', (d) => {
      d.rosette.layers[0].lobes = 36;
      d.cutter.diameter = 6;
    });
    const grandchild = await remixAndPublish(ilse, child.entryId, 'Sine 36 in brass', (d) => {
      d.bar.material = 'brass';
    });
    const sibling = await remixAndPublish(ilse, original, 'Sine 24 pointed', (d) => {
      d.rosette.layers[0].wave = { shape: 'pointed' };
    });
    const g = (await new Client(server.app).get(`/api/entries/${grandchild.entryId}`)).body;
    expect(g).toMatchObject({ rootEntryId: original, parent: { entryId: child.entryId, revision: 1, title: 'Sine 36, 6 mm cutter', available: true } });

    const changes = (await new Client(server.app).get(`/api/entries/${child.entryId}/changes`)).body;
    expect(changes.changes.map((c: { text: string }) => c.text)).toEqual(['Lobes: 24 → 36', 'Cutter diameter: 4.7625 mm → 6 mm']);
    expect((await new Client(server.app).get(`/api/entries/${grandchild.entryId}/changes`)).body.changes.map((c: { text: string }) => c.text)).toEqual(['Material: A2 tool steel → Brass']);
    expect((await new Client(server.app).get(`/api/entries/${original}/changes`)).body).toEqual({ parent: null, revision: 1, changes: [] });

    const lineage = (await new Client(server.app).get(`/api/entries/${child.entryId}/lineage`)).body;
    expect(lineage.rootEntryId).toBe(original);
    expect(lineage.ancestors.map((n: Node) => n.id)).toEqual([original]);
    expect(lineage.siblings.map((n: Node) => n.id)).toEqual([sibling.entryId]);
    expect(lineage.descendants).toMatchObject([{ id: grandchild.entryId, available: true, children: [] }]);
    expect(lineage.entry).toMatchObject({ id: child.entryId, title: 'Sine 36, 6 mm cutter', thumbnailUrl: `/api/entries/${child.entryId}/thumbnail.svg` });
    const fromRoot = (await new Client(server.app).get(`/api/entries/${original}/lineage`)).body;
    expect(fromRoot.descendants.map((n: Node) => [n.id, n.children!.map((c) => c.id)])).toEqual([
      [child.entryId, [grandchild.entryId]],
      [sibling.entryId, []],
    ]);
    const remixes = (await new Client(server.app).get(`/api/entries/${original}/remixes`)).body;
    expect(remixes.map((e: { id: string }) => e.id).sort()).toEqual([child.entryId, sibling.entryId].sort());
    expect((await new Client(server.app).get(`/api/entries/${original}`)).body.remixCount).toBe(2);
  });

  it('refuses to remix a hidden or deleted entry, and keeps the chain through them', async () => {
    const child = await remixAndPublish(tobias, original, 'Sine 36', (d) => {
      d.rosette.layers[0].lobes = 36;
    });
    const grandchild = await remixAndPublish(ilse, child.entryId, 'Sine 36 brass', (d) => {
      d.bar.material = 'brass';
    });
    await database.db.update(entries).set({ hiddenAt: new Date(), hiddenReason: 'unsafe set-up' }).where(eq(entries.id, child.entryId));
    expect((await ilse.client.post(`/api/entries/${child.entryId}/remix`, { boardId: ilse.boardId })).status).toBe(404);
    const own = await tobias.client.post(`/api/entries/${child.entryId}/remix`, { boardId: tobias.boardId });
    expect(own.status).toBe(409);
    expect(own.body.error.code).toBe('entry_hidden');
    const lineage = (await ilse.client.get(`/api/entries/${grandchild.entryId}/lineage`)).body;
    expect(lineage.ancestors).toEqual([expect.objectContaining({ id: original, available: true }), { id: child.entryId, available: false }]);
    const fromRoot = (await ilse.client.get(`/api/entries/${original}/lineage`)).body;
    expect(fromRoot.descendants).toMatchObject([{ id: child.entryId, available: false, children: [{ id: grandchild.entryId, available: true }] }]);
    expect((await ilse.client.get(`/api/entries/${grandchild.entryId}`)).body.parent).toEqual({ entryId: child.entryId, revision: 1, title: null, available: false });
    // Moderation hides through its own route; it must recount the parent, as here.
    await refreshRemixCount(database.db, original);
    expect((await ilse.client.get(`/api/entries/${original}`)).body.remixCount).toBe(0);
    await tobias.client.send('delete', `/api/entries/${child.entryId}`);
    expect((await tobias.client.post(`/api/entries/${child.entryId}/remix`, { boardId: tobias.boardId })).status).toBe(404);
  });
});
