import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, startTestServer, type TestServer } from '../testing/test-app';
import { editDesign, member, publishedBar, type Member } from '../community/community-testing';

const drivers = await availableDrivers();

describe.each(drivers)('Explore on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let tobias: Member;
  const ids: Record<string, string> = {};
  const titles = async (query: string) => (await new Client(server.app).get(`/api/entries?${query}`)).body.items.map((e: { title: string }) => e.title);

  beforeAll(async () => {
    database = await openTestDatabase(driver);
    server = await startTestServer(database);
    await database.reset();
    maren = await member(database, server, 'maren');
    tobias = await member(database, server, 'tobias');
    ids.sine = (await publishedBar(maren, 'Plain sine 24', { tags: ['plain'], description: 'A quiet wave for cases.' })).entryId;
    ids.barley = (await publishedBar(maren, 'Barleycorn 30', { preset: 'barleycorn', tags: ['barleycorn', 'watch-dial'] })).entryId;
    const basket = await publishedBar(tobias, 'Basket weave 18', { preset: 'basket-weave', tags: ['basket-weave'], description: 'Ramped phase, six steps; lovely on brass.' });
    ids.basket = basket.entryId;
    await editDesign(database, basket.designId, (d) => {
      d.cutter.diameter = 0.25;
      d.units = 'in';
      d.bar = { length: 6, thickness: 0.3125, material: 'brass' };
      d.rosette.baseRadius = 2;
      d.rosette.layers[0].amplitude = 0.06;
      d.rubber = { shape: 'round', radius: 0.04 };
      d.motion.travelPerRev = 4;
      d.follower.radius = 0.125;
      d.study = { ...d.study, lineSpacing: 0.018, depth: 0.004 };
      d.plan = { stepOver: 0.003, cleanup: 0.01, travelSpeed: 4 };
    });
    const republished = await tobias.client.post(`/api/designs/${basket.designId}/publish`, { title: 'Basket weave 18', description: 'Ramped phase, six steps; lovely on brass.', tags: ['basket-weave'] });
    expect(republished.status).toBe(201);
  });
  afterAll(async () => {
    await server?.close();
    await database?.close();
  });

  it('lists newest first with a total, and pages without overlap', async () => {
    const page = (await new Client(server.app).get('/api/entries')).body;
    expect(page).toMatchObject({ total: 3, page: 1, pageSize: 24, sort: 'newest' });
    expect(page.items.map((e: { title: string }) => e.title)).toEqual(['Basket weave 18', 'Barleycorn 30', 'Plain sine 24']);
    expect(page.items[0]).toMatchObject({ author: { displayName: 'tobias' }, thumbnailUrl: `/api/entries/${ids.basket}/thumbnail.svg`, revisionCount: 2 });
    const pages = [await titles('pageSize=2&page=1'), await titles('pageSize=2&page=2')];
    expect(pages).toEqual([['Basket weave 18', 'Barleycorn 30'], ['Plain sine 24']]);
  });

  it('filters by lobes, wave, material, cutter range (mm, inch files converted), tags and author', async () => {
    expect(await titles('lobes=30')).toEqual(['Barleycorn 30']);
    expect(await titles('wave=pointed')).toEqual(['Barleycorn 30']);
    expect(await titles('material=brass')).toEqual(['Basket weave 18']);
    expect(await titles('cutterMin=6&cutterMax=6.35')).toEqual(['Basket weave 18']);
    expect(await titles('cutterMax=4.7625')).toEqual(['Barleycorn 30', 'Plain sine 24']);
    expect(await titles('tags=barleycorn,watch-dial')).toEqual(['Barleycorn 30']);
    expect(await titles('tags=barleycorn&tags=plain')).toEqual([]);
    expect(await titles(`author=${tobias.id}`)).toEqual(['Basket weave 18']);
    expect(await titles('material=a2&wave=sine')).toEqual(['Plain sine 24']);
  });

  it('filters and sorts by the latest revision\'s phase schedule, and names it on each card', async () => {
    expect(await titles('schedule=ramp')).toEqual(['Basket weave 18']);
    expect(await titles('schedule=alternate')).toEqual(['Barleycorn 30', 'Plain sine 24']);
    expect(await titles('schedule=sine')).toEqual([]);
    // Barleycorn (alternate half-period) comes before basket weave (ramp); newest first within one.
    expect(await titles('sort=schedule')).toEqual(['Barleycorn 30', 'Plain sine 24', 'Basket weave 18']);
    const page = (await new Client(server.app).get('/api/entries?sort=schedule')).body;
    expect(page.items.map((e: { schedule: string }) => e.schedule)).toEqual(['alternate', 'alternate', 'ramp']);
  });

  it('searches title, description and tags with stemming', async () => {
    expect(await titles('q=weaves')).toEqual(['Basket weave 18']);
    expect(await titles('q=brass')).toEqual(['Basket weave 18']);
    expect(await titles('q=watch')).toEqual(['Barleycorn 30']);
    expect(await titles('q=quiet%20cases')).toEqual(['Plain sine 24']);
    expect(await titles('q=%22six%20steps%22')).toEqual(['Basket weave 18']);
    expect(await titles('q=sine%20-plain')).toEqual([]);
    expect((await new Client(server.app).get('/api/entries?q=barleycorn')).body.sort).toBe('relevance');
  });

  it('sorts by most discussed and most remixed', async () => {
    await maren.client.post(`/api/entries/${ids.sine}/comments`, { body: 'one' });
    await tobias.client.post(`/api/entries/${ids.sine}/comments`, { body: 'two' });
    await maren.client.post(`/api/entries/${ids.basket}/comments`, { body: 'three' });
    expect(await titles('sort=discussed')).toEqual(['Plain sine 24', 'Basket weave 18', 'Barleycorn 30']);
    const remix = await tobias.client.post(`/api/entries/${ids.barley}/remix`, { boardId: tobias.boardId });
    await tobias.client.post(`/api/designs/${remix.body.designId}/publish`, { title: 'Barleycorn 30, finer' });
    expect((await titles('sort=remixed')).slice(0, 1)).toEqual(['Barleycorn 30']);
  });

  it('refuses bad parameters with the field named', async () => {
    const res = await new Client(server.app).get('/api/entries?pageSize=61&lobes=x&sort=best&wave=square&schedule=zigzag&cutterMin=5&cutterMax=2&colour=red');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['colour', 'lobes', 'pageSize', 'schedule', 'sort', 'wave']);
    expect((await new Client(server.app).get('/api/entries?cutterMin=5&cutterMax=2')).body.error.fields.cutterMax).toMatch(/cutterMin/);
    expect((await new Client(server.app).get('/api/entries?sort=relevance')).body.error.fields.sort).toMatch(/needs a search/);
  });
});
