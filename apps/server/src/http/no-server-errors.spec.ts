import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import fc from 'fast-check';
import type request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { openApiDocument } from '../openapi/openapi-document';
import { Client, makeUser, useTestServer } from '../testing/test-app';
import { member, publishedBar, xsrfOf } from '../community/community-testing';
import { deeplyNested, fromSchema, hostileFromSchema, hostileValue } from '../testing/openapi-arbitraries';

/**
 * Fuzzes every route of the OpenAPI document, signed in (a member, an admin) and anonymously, with
 * bodies generated from the document's schemas and hostile variants (NUL, huge numbers, deep
 * nesting, wrong types, odd ids and query strings, broken encodings), and asserts that no answer is
 * a 5xx. Bounded: FUZZ_RUNS requests (2 000, about 10 s on two cores); FUZZ_SEED replays a run. PGlite
 * only: the 5xx it looks for come from PostgreSQL's types, which PGlite shares.
 */
const SEED = Number(process.env.FUZZ_SEED ?? 8_2024);
const RUNS = Number(process.env.FUZZ_RUNS ?? 2000);

type Json = Record<string, any>;
const doc = openApiDocument() as Json;
const resolve = (ref: string) => ref.replace(/^#\//, '').split('/').reduce((o: Json, k) => o[k], doc);

interface Operation { method: string; path: string; body?: Json; query: Json[] }
const OPERATIONS: Operation[] = Object.entries(doc.paths as Json).flatMap(([p, ops]) =>
  Object.entries(ops as Json).map(([method, op]: [string, Json]) => ({
    method,
    path: p,
    body: op.requestBody?.content?.['application/json']?.schema,
    query: ((op.parameters ?? []) as Json[]).map((x) => (x.$ref ? resolve(x.$ref) : x)).filter((x) => x.in === 'query'),
  })),
);
type Body = { json: unknown } | { raw: string; headers: Record<string, string> } | undefined;
type Who = 'anonymous' | 'member' | 'admin';
interface FuzzRequest { op: Operation; who: Who; ids: string[]; query: string; body: Body }

/** Every byte percent-encoded (encodeURIComponent throws on a lone surrogate, which the fuzzer makes). */
const percentEncoded = (s: string) => [...Buffer.from(s, 'utf8')].map((b) => `%${b.toString(16).padStart(2, '0')}`).join('');

/** Requests that would end the fuzzing sessions or delete the fixtures: sent with ids that name nothing. */
const DESTRUCTIVE = /^(delete |patch \/api\/admin\/users|post \/api\/moderation\/items\/.*\/(hide|suspend-author))/;

const HOSTILE_IDS = ['0'.repeat(36), '-'.repeat(36), 'not-an-id', '%E0%A4%A', '%', '%00', 'a%00b', '..', '%2e%2e', '99999999999999999999', '-1', '1e400',
  '00000000000000000000000000000000', '{00000000-0000-0000-0000-000000000000}', 'FFFFFFFF-FFFF-FFFF-FFFF-FFFFFFFFFFFF', 'thumbnail.svg'];
const RAW_QUERIES = ['q=%', 'q=%E0%A4%A', 'q=a%00b', 'before=0000-01-01T00:00:00Z', 'before=%2B275760-09-13T00:00:00Z', 'a[b][c]=1', 'page=1&page=2',
  'format=svg%00', 'revision=99999999999999999999', 'tags=%00', 'limit=1e999', 'from=0000-01-01', 'to=9999-99-99', 'x=' + 'y'.repeat(5000)];

describe('no request answers 5xx (fuzzed over the OpenAPI document, on PGlite)', () => {
  const logged: unknown[] = [];
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-fuzz-'));
  const ctx = useTestServer('pglite', {
    uploadsDir,
    log: (e) => logged.push(e),
    rateLimits: { signInPerAddress: 1e6, signInPerAccount: 1e6, mailPerAddress: 1e6 },
    communityLimits: { commentsPerMinute: 1e6, photosPerDay: 1e6 },
    moderationLimits: { reportsPerHour: 1e6 },
  });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));

  it(`answers every fuzzed request with less than 500 (seed ${SEED}, ${RUNS} runs)`, async () => {
    const { database, server } = ctx;
    const maren = await member(database, server, 'maren');
    const { entryId, designId } = await publishedBar(maren, 'Sine');
    const tobias = await member(database, server, 'tobias');
    const commentId = (await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'Nice' })).body.id as string;
    const versionId = (await maren.client.post(`/api/designs/${designId}/versions`, { name: 'First' })).body.id as string;
    const invitationId = (await maren.client.post(`/api/boards/${maren.boardId}/invitations`, { email: 'guest@example.test', role: 'editor' })).body.id as string;
    await makeUser(database, 'admin@example.test', 'admin');
    const admin = new Client(server.app);
    await admin.signIn('admin@example.test');
    const clients = { anonymous: new Client(server.app), member: maren.client, admin };

    /** A real id for a path parameter, by its name and where it sits. */
    const realId = (p: string, name: string): string => {
      if (name === 'versionId') return versionId;
      if (name === 'invitationId') return invitationId;
      if (name === 'userId') return tobias.id;
      if (name === 'entryId') return entryId;
      if (name === 'kind') return 'comment';
      if (name === 'n') return '1';
      if (p.startsWith('/api/boards')) return maren.boardId;
      if (p.startsWith('/api/designs')) return designId;
      if (p.startsWith('/api/comments') || p.startsWith('/api/moderation/items')) return commentId;
      if (p.startsWith('/api/admin/users')) return tobias.id;
      return entryId;
    };
    const idArb = (p: string, name: string, destructive: boolean) =>
      fc.oneof(
        ...(destructive ? [] : [{ arbitrary: fc.constant(realId(p, name)), weight: 6 }]),
        { arbitrary: fc.constantFrom(...HOSTILE_IDS), weight: 2 },
        { arbitrary: fc.uuid(), weight: 1 },
        { arbitrary: fc.string({ maxLength: 40 }).map(percentEncoded), weight: 1 },
      );

    const queryArb = (op: Operation) =>
      fc.oneof(
        { arbitrary: fc.constant(''), weight: 3 },
        {
          arbitrary: fc
            .tuple(...op.query.map((q) => fc.option(fc.oneof(fromSchema(q.schema, resolve), hostileValue).map((v) => `${q.name}=${percentEncoded(typeof v === 'string' ? v : JSON.stringify(v) ?? '')}`))))
            .map((parts) => parts.filter(Boolean).join('&')),
          weight: op.query.length ? 6 : 0,
        },
        { arbitrary: fc.constantFrom(...RAW_QUERIES), weight: 2 },
      );

    const bodyArb = (op: Operation): fc.Arbitrary<Body> =>
      fc.oneof(
        { arbitrary: fc.constant(undefined), weight: op.body ? 1 : 4 },
        { arbitrary: fromSchema(op.body, resolve).map((json) => ({ json })), weight: op.body ? 8 : 1 },
        { arbitrary: hostileFromSchema(op.body, resolve).map((json) => ({ json })), weight: op.body ? 6 : 0 },
        { arbitrary: hostileValue.map((json) => ({ json })), weight: 2 },
        {
          arbitrary: fc.constantFrom<Body>(
            { raw: deeplyNested(20_000, 'object'), headers: { 'Content-Type': 'application/json' } },
            { raw: `{"title":"x","file":${deeplyNested(5_000, 'array')}}`, headers: { 'Content-Type': 'application/json' } },
            { raw: '{"name":"x"}', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' } },
            { raw: '{"name":"x"}', headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'compress' } },
            { raw: '{"name":"x"}', headers: { 'Content-Type': 'application/json; charset=klingon' } },
            { raw: '{"name":', headers: { 'Content-Type': 'application/json' } },
            { raw: '{"name":"a\\u0000b","title":"a\\u0000b","body":"a\\u0000b"}', headers: { 'Content-Type': 'application/json' } },
            { raw: '{"stars":1e999}', headers: { 'Content-Type': 'application/json' } },
            { raw: 'angle,radius\n0,1\u0000\n', headers: { 'Content-Type': 'text/csv' } },
            { raw: '--x\r\nContent-Disposition: form-data; name="photo"; filename="a\u0000.png"\r\n\r\nzz\r\n--x--\r\n', headers: { 'Content-Type': 'multipart/form-data; boundary=x' } },
            { raw: '--x\r\nContent-Disposition: form-data; name="caption"\r\n\r\na\u0000b\r\n--x', headers: { 'Content-Type': 'multipart/form-data; boundary=x' } },
          ),
          weight: 2,
        },
      );

    const requestArb: fc.Arbitrary<FuzzRequest> = fc.constantFrom(...OPERATIONS).chain((op) => {
      const destructive = DESTRUCTIVE.test(`${op.method} ${op.path}`);
      const names = [...op.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
      return fc.record({
        op: fc.constant(op),
        // Signing out would end the run's sessions: only the anonymous client does it.
        who: op.path === '/api/auth/sign-out' ? fc.constant<Who>('anonymous') : fc.constantFrom<Who>('anonymous', 'member', 'admin'),
        ids: fc.tuple(...names.map((n) => idArb(op.path, n, destructive))) as fc.Arbitrary<string[]>,
        query: queryArb(op),
        body: bodyArb(op),
      });
    });

    const send = async ({ op, who, ids, query, body }: FuzzRequest): Promise<request.Response> => {
      let i = 0;
      const url = op.path.replace(/\{\w+\}/g, () => ids[i++]) + (query ? `?${query}` : '');
      const client = clients[who];
      // Read each time: a sign-in the fuzzer sends may give the client a new token.
      let req = client.agent[op.method as 'get'](url).set('X-XSRF-TOKEN', await xsrfOf(client));
      if (body && 'raw' in body) req = req.set(body.headers).send(body.raw);
      else if (body) req = req.set('Content-Type', 'application/json').send(JSON.stringify(body.json) ?? 'null');
      return req;
    };

    const started = Date.now();
    const statuses = new Map<number, number>();
    await fc.assert(
      fc.asyncProperty(requestArb, async (r) => {
        const res = await send(r);
        statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
        const errors = logged.splice(0);
        const what = `${r.op.method.toUpperCase()} ${r.op.path} ids=${JSON.stringify(r.ids)} query=${String(r.query).slice(0, 200)} as ${r.who}, body ${JSON.stringify(r.body)?.slice(0, 300)}`;
        expect(res.status, `${what} → ${res.status} ${JSON.stringify(res.body)} ${errors.map(String).join(' / ')}`).toBeLessThan(500);
        if (res.status >= 400 && res.type === 'application/json') expect(res.body.error, what).toMatchObject({ code: expect.any(String), message: expect.any(String) });
      }),
      { seed: SEED, numRuns: RUNS, endOnFailure: true },
    );
    console.info(`fuzzed ${RUNS} requests over ${OPERATIONS.length} operations in ${Date.now() - started} ms (seed ${SEED}); statuses ${JSON.stringify(Object.fromEntries([...statuses].sort()))}`);
  }, 180_000);
});
