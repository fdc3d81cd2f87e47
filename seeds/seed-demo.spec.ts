import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { count } from 'drizzle-orm';
import { entries, users } from '../db/schema';
import { openTestDatabase, type TestDatabase } from '../apps/server/src/testing/test-database';
import { Client, startTestServer, type TestServer } from '../apps/server/src/testing/test-app';
import { seedDemoScenario } from './seed-demo';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-scenario';
import { computeProfile, planCut } from '@barwright/engine';
import { DEMO_BARS, DEMO_REMIX, DEMO_SHOWCASE } from './demo-bars';

describe('the demo scenario', () => {
  let database: TestDatabase;
  let server: TestServer;
  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    server = await startTestServer(database);
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });

  it('seeds an empty database once: accounts, published bars with a remix, ratings and comments', async () => {
    expect(await seedDemoScenario(database.db)).toBe(true);
    expect(await seedDemoScenario(database.db)).toBe(false);
    expect((await database.db.select({ n: count() }).from(users))[0].n).toBe(DEMO_ACCOUNTS.length);
    expect((await database.db.select({ n: count() }).from(entries))[0].n).toBe(DEMO_BARS.length + 1);
    const explore = await request(server.app).get('/api/entries?sort=top');
    expect(explore.body.items[0].title).toBe('Twenty-four sine, barleycorn');
    expect(explore.body.items[0].remixCount).toBe(1);
    const showcase = await request(server.app).get('/api/showcase');
    expect(showcase.body.map((s: { entry: { title: string } }) => s.entry.title)).toEqual(DEMO_SHOWCASE.map((s) => s.title));
  });

  it('uses only invented people at the reserved example.test domain, and every demo account signs in', async () => {
    for (const a of DEMO_ACCOUNTS) {
      expect(a.email).toMatch(/@example\.test$/);
      await new Client(server.app).signIn(a.email, DEMO_PASSWORD);
    }
  });

  it('cuts clean demo bars, all but the scalloped one, which shows its warning on purpose', () => {
    const reference = DEMO_BARS.find((b) => b.title === DEMO_REMIX.of)!.design;
    const bars = [...DEMO_BARS.map((b) => ({ title: b.title, design: b.design })), { title: DEMO_REMIX.title, design: DEMO_REMIX.change(reference) }];
    const warned = bars
      .map(({ title, design }) => ({ title, codes: [...computeProfile(design).warnings, ...planCut(design).warnings].map((w) => w.code) }))
      .filter((b) => b.codes.length > 0);
    expect(warned).toEqual([{ title: 'Scalloped forty-eight', codes: ['valley-bridged'] }]);
  });
});
