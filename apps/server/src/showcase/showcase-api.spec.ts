import { beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { CuratedItem, ShowcaseItem } from '@barwright/contracts';
import { entries } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, type Member } from '../community/community-testing';
import { person } from '../moderation/moderation-testing';

const drivers = await availableDrivers();

describe.each(drivers)('the showcase on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let tobias: Member;
  let bars: string[];
  const ctx = useTestServer(driver);
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await person(database, server, 'maren');
    tobias = await person(database, server, 'tobias', 'moderator');
    bars = [];
    for (const title of ['Sine 24', 'Basket weave 18', 'Scallop 48']) bars.push((await publishedBar(maren, title)).entryId);
  });

  const feature = (entryId: string, note: string) => tobias.client.post('/api/moderation/showcase', { entryId, note });
  const shown = async () => (await new Client(server.app).get('/api/showcase')).body as ShowcaseItem[];

  it('shows featured bars to everyone in the curators’ order, each with its note, time and curator', async () => {
    expect(await shown()).toEqual([]);
    const first = await feature(bars[0], 'The guild’s barleycorn, cut on the club lathe.');
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ entry: { id: bars[0], title: 'Sine 24', author: { id: maren.id } }, note: 'The guild’s barleycorn, cut on the club lathe.', featuredBy: { id: tobias.id, displayName: 'tobias' }, position: 0, hidden: false });
    await feature(bars[1], 'A clean weave.');
    await feature(bars[2], 'Deep scallops, keeper in A2.');
    const list = await shown();
    expect(list.map((i) => [i.entry.id, i.position])).toEqual([[bars[0], 0], [bars[1], 1], [bars[2], 2]]);
    expect(Date.parse(list[0].featuredAt)).toBeGreaterThan(Date.now() - 60_000);
    expect(list[0].entry.thumbnailUrl).toBe(`/api/entries/${bars[0]}/thumbnail.svg`);

    const reordered = await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[2], bars[0], bars[1]] });
    expect((reordered.body as CuratedItem[]).map((i) => i.entry.id)).toEqual([bars[2], bars[0], bars[1]]);
    expect((await shown()).map((i) => i.entry.id)).toEqual([bars[2], bars[0], bars[1]]);
  });

  it('edits a note, takes a bar out, and refuses what does not fit', async () => {
    await feature(bars[0], 'First note');
    await feature(bars[1], 'Second');
    const edited = await tobias.client.patch(`/api/moderation/showcase/${bars[0]}`, { note: '  Better words  ' });
    expect(edited.body).toMatchObject({ note: 'Better words', position: 0 });
    expect((await tobias.client.send('delete', `/api/moderation/showcase/${bars[0]}`)).status).toBe(204);
    expect((await shown()).map((i) => [i.entry.id, i.position])).toEqual([[bars[1], 0]]);
    expect((await tobias.client.send('delete', `/api/moderation/showcase/${bars[0]}`)).status).toBe(404);
    expect((await tobias.client.patch(`/api/moderation/showcase/not-an-id`, { note: 'x' })).status).toBe(404);

    expect((await feature(bars[1], 'Again')).body.error.code).toBe('already_featured');
    expect((await feature(bars[2], '')).body.error.fields.note).toMatch(/required/);
    expect((await feature('00000000-0000-4000-8000-000000000000', 'Ghost')).status).toBe(404);
    await database.db.update(entries).set({ hiddenAt: new Date(), hiddenReason: 'spam' }).where(eq(entries.id, bars[2]));
    expect((await feature(bars[2], 'Hidden')).body.error.code).toBe('entry_hidden');
    const stale = await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[1], bars[0]] });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('showcase_changed');
    expect((await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[1], bars[1]] })).body.error.fields.entryIds).toMatch(/twice/);
  });

  it('leaves out hidden and deleted bars, keeping the others in order; a restored bar returns to its place', async () => {
    for (const [i, id] of bars.entries()) await feature(id, `Note ${i}`);
    await tobias.client.post(`/api/moderation/items/entry/${bars[1]}/hide`, { reason: 'Unsafe depth of cut.' });
    expect((await shown()).map((i) => [i.entry.id, i.position])).toEqual([[bars[0], 0], [bars[2], 1]]);
    const curated = (await tobias.client.get('/api/moderation/showcase')).body as CuratedItem[];
    expect(curated.map((i) => [i.entry.id, i.hidden, i.hiddenReason])).toEqual([[bars[0], false, null], [bars[1], true, 'Unsafe depth of cut.'], [bars[2], false, null]]);
    await tobias.client.post(`/api/moderation/items/entry/${bars[1]}/restore`, {});
    expect((await shown()).map((i) => i.entry.id)).toEqual(bars);
    await maren.client.send('delete', `/api/entries/${bars[0]}`);
    expect((await shown()).map((i) => i.entry.id)).toEqual([bars[1], bars[2]]);
    expect((await tobias.client.get('/api/moderation/showcase')).body).toHaveLength(2);
  });

  it('writes every curation to the audit log', async () => {
    await feature(bars[0], 'First note');
    await feature(bars[1], 'Second');
    await tobias.client.patch(`/api/moderation/showcase/${bars[0]}`, { note: 'Revised' });
    await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[1], bars[0]] });
    await tobias.client.send('delete', `/api/moderation/showcase/${bars[1]}`);
    const log = (await tobias.client.get('/api/moderation/audit')).body.items;
    expect(log.map((e: { action: string }) => e.action)).toEqual(['showcase.unfeature', 'showcase.reorder', 'showcase.note', 'showcase.feature', 'showcase.feature']);
    expect(log[2]).toMatchObject({ actor: { id: tobias.id }, target: { kind: 'entry', id: bars[0], label: 'Sine 24' }, reason: 'Revised', details: { before: 'First note' } });
    // A swap of two reads as one move, of the entry now first; its title and places are in the line.
    expect(log[1]).toMatchObject({ target: { kind: 'entry', id: bars[1], label: 'Basket weave 18' }, details: { moves: [{ entryId: bars[1], title: 'Basket weave 18', from: 2, to: 1 }], order: [bars[1], bars[0]] } });
  });

  it('says what moved when the order changes, and writes nothing when it does not', async () => {
    for (const [i, id] of bars.entries()) await feature(id, `Note ${i}`);
    await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[2], bars[0], bars[1]] });
    await tobias.client.send('put', '/api/moderation/showcase/order', { entryIds: [bars[2], bars[0], bars[1]] }); // the same order again
    const reorders = (await tobias.client.get('/api/moderation/audit?action=showcase.reorder')).body.items;
    expect(reorders).toHaveLength(1);
    expect(reorders[0]).toMatchObject({ target: { kind: 'entry', id: bars[2] }, details: { moves: [{ entryId: bars[2], from: 3, to: 1 }] } });
    // The moved entry's own history has the line.
    const ofItem = (await tobias.client.get(`/api/moderation/audit?item=${bars[2]}`)).body;
    expect(ofItem.items.map((e: { action: string }) => e.action)).toEqual(['showcase.reorder', 'showcase.feature']);
  });
});
