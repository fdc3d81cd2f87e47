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
  const warned: string[] = [];
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
    app.use(errorMiddleware((error) => logged.push(error), (message) => warned.push(message)));
    return request(app).post('/write');
  }

  it('answers 409 when what it refers to was removed (foreign key)', async () => {
    const ownerId = randomUUID();
    const loggedBefore = logged.length;
    const res = await answer(() => database.db.insert(boards).values({ name: 'Orphan', ownerId }));
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({ code: 'conflict', message: expect.stringMatching(/removed meanwhile.*try again/) });
    // Noted for the server's keeper by SQLSTATE, constraint and table, without the values written.
    expect(warned.at(-1)).toMatch(/^23503 \S+ on boards$/);
    expect(warned.at(-1)).not.toContain(ownerId);
    expect(logged).toHaveLength(loggedBefore); // a warning, not an error
  });

  it('answers 409 when the same unique value was saved meanwhile', async () => {
    const email = `twice-${randomUUID()}@example.test`;
    const user = { email, displayName: 'Twice', passwordHash: 'x' };
    await database.db.insert(users).values(user);
    const res = await answer(() => database.db.insert(users).values(user));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(warned.at(-1)).toMatch(/^23505 \S+ on users$/);
    expect(warned.at(-1)).not.toContain(email);
  });

  it('still answers 500, logged and not as a conflict, for a database error that is the server’s own', async () => {
    const [loggedBefore, warnedBefore] = [logged.length, warned.length];
    const res = await answer(() => database.db.execute('select * from no_such_table'));
    expect(res.status).toBe(500);
    expect(logged).toHaveLength(loggedBefore + 1);
    expect(warned).toHaveLength(warnedBefore);
  });
});

describe('an error object that cannot be read, or a warning that fails', () => {
  function appThrowing(error: () => unknown, warn: (message: string) => void = () => {}) {
    const logged: unknown[] = [];
    const app = express();
    app.post('/write', () => {
      throw error();
    });
    app.use(errorMiddleware((e) => logged.push(e), warn));
    return { app, logged };
  }
  const throwing = (key: string) => Object.create(null, { [key]: { get() { throw new Error('no reading me'); } } });

  it.each(['code', 'cause', 'status', 'statusCode', 'type'])('answers 500 and logs it when reading %s throws', async (key) => {
    const { app, logged } = appThrowing(() => throwing(key));
    const res = await request(app).post('/write');
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    expect(logged).toHaveLength(1);
  });

  it('answers 500 when the error is a Proxy that throws on every read', async () => {
    const { app } = appThrowing(() => new Proxy({}, { get() { throw new Error('no'); }, getPrototypeOf() { throw new Error('no'); } }));
    expect((await request(app).post('/write')).status).toBe(500);
  });

  it('still answers 409 when noting the conflict fails', async () => {
    const { app } = appThrowing(() => Object.assign(new Error('x'), { code: '23505' }), () => { throw new Error('log sink down'); });
    const res = await request(app).post('/write');
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });
});
