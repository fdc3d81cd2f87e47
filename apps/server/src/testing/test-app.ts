import request from 'supertest';
import type { Express } from 'express';
import { createApp, type AppDeps } from '../app';
import { ComputePool } from '../compute/compute-pool';
import { startLocalSmtp, type LocalSmtp } from '../mail/local-smtp';
import { createMailer } from '../mail/mailer';
import { insertUser } from '../auth/users';
import { afterAll, beforeAll, beforeEach } from 'vitest';
import { openTestDatabase, type Driver, type TestDatabase } from './test-database';

/** The Set-Cookie lines of a response, always as a list. */
export const cookiesOf = (res: request.Response): string[] => ([] as string[]).concat(res.headers['set-cookie'] ?? []);
/** `barwright.sid=…` as a Cookie header value, or undefined when the response set none. */
export const sidOf = (res: request.Response) => cookiesOf(res).find((c) => c.startsWith('barwright.sid='))?.split(';')[0];

export const TEST_PASSWORD = 'quiet-walnut-crosscut-49';

export interface TestServer {
  app: Express;
  smtp: LocalSmtp;
  /** The engine's worker pool (overrides.compute, else one with the default budget). */
  compute: ComputePool;
  close(): Promise<void>;
}

export async function startTestServer(database: TestDatabase, overrides: Partial<AppDeps> = {}): Promise<TestServer> {
  const smtp = await startLocalSmtp();
  const mailer = createMailer({ localPort: smtp.port, from: 'Barwright <no-reply@barwright.example>' });
  const compute = overrides.compute ?? new ComputePool();
  const app = createApp({
    db: database.db,
    databaseKind: database.kind,
    mailer,
    localSmtp: smtp,
    sessionSecret: 'test-secret-test-secret-test-secret-0123',
    publicUrl: 'http://localhost:3000',
    log: () => {},
    ...overrides,
    compute,
  });
  return { app, smtp, compute, close: async () => { mailer.close(); await smtp.close(); await compute.close(); } };
}

/** A browser-like client: keeps cookies, and echoes the XSRF-TOKEN cookie in X-XSRF-TOKEN as Angular does. */
export class Client {
  readonly agent: ReturnType<typeof request.agent>;
  private xsrf = '';

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  private remember(res: request.Response) {
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    for (const c of cookies) {
      const m = c.match(/^XSRF-TOKEN=([^;]*)/);
      if (m) this.xsrf = decodeURIComponent(m[1]);
    }
    return res;
  }

  async get(path: string) {
    return this.remember(await this.agent.get(path));
  }

  async send(method: 'post' | 'patch' | 'put' | 'delete', path: string, body?: object, opts: { csrf?: boolean } = {}) {
    if (!this.xsrf) await this.get('/api/auth/me');
    let req = this.agent[method](path);
    if (opts.csrf !== false) req = req.set('X-XSRF-TOKEN', this.xsrf);
    return this.remember(await (body === undefined ? req : req.send(body)));
  }

  post = (path: string, body?: object, opts?: { csrf?: boolean }) => this.send('post', path, body, opts);
  patch = (path: string, body?: object, opts?: { csrf?: boolean }) => this.send('patch', path, body, opts);

  async signIn(email: string, password = TEST_PASSWORD) {
    const res = await this.post('/api/auth/sign-in', { email, password });
    if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
    return res;
  }
}

export async function makeUser(database: TestDatabase, email: string, role: 'member' | 'moderator' | 'admin' = 'member') {
  const user = await insertUser(database.db, { email, displayName: email.split('@')[0], password: TEST_PASSWORD, role, verified: true });
  return user!;
}

/**
 * Registers the usual hooks of an API suite: one database and app per file (opened once, since a
 * database costs seconds), emptied before each test. Read `ctx.database` / `ctx.server` inside tests.
 */
export function useTestServer(driver: Driver, overrides: Partial<AppDeps> = {}) {
  const ctx = {} as { database: TestDatabase; server: TestServer };
  beforeAll(async () => {
    ctx.database = await openTestDatabase(driver);
    ctx.server = await startTestServer(ctx.database, overrides);
  });
  afterAll(async () => {
    await ctx.server?.close();
    await ctx.database?.close();
  });
  beforeEach(() => ctx.database.reset());
  return ctx;
}
