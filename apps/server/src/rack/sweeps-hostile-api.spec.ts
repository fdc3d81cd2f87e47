import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import type { TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';

const sine24 = EXAMPLE_DESIGN.rosette;
const choices = {
  units: 'mm',
  rosettes: { by: 'tags', tags: ['even'] },
  rubbers: [{ shape: 'round', radius: 1 }],
  travels: [{ travelPerRev: 100, leverRatio: 1 }],
  cutters: [{ diameter: 4.7625, flutes: 2 }],
  follower: { radius: 2.38125 },
  barLength: 150,
  study: { lineSpacing: 0.45, lines: 40, schedules: [{ kind: 'none' }], vAngle: 120, depth: 0.1 },
};

// Saved sweeps and the shortlist batch against hostile input (PGlite: the server's own work is measured).
describe('sweeps and the shortlist batch against hostile input', () => {
  const ctx = useTestServer('pglite');
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

  it('refuses a shortlist key naming a rosette the sweep does not take (another member’s, or one outside the tags)', async () => {
    const even = (await maren.post('/api/rack/rosettes', { name: 'A', rosette: sine24, tags: ['even'] })).body.id;
    const odd = (await maren.post('/api/rack/rosettes', { name: 'C', rosette: sine24, tags: ['odd'] })).body.id;
    const hers = (await ilse.post('/api/rack/rosettes', { name: 'Hers', rosette: sine24, tags: ['even'] })).body.id;
    const key = (rosetteId: string) => ({ rosetteId, rubber: 0, travel: 0, cutter: 0 });
    const foreign = await maren.post('/api/rack/sweeps', { name: 'S', choices, shortlist: [key(even), key(hers)] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields['shortlist[1].rosetteId']).toMatch(/not a rosette this sweep takes/);
    const outside = await maren.post('/api/rack/sweeps', { name: 'S', choices, shortlist: [key(odd)] });
    expect(outside.body.error.fields['shortlist[0].rosetteId']).toMatch(/not a rosette this sweep takes/);
    const upper = await maren.post('/api/rack/sweeps', { name: 'S', choices, shortlist: [key(even.toUpperCase())] });
    expect(upper.status).toBe(201);
    const picked = await maren.send('put', `/api/rack/sweeps/${upper.body.id}`, { name: 'S', choices: { ...choices, rosettes: { by: 'picked', ids: [odd] } }, shortlist: [key(even)] });
    expect(picked.body.error.fields['shortlist[0].rosetteId']).toMatch(/not a rosette this sweep takes/);
    expect((await maren.get('/api/rack/sweeps')).body).toMatchObject([{ shortlisted: 1 }]);
  });

  it('makes 100 designs in one batch, logging how long the event loop was held', async () => {
    const rosetteId = (await maren.post('/api/rack/rosettes', { name: 'Sine 24', rosette: sine24 })).body.id;
    const boardId = (await maren.post('/api/boards', { name: 'Sweep picks' })).body.id;
    const body = { designs: Array.from({ length: 100 }, (_, i) => ({ title: `Pick ${i}`, file: EXAMPLE_DESIGN, rackRosetteId: rosetteId })) };
    const h = monitorEventLoopDelay({ resolution: 5 });
    h.enable();
    const made = await maren.post(`/api/boards/${boardId}/designs/batch`, body);
    h.disable();
    console.log(`100-design batch: ${JSON.stringify(body).length} bytes, ${made.status}, event loop held at most ${Math.round(h.max / 1e6)} ms`);
    expect(made.status).toBe(201);
    expect(made.body.ids).toHaveLength(100);
  }, 120_000);
});
