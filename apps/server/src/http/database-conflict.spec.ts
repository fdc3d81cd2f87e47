import { randomUUID } from 'node:crypto';
import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { boards, users } from '../../../../db/schema';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { errorMiddleware } from './error-middleware';

/**
 * A write that loses a race with another request (the board or rack rosette it names removed between
 * the route's checks and its insert, the same e-mail saved twice at once) makes the database refuse it.
 * That refusal reaches the client as 409 "conflict" with what to do, never as a 500. The errors here are
 * the real ones Drizzle throws on each driver, for the same statements the race would run.
 */
const drivers = await availableDrivers();

describe.each(drivers)('a write refused by the database for a change made meanwhile, on %s', (driver) => {
  let database: TestDatabase;
  const logged: unknown[] = [];
  beforeAll(async () => {
    database = await openTestDatabase(driver);
  });
  afterAll(() => database.close());

  /** Runs `write` in a route and answers as the app does. */
  async function answer(write: () => Promise<unknown>) {
    const app = express();
    app.post('/write', async () => {
      await write();
    });
    app.use(errorMiddleware((error) => logged.push(error)));
    return request(app).post('/write');
  }

  it('answers 409 when what it refers to was removed (foreign key)', async () => {
    const res = await answer(() => database.db.insert(boards).values({ name: 'Orphan', ownerId: randomUUID() }));
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({ code: 'conflict', message: expect.stringMatching(/removed meanwhile.*try again/) });
  });

  it('answers 409 when the same unique value was saved meanwhile', async () => {
    const email = `twice-${randomUUID()}@example.test`;
    const user = { email, displayName: 'Twice', passwordHash: 'x' };
    await database.db.insert(users).values(user);
    const res = await answer(() => database.db.insert(users).values(user));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });

  it('does not log a conflict, and still answers 500, logged, for a database error that is the server’s own', async () => {
    expect(logged).toHaveLength(0);
    const res = await answer(() => database.db.execute('select * from no_such_table'));
    expect(res.status).toBe(500);
    expect(logged).toHaveLength(1);
  });
});
