import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { EXAMPLE_DESIGN, RACK_FORMAT, SWEEP_MAX_CANDIDATES } from '@barwright/contracts';
import { designRackOrigins, designs, rackRosettes } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';

const drivers = await availableDrivers();
const sine24 = EXAMPLE_DESIGN.rosette;
const measured = {
  baseRadius: 40,
  layers: [{ lobes: 1, amplitude: 0, phase: 0, wave: { shape: 'measured', scale: 'as-read', points: Array.from({ length: 12 }, (_, i) => [i * 30, 40 + 0.4 * Math.cos((i * Math.PI) / 3)]) } }],
};
const shop = {
  rubbers: [{ shape: 'round', radius: 1 }, { name: 'Flat 3', shape: 'flat', width: 3 }],
  travels: [{ travelPerRev: 100, leverRatio: 1 }],
  cutters: [{ diameter: 4.7625, flutes: 2 }],
  followers: [{ radius: 2.38125 }],
  vCutters: [{ vAngle: 120 }],
};

describe.each(drivers)('rack API on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let maren: Client;
  let ilse: Client;
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    await makeUser(database, 'maren@example.test');
    await makeUser(database, 'ilse@example.test');
    maren = new Client(server.app);
    ilse = new Client(server.app);
    await maren.signIn('maren@example.test');
    await ilse.signIn('ilse@example.test');
  });

  it('adds, reads, changes and deletes rosettes of the member’s rack, in the member’s units', async () => {
    const empty = await maren.get('/api/rack');
    expect(empty.body).toEqual({ units: 'mm', rosettes: [], shop: { units: 'mm', rubbers: [], travels: [], cutters: [], followers: [], vCutters: [] } });
    const made = await maren.post('/api/rack/rosettes', { name: 'Sine 24', rosette: sine24, tags: ['sine', 'fine'] });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ name: 'Sine 24', units: 'mm', rosette: sine24, tags: ['sine', 'fine'], notes: '' });
    const changed = await maren.patch(`/api/rack/rosettes/${made.body.id}`, { notes: 'Cut in brass, 2024', tags: ['sine'] });
    expect(changed.body).toMatchObject({ name: 'Sine 24', notes: 'Cut in brass, 2024', tags: ['sine'] });
    expect((await maren.get('/api/rack')).body.rosettes).toHaveLength(1);
    expect((await maren.send('delete', `/api/rack/rosettes/${made.body.id}`)).status).toBe(204);
    expect((await maren.get('/api/rack')).body.rosettes).toEqual([]);
    // The member's units by default; an inch rosette keeps its own.
    await maren.patch('/api/auth/me', { units: 'in' });
    const inch = await maren.post('/api/rack/rosettes', { name: 'Inch', rosette: { baseRadius: 2, layers: [{ lobes: 12, amplitude: 0.05, phase: 0, wave: { shape: 'sine' } }] } });
    expect(inch.body.units).toBe('in');
  });

  it('refuses bad rosettes with the field and the limit named, using the design file’s rosette rules', async () => {
    const tooSmall = await maren.post('/api/rack/rosettes', { name: 'Tiny', rosette: { ...sine24, baseRadius: 0.5 } });
    expect(tooSmall.status).toBe(400);
    expect(tooSmall.body.error.fields['rosette.baseRadius']).toMatch(/between 1 mm and 500 mm/);
    const inchLimit = await maren.post('/api/rack/rosettes', { name: 'Tiny', units: 'in', rosette: { ...sine24, baseRadius: 30 } });
    expect(inchLimit.body.error.fields['rosette.baseRadius']).toMatch(/in/);
    const badLayer = await maren.post('/api/rack/rosettes', { name: 'Odd', rosette: { baseRadius: 50, layers: [{ lobes: 0, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] } });
    expect(badLayer.body.error.fields['rosette.layers[0].lobes']).toMatch(/at least 1/);
    const strange = await maren.post('/api/rack/rosettes', { name: 'Odd', rosette: { ...sine24, colour: 'red' } });
    expect(strange.body.error.fields['rosette.colour']).toBe('is not a known field');
    const noRosette = await maren.post('/api/rack/rosettes', { name: 'None' });
    expect(noRosette.body.error.fields.rosette).toMatch(/required/);
    const longName = await maren.post('/api/rack/rosettes', { name: 'x'.repeat(81), rosette: sine24 });
    expect(longName.body.error.fields.name).toMatch(/at most 80/);
    const tags = await maren.post('/api/rack/rosettes', { name: 'Tags', rosette: sine24, tags: Array.from({ length: 13 }, (_, i) => `t${i}`) });
    expect(tags.body.error.fields.tags).toMatch(/at most 12 tags/);
    const repeated = await maren.post('/api/rack/rosettes', { name: 'Tags', rosette: sine24, tags: ['a', 'A'] });
    expect(repeated.body.error.fields.tags).toMatch(/repeat/);
    expect((await maren.get('/api/rack')).body.rosettes).toEqual([]);
  });

  it('holds at most 200 rosettes: one more is refused naming the limit, an import that would pass it stores nothing', async () => {
    const me = (await maren.get('/api/auth/me')).body.id;
    await database.db.insert(rackRosettes).values(Array.from({ length: 199 }, (_, i) => ({ ownerId: me, name: `R${i}`, units: 'mm' as const, rosette: sine24 })));
    expect((await maren.post('/api/rack/rosettes', { name: 'The last', rosette: sine24 })).status).toBe(201);
    const full = await maren.post('/api/rack/rosettes', { name: 'One too many', rosette: sine24 });
    expect(full.status).toBe(400);
    expect(full.body.error.fields.rosettes).toBe('a rack holds at most 200 rosettes');
    const file = { format: RACK_FORMAT, rosettes: [{ name: 'More', units: 'mm', rosette: sine24 }], shop: { units: 'mm', ...shop } };
    expect((await maren.post('/api/rack/import?mode=add', file)).body.error.fields.rosettes).toMatch(/at most 200 rosettes \(1 more asked for\)/);
    expect((await maren.get('/api/rack')).body.rosettes).toHaveLength(200);
  });

  it('keeps the shop with its units, checking lengths after conversion', async () => {
    const saved = await maren.send('put', '/api/rack/shop', shop);
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ units: 'mm', ...shop });
    const bad = await maren.send('put', '/api/rack/shop', { ...shop, units: 'in', cutters: [{ diameter: 3, flutes: 2 }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['cutters[0].diameter']).toBe('must be between 0.0039 in and 1.9685 in');
    const many = await maren.send('put', '/api/rack/shop', { ...shop, vCutters: Array.from({ length: 25 }, () => ({ vAngle: 90 })) });
    expect(many.body.error.fields.vCutters).toMatch(/at most 24/);
    expect((await maren.get('/api/rack')).body.shop).toMatchObject(shop);
  });

  it('nobody reads or changes another member’s rack', async () => {
    const mine = (await maren.post('/api/rack/rosettes', { name: 'Sine 24', rosette: sine24 })).body.id;
    expect((await ilse.get('/api/rack')).body.rosettes).toEqual([]);
    expect((await ilse.patch(`/api/rack/rosettes/${mine}`, { name: 'Taken' })).status).toBe(404);
    expect((await ilse.send('delete', `/api/rack/rosettes/${mine}`)).status).toBe(404);
    expect((await ilse.get('/api/rack/export')).body.rosettes).toEqual([]);
    expect((await maren.get('/api/rack')).body.rosettes[0].name).toBe('Sine 24');
    expect((await new Client(server.app).get('/api/rack')).status).toBe(401);
  });

  it('exports the whole rack as one versioned file and imports it all or nothing, naming the fields', async () => {
    await maren.post('/api/rack/rosettes', { name: 'Sine 24', rosette: sine24, tags: ['sine'] });
    await maren.post('/api/rack/rosettes', { name: 'Dial readings', rosette: measured, tags: ['measured'], notes: 'Read with a 0.01 mm indicator' });
    await maren.send('put', '/api/rack/shop', shop);
    const file = (await maren.get('/api/rack/export')).body;
    expect(file.format).toBe(RACK_FORMAT);
    expect(file.rosettes.map((r: { name: string }) => r.name)).toEqual(['Sine 24', 'Dial readings']);

    await ilse.post('/api/rack/rosettes', { name: 'Her own', rosette: sine24 });
    const broken = { ...file, rosettes: [...file.rosettes, { ...file.rosettes[0], rosette: { ...sine24, baseRadius: -1 } }], shop: { ...file.shop, cutters: [{ diameter: 99, flutes: 2 }] } };
    const refused = await ilse.post('/api/rack/import', broken);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields['rosettes[2].rosette.baseRadius']).toMatch(/greater than 0/);
    expect(refused.body.error.fields['shop.cutters[0].diameter']).toMatch(/between 0.1 mm and 50 mm/);
    expect((await ilse.post('/api/rack/import', { ...file, format: 'barwright.rack/9' })).body.error.fields.format).toMatch(/barwright.rack\/1/);
    expect((await ilse.get('/api/rack')).body.rosettes.map((r: { name: string }) => r.name)).toEqual(['Her own']);

    const added = await ilse.post('/api/rack/import?mode=add', file);
    expect(added.body.rosettes.map((r: { name: string }) => r.name)).toEqual(['Her own', 'Sine 24', 'Dial readings']);
    const replaced = await ilse.post('/api/rack/import', file);
    expect(replaced.status).toBe(200);
    expect(replaced.body.rosettes.map((r: { name: string; notes: string }) => [r.name, r.notes])).toEqual([['Sine 24', ''], ['Dial readings', 'Read with a 0.01 mm indicator']]);
    expect(replaced.body.shop).toMatchObject(shop);
    expect((await ilse.post('/api/rack/import?mode=merge', file)).body.error.fields.mode).toMatch(/replace/);
  });

  it('takes back its own export of a rack full of measured readings (past the API’s usual body limit), and bounds the readings', async () => {
    // 3 600 readings a rosette (a reading every 0.1°), 5 rosettes: 18 000 readings, about 0.5 MB of JSON.
    const dense = (i: number) => ({
      baseRadius: 40,
      layers: [{ lobes: 1, amplitude: 0, phase: 0, wave: { shape: 'measured', scale: 'as-read', points: Array.from({ length: 3600 }, (_, k) => [k / 10, 40 + 0.4 * Math.cos((k * Math.PI) / 1800) + i / 1000]) } }],
    });
    const me = (await maren.get('/api/auth/me')).body.id;
    await database.db.insert(rackRosettes).values(Array.from({ length: 5 }, (_, i) => ({ ownerId: me, name: `Dial ${i}`, units: 'mm' as const, rosette: dense(i) as never })));
    const file = (await maren.get('/api/rack/export')).body;
    expect(JSON.stringify(file).length).toBeGreaterThan(400 * 1024);
    const back = await ilse.post('/api/rack/import', file);
    expect(back.status).toBe(200);
    expect(back.body.rosettes).toHaveLength(5);

    // 18 000 held: one more dense rosette would make 21 600, past the rack's 20 000.
    const over = await ilse.post('/api/rack/rosettes', { name: 'One more dial', rosette: dense(99) });
    expect(over.status).toBe(400);
    expect(over.body.error.fields.rosette).toMatch(/at most 20 000 measured readings .*21 600/);
    const overFile = await ilse.post('/api/rack/import?mode=add', { ...file, rosettes: file.rosettes.slice(0, 1) });
    expect(overFile.body.error.fields.rosettes).toMatch(/at most 20 000 measured readings/);
    expect((await ilse.get('/api/rack')).body.rosettes).toHaveLength(5);
    const tooBig = await ilse.post('/api/rack/import', { ...file, rosettes: [...file.rosettes, ...file.rosettes.slice(0, 1)] });
    expect(tooBig.status).toBe(400);
    expect(tooBig.body.error.fields.rosettes).toMatch(/this would make 21 600/);
    // Swapping a rosette's readings for as many is no growth.
    const first = (await ilse.get('/api/rack')).body.rosettes[0];
    expect((await ilse.patch(`/api/rack/rosettes/${first.id}`, { rosette: dense(5) })).status).toBe(200);
  });

  it('reads no large rack file from a visitor, and only the import route takes more than the usual limit', async () => {
    const big = { format: RACK_FORMAT, rosettes: [], shop: { units: 'mm', ...shop }, padding: 'x'.repeat(600 * 1024) };
    const visitor = await new Client(server.app).post('/api/rack/import', big);
    expect([401, 403]).toContain(visitor.status);
    expect((await maren.post('/api/rack/rosettes', { name: 'x'.repeat(600 * 1024), rosette: sine24 })).status).toBe(413);
    const refused = await maren.post('/api/rack/import', big);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.padding).toBeDefined();
  });

  it('saves sweeps (choices and shortlist) and refuses more than the bar limit, saying how to narrow it', async () => {
    const ids: string[] = [];
    for (const name of ['A', 'B', 'C']) ids.push((await maren.post('/api/rack/rosettes', { name, rosette: sine24, tags: [name === 'C' ? 'odd' : 'even'] })).body.id);
    const choices = {
      units: 'mm',
      rosettes: { by: 'tags', tags: ['even'] },
      rubbers: shop.rubbers,
      travels: shop.travels,
      cutters: shop.cutters,
      follower: { radius: 2.38125 },
      barLength: 150,
      study: { lineSpacing: 0.45, lines: 40, schedules: [{ kind: 'alternate' }, { kind: 'none' }], vAngle: 120, depth: 0.1 },
    };
    const made = await maren.post('/api/rack/sweeps', { name: 'Even ones', choices, shortlist: [{ rosetteId: ids[0], rubber: 1, travel: 0, cutter: 0 }] });
    expect(made.status).toBe(201);
    expect((await maren.get('/api/rack/sweeps')).body).toMatchObject([{ id: made.body.id, name: 'Even ones', candidates: 4, shortlisted: 1 }]);
    expect((await maren.get(`/api/rack/sweeps/${made.body.id}`)).body.choices).toEqual(choices);
    expect((await ilse.get(`/api/rack/sweeps/${made.body.id}`)).status).toBe(404);
    const outOfRange = await maren.send('put', `/api/rack/sweeps/${made.body.id}`, { name: 'x', choices, shortlist: [{ rosetteId: ids[0], rubber: 2, travel: 0, cutter: 0 }] });
    expect(outOfRange.body.error.fields['shortlist[0].rubber']).toMatch(/below 2/);
    const notMine = await ilse.post('/api/rack/sweeps', { name: 'Hers', choices: { ...choices, rosettes: { by: 'picked', ids: [ids[0]] } } });
    expect(notMine.body.error.fields['choices.rosettes.ids[0]']).toMatch(/not a rosette of your rack/);
    const lots = Array.from({ length: 24 }, (_, i) => ({ travelPerRev: 50 + i, leverRatio: 1 }));
    const huge = await maren.post('/api/rack/sweeps', { name: 'Everything', choices: { ...choices, rosettes: { by: 'all' }, travels: lots, cutters: Array.from({ length: 24 }, () => shop.cutters[0]), rubbers: [...shop.rubbers, ...shop.rubbers] } });
    expect(huge.status).toBe(400);
    expect(huge.body.error.fields.choices).toBe(`3 rosettes × 4 rubbers × 24 travels × 24 cutters = 6912 bars: a sweep takes at most 5 000; narrow it by choosing rosettes by tag or by hand, or fewer rubbers, travel settings or cutters`);
    expect(SWEEP_MAX_CANDIDATES).toBe(5000);
    expect((await maren.send('delete', `/api/rack/sweeps/${made.body.id}`)).status).toBe(204);
  });

  it('creates a shortlist as designs on a board in one request, all or nothing, with the rack rosette as origin', async () => {
    const rosetteId = (await maren.post('/api/rack/rosettes', { name: 'Sine 24', rosette: sine24 })).body.id;
    const herRosette = (await ilse.post('/api/rack/rosettes', { name: 'Hers', rosette: sine24 })).body.id;
    const boardId = (await maren.post('/api/boards', { name: 'Sweep picks' })).body.id;
    const designsBody = [
      { title: 'Sine 24 · round 1 mm · 100 mm/rev', file: EXAMPLE_DESIGN, rackRosetteId: rosetteId },
      { title: 'Sine 24 · Flat 3 · 100 mm/rev', file: { ...EXAMPLE_DESIGN, rubber: { shape: 'flat', width: 3 } }, rackRosetteId: rosetteId },
    ];
    const bad = await maren.post(`/api/boards/${boardId}/designs/batch`, { designs: [...designsBody, { title: 'Broken', file: { ...EXAMPLE_DESIGN, cutter: { diameter: -1, flutes: 2 } } }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['designs[2].file.cutter.diameter']).toMatch(/greater than 0/);
    const foreign = await maren.post(`/api/boards/${boardId}/designs/batch`, { designs: [{ ...designsBody[0], rackRosetteId: herRosette }] });
    expect(foreign.body.error.fields['designs[0].rackRosetteId']).toMatch(/not a rosette of your rack/);
    expect(await database.db.select().from(designs).where(eq(designs.boardId, boardId))).toEqual([]);

    const made = await maren.post(`/api/boards/${boardId}/designs/batch`, { designs: designsBody });
    expect(made.status).toBe(201);
    expect(made.body.ids).toHaveLength(2);
    expect((await maren.get(`/api/designs/${made.body.ids[1]}`)).body.rubber).toEqual({ shape: 'flat', width: 3 });
    expect((await maren.get(`/api/designs/${made.body.ids[0]}/meta`)).body.title).toBe('Sine 24 · round 1 mm · 100 mm/rev');
    const origins = await database.db.select().from(designRackOrigins);
    expect(origins.map((o) => [o.rackRosetteId, o.rosetteName]).sort()).toEqual([[rosetteId, 'Sine 24'], [rosetteId, 'Sine 24']]);
    expect((await ilse.post(`/api/boards/${boardId}/designs/batch`, { designs: designsBody })).status).toBe(404);
    // Deleting the rack rosette keeps the designs and the name of their origin.
    await maren.send('delete', `/api/rack/rosettes/${rosetteId}`);
    expect((await database.db.select().from(designRackOrigins)).map((o) => [o.rackRosetteId, o.rosetteName])).toEqual([[null, 'Sine 24'], [null, 'Sine 24']]);
    expect(await database.db.select().from(rackRosettes).where(eq(rackRosettes.id, rosetteId))).toEqual([]);
  });
});
