import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, RACK_FORMAT } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { RACK_ROUTES } from '../openapi/rack-routes';
import { boardWithMembers, inAWeek } from '../votes/votes-testing';

const drivers = await availableDrivers();
type Who = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner';
/** From least to most entitled: a route's successes come last, so one that removes its target does so once. */
const WHO: Who[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner'];
const all = (status: number): Record<Who, number> => ({ anonymous: 401, outsider: status, viewer: status, editor: status, owner: status });
/** The rack and saved sweeps are the owner's own: everyone else is told they do not exist. */
const ownersOnly = (status: number): Record<Who, number> => ({ anonymous: 401, outsider: 404, viewer: 404, editor: 404, owner: status });
const members = (status: number): Record<Who, number> => ({ anonymous: 401, outsider: 404, viewer: status, editor: status, owner: status });
const editors = (status: number): Record<Who, number> => ({ ...members(status), viewer: 403 });

const choices = {
  units: 'mm',
  rosettes: { by: 'all' },
  rubbers: [{ shape: 'round', radius: 1 }],
  travels: [{ travelPerRev: 100, leverRatio: 1 }],
  cutters: [{ diameter: 4.7625, flutes: 2 }],
  follower: { radius: 2.38125 },
  barLength: 150,
  study: { lineSpacing: 0.45, lines: 40, schedules: [{ kind: 'alternate' }], vAngle: 120, depth: 0.1 },
};

describe.each(drivers)('rack and votes role × route matrix on %s', (driver) => {
  const ctx = useTestServer(driver, { rateLimits: { signInPerAddress: 100_000 } });
  let database: TestDatabase;
  let server: TestServer;
  let c: Record<string, Client>;
  let f: { boardId: string; designIds: string[]; rosetteId: string; sweepId: string; voteId: string };
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    const board = await boardWithMembers(database, server);
    c = { ...board.clients, anonymous: new Client(server.app) };
    const rosetteId = (await c.owner.post('/api/rack/rosettes', { name: 'Sine 24', rosette: EXAMPLE_DESIGN.rosette })).body.id;
    const sweepId = (await c.owner.post('/api/rack/sweeps', { name: 'All', choices })).body.id;
    const voteId = (await c.owner.post(`/api/boards/${board.boardId}/votes`, { question: 'Which?', designIds: board.designIds, closesAt: inAWeek() })).body.id;
    f = { boardId: board.boardId, designIds: board.designIds, rosetteId, sweepId, voteId };
  });

  const routes: { name: string; call: (c: Client) => Promise<{ status: number; body: any }>; expected: Record<Who, number> }[] = [
    { name: 'get /api/rack', call: (c) => c.get('/api/rack'), expected: all(200) },
    { name: 'post /api/rack/rosettes', call: (c) => c.post('/api/rack/rosettes', { name: 'Mine', rosette: EXAMPLE_DESIGN.rosette }), expected: all(201) },
    { name: 'patch /api/rack/rosettes/{id}', call: (c) => c.patch(`/api/rack/rosettes/${f.rosetteId}`, { name: 'Renamed' }), expected: ownersOnly(200) },
    { name: 'delete /api/rack/rosettes/{id}', call: (c) => c.send('delete', `/api/rack/rosettes/${f.rosetteId}`), expected: ownersOnly(204) },
    { name: 'put /api/rack/shop', call: (c) => c.send('put', '/api/rack/shop', { rubbers: [], travels: [], cutters: [], followers: [], vCutters: [] }), expected: all(200) },
    { name: 'get /api/rack/export', call: (c) => c.get('/api/rack/export'), expected: all(200) },
    { name: 'post /api/rack/import', call: (c) => c.post('/api/rack/import?mode=add', { format: RACK_FORMAT, rosettes: [], shop: { units: 'mm', rubbers: [], travels: [], cutters: [], followers: [], vCutters: [] } }), expected: all(200) },
    { name: 'get /api/rack/sweeps', call: (c) => c.get('/api/rack/sweeps'), expected: all(200) },
    { name: 'post /api/rack/sweeps', call: (c) => c.post('/api/rack/sweeps', { name: 'Mine', choices }), expected: all(201) },
    { name: 'get /api/rack/sweeps/{id}', call: (c) => c.get(`/api/rack/sweeps/${f.sweepId}`), expected: ownersOnly(200) },
    { name: 'put /api/rack/sweeps/{id}', call: (c) => c.send('put', `/api/rack/sweeps/${f.sweepId}`, { name: 'Changed', choices }), expected: ownersOnly(200) },
    { name: 'delete /api/rack/sweeps/{id}', call: (c) => c.send('delete', `/api/rack/sweeps/${f.sweepId}`), expected: ownersOnly(204) },
    {
      name: 'post /api/boards/{id}/designs/batch',
      call: (c) => c.post(`/api/boards/${f.boardId}/designs/batch`, { designs: [{ title: 'From the sweep', file: EXAMPLE_DESIGN }] }),
      expected: editors(201),
    },
    { name: 'post /api/boards/{id}/votes', call: (c) => c.post(`/api/boards/${f.boardId}/votes`, { question: 'Which?', designIds: f.designIds, closesAt: inAWeek() }), expected: editors(201) },
    { name: 'get /api/boards/{id}/votes', call: (c) => c.get(`/api/boards/${f.boardId}/votes`), expected: members(200) },
    { name: 'get /api/votes/{id}', call: (c) => c.get(`/api/votes/${f.voteId}`), expected: members(200) },
    { name: 'get /api/votes/{id}/next-pair', call: (c) => c.get(`/api/votes/${f.voteId}/next-pair`), expected: members(200) },
    { name: 'put /api/votes/{id}/answers', call: (c) => c.send('put', `/api/votes/${f.voteId}/answers`, { a: f.designIds[0], b: f.designIds[1], pick: 'a' }), expected: members(200) },
    { name: 'post /api/votes/{id}/close', call: (c) => c.post(`/api/votes/${f.voteId}/close`), expected: editors(200) },
  ];

  it('covers every rack, sweep, shortlist and vote route', () => {
    expect(routes.map((r) => r.name).sort()).toEqual(RACK_ROUTES.map((r) => `${r.method} ${r.path}`).sort());
  });

  it.each(routes)('$name answers each role as it allows', async (route) => {
    for (const who of WHO) {
      const res = await route.call(c[who]);
      expect(res.status, `${who}: ${JSON.stringify(res.body)}`).toBe(route.expected[who]);
      if (res.status === 401) expect(res.body.error.code).toBe('unauthenticated');
      if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
    }
  });
});
