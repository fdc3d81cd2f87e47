import * as Y from 'yjs';
import { eq } from 'drizzle-orm';
import { writeDesign } from '@barwright/contracts/design-doc';
import { designs, users, type UserRow } from '../db/schema';
import { DesignDocStore } from '../apps/server/src/realtime/design-doc-store';
import type { Db } from '../apps/server/src/database/database';
import { createBoard } from '../apps/server/src/boards/boards-service';
import { createDesign, initialDocUpdate } from '../apps/server/src/designs/designs-service';
import { publishDesign } from '../apps/server/src/publishing/publishing-service';
import { setRating } from '../apps/server/src/ratings/ratings-service';
import { addComment } from '../apps/server/src/comments/comments-service';
import { remixEntry } from '../apps/server/src/remix/remix-service';
import { findLiveEntry } from '../apps/server/src/publishing/entry-access';
import { DEMO_BARS, DEMO_COMMENTS, DEMO_RATINGS, DEMO_REMIX, DEMO_SHOWCASE } from './demo-bars';
import { featureEntry } from '../apps/server/src/showcase/showcase-service';

/** Boards, designs, published bars, a remix, ratings and comments of the demo club. */
export async function seedDemoCommunity(db: Db): Promise<void> {
  const people = new Map<string, UserRow>();
  const person = async (email: string) => {
    if (!people.has(email)) people.set(email, (await db.select().from(users).where(eq(users.email, email)))[0]);
    return people.get(email)!;
  };
  const boards = new Map<string, string>();
  const boardOf = async (email: string, name: string) => {
    const key = `${email}/${name}`;
    if (!boards.has(key)) boards.set(key, (await createBoard(db, await person(email), name)).id);
    return boards.get(key)!;
  };
  const entryByTitle = new Map<string, string>();
  const loose = { perMinute: 1000, editWindowMs: 15 * 60_000 };

  for (const bar of DEMO_BARS) {
    const owner = await person(bar.owner);
    const boardId = await boardOf(bar.owner, bar.board);
    const design = await createDesign(db, { boardId, title: bar.title, createdBy: owner.id, state: initialDocUpdate(bar.design, bar.notes) });
    const { entryId } = await publishDesign(db, design, bar.design, owner, { title: bar.title, description: bar.description, tags: bar.tags });
    entryByTitle.set(bar.title, entryId);
  }

  const remixer = await person(DEMO_REMIX.by);
  const original = (await findLiveEntry(db, entryByTitle.get(DEMO_REMIX.of)!))!;
  const { designId } = await remixEntry(db, original, remixer, await boardOf(DEMO_REMIX.by, DEMO_REMIX.board));
  const source = DEMO_BARS.find((b) => b.title === DEMO_REMIX.of)!.design;
  const changed = DEMO_REMIX.change(source);
  // The remix's document gets the changed file as an edit on top of the copy, as the studio would write it.
  const store = new DesignDocStore(db);
  const doc = await store.loadDoc(designId);
  const before = Y.encodeStateVector(doc);
  writeDesign(doc, changed);
  await store.append(designId, Y.encodeStateAsUpdate(doc, before));
  const [remixRow] = await db.update(designs).set({ title: DEMO_REMIX.title }).where(eq(designs.id, designId)).returning();
  const { entryId: remixEntryId } = await publishDesign(db, remixRow, changed, remixer, { title: DEMO_REMIX.title, description: DEMO_REMIX.description, tags: DEMO_REMIX.tags });
  entryByTitle.set(DEMO_REMIX.title, remixEntryId);

  for (const r of DEMO_RATINGS) await setRating(db, entryByTitle.get(r.title)!, (await person(r.by)).id, r.stars);
  for (const c of DEMO_COMMENTS) await addComment(db, entryByTitle.get(c.title)!, await person(c.by), c.body, undefined, loose);
  const curator = await person('tobias@example.test');
  for (const s of DEMO_SHOWCASE) await featureEntry(db, curator, entryByTitle.get(s.title)!, s.note);
}
