import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { VOTE_LIMITS } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { boardWithMembers, inAWeek } from './votes-testing';

const drivers = await availableDrivers();

/**
 * Design ids may arrive in either letter case (a uuid is case-insensitive): the same design written twice
 * is one design. And a board's day of vote openings is bounded, since each tells every member.
 */
describe.each(drivers)('vote limits on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let c: Record<string, Client>;
  let boardId: string;
  let designIds: string[];
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    ({ clients: c, boardId, designIds } = await boardWithMembers(database, server));
  });

  it('refuses a pair of one design written in two letter cases, naming b', async () => {
    const voteId = (await c.owner.post(`/api/boards/${boardId}/votes`, { question: 'Which?', designIds: designIds.slice(0, 3), closesAt: inAWeek() })).body.id;
    const res = await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0].toUpperCase(), b: designIds[0], pick: 'a' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('b');
  });

  it('refuses a vote that repeats a design in another letter case', async () => {
    const res = await c.owner.post(`/api/boards/${boardId}/votes`, { question: 'Which?', designIds: [designIds[0], designIds[0].toUpperCase(), designIds[1]], closesAt: inAWeek() });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('designIds');
  });

  it(`opens at most ${VOTE_LIMITS.openedPerBoardPerDay} votes a day on a board, then answers 429 and stores nothing more`, async () => {
    const open = () => c.owner.post(`/api/boards/${boardId}/votes`, { question: 'Which?', designIds: designIds.slice(0, 3), closesAt: inAWeek() });
    const answers = await Promise.all(Array.from({ length: VOTE_LIMITS.openedPerBoardPerDay + 3 }, open));
    expect(answers.filter((r) => r.status === 201)).toHaveLength(VOTE_LIMITS.openedPerBoardPerDay);
    expect(answers.filter((r) => r.status === 429)).toHaveLength(3);
    expect((await c.viewer.get(`/api/boards/${boardId}/votes`)).body).toHaveLength(VOTE_LIMITS.openedPerBoardPerDay);
  });
});
