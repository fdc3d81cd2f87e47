import pg from 'pg';
import * as Y from 'yjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createBoard } from '../boards/boards-service';
import { createDesign } from '../designs/designs-service';
import { makeUser } from '../testing/test-app';
import { openTestDatabase, postgresAnswers, TEST_POSTGRES_URL, type TestDatabase } from '../testing/test-database';
import { DesignDocStore } from './design-doc-store';

const onServer = await postgresAnswers();
if (!onServer) console.warn(`compaction interleaving test skipped: no PostgreSQL server at ${TEST_POSTGRES_URL} (PGlite runs one statement at a time, so it cannot interleave).`);

/**
 * Compaction reads a design's rows, merges them and replaces them. Sequence numbers are taken at
 * insert, so a row can commit after the read with a number below the newest row read; deleting
 * "up to the newest read" would drop it unmerged, and every later update that builds on it would
 * stay pending for ever. The test holds such an insert open across the compaction's read.
 */
describe.skipIf(!onServer)('compaction on a PostgreSQL server', () => {
  let database: TestDatabase;
  let url: string;
  beforeAll(async () => {
    database = await openTestDatabase('postgres');
    url = database.url!;
  });
  afterAll(() => database?.close());

  it('keeps a row that commits between its read and its delete with a lower number than the newest read', async () => {
    const owner = await makeUser(database, 'compact@example.test');
    const board = await createBoard(database.db, owner, 'Compaction');
    const design = await createDesign(database.db, { boardId: board.id, title: 'Interleaved', createdBy: owner.id });
    const store = new DesignDocStore(database.db);
    const writer = new Y.Doc();
    const updates: Uint8Array[] = [];
    writer.on('update', (u: Uint8Array) => updates.push(u));
    const text = writer.getText('notes');
    for (const word of ['one ', 'two ', 'three ', 'late ', 'after ']) text.insert(text.length, word);
    for (const u of updates.slice(0, 3)) await store.append(design.id, u);

    // The late update: its insert takes a sequence number, then stays uncommitted.
    const late = new pg.Client({ connectionString: url });
    await late.connect();
    await late.query('begin');
    await late.query('insert into design_updates (design_id, update) values ($1, $2)', [design.id, Buffer.from(updates[3])]);
    await store.append(design.id, updates[4]); // a higher number, committed at once
    // Hold the compaction's DELETE (it needs ROW EXCLUSIVE) until the late row has committed; its read goes through.
    await late.query('lock table design_updates in share mode');
    const compacted = store.compact(design.id);
    const watcher = new pg.Client({ connectionString: url });
    await watcher.connect();
    for (let i = 0; i < 200; i++) {
      const { rows } = await watcher.query(`select count(*)::int as n from pg_stat_activity where wait_event_type = 'Lock' and query ilike 'delete from "design_updates"%'`);
      if (rows[0].n > 0) break;
      await new Promise((r) => setTimeout(r, 25));
    }
    await late.query('commit');
    expect(await compacted).toEqual({ before: 5, after: 1 }); // the design's first row, one, two, three, after
    await Promise.all([late.end(), watcher.end()]);

    expect((await store.loadDoc(design.id)).getText('notes').toString()).toBe('one two three late after ');
    expect(await store.rowCount(design.id)).toBe(2); // the merged row and the late one
    await store.compact(design.id);
    expect(await store.rowCount(design.id)).toBe(1);
    expect((await store.loadDoc(design.id)).getText('notes').toString()).toBe('one two three late after ');
  });
});
