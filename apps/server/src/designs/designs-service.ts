import * as Y from 'yjs';
import { and, desc, eq, isNull, isNotNull, lt } from 'drizzle-orm';
import { DESIGN_PRESET_FILES, parseDesign, type Design, type DesignPreset, type DesignSummary, type FieldError } from '@barwright/contracts';
import { writeDesign, readDesign, NOTES_TEXT } from '@barwright/contracts/design-doc';
import { boards, designs, designUpdates, type DesignRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { HttpError } from '../http/http-error';
import { isUuid } from '../http/uuid';

export const DELETED_KEEP_DAYS = 30;
const DAY_MS = 86_400_000;

export async function findDesign(db: Db, id: string, includeDeleted = false): Promise<DesignRow | undefined> {
  if (!isUuid(id)) return undefined;
  const [row] = await db
    .select()
    .from(designs)
    .where(includeDeleted ? eq(designs.id, id) : and(eq(designs.id, id), isNull(designs.deletedAt)));
  return row;
}

export const toDesignSummary = (d: DesignRow): DesignSummary => ({
  id: d.id,
  boardId: d.boardId,
  title: d.title,
  updatedAt: d.updatedAt.toISOString(),
  deletedAt: d.deletedAt?.toISOString() ?? null,
  purgeAt: d.deletedAt ? new Date(d.deletedAt.getTime() + DELETED_KEEP_DAYS * DAY_MS).toISOString() : null,
});

/** The first stored update of a new design: its file in the `design` map and its notes. */
export function initialDocUpdate(design: Design, notes = ''): Uint8Array {
  const doc = new Y.Doc();
  writeDesign(doc, design);
  if (notes) doc.getText(NOTES_TEXT).insert(0, notes);
  return Y.encodeStateAsUpdate(doc);
}

export async function createDesign(
  db: Db,
  input: { boardId: string; title: string; createdBy: string; preset?: DesignPreset; file?: Design; state?: Uint8Array },
): Promise<DesignRow> {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(designs).values({ boardId: input.boardId, title: input.title, createdBy: input.createdBy }).returning();
    const update = input.state ?? initialDocUpdate(input.file ?? DESIGN_PRESET_FILES[input.preset ?? 'example']);
    await tx.insert(designUpdates).values({ designId: row.id, update });
    await tx.update(boards).set({ updatedAt: new Date() }).where(eq(boards.id, input.boardId));
    return row;
  });
}

export async function listBoardDesigns(db: Db, boardId: string, includeDeleted: boolean): Promise<DesignRow[]> {
  return db
    .select()
    .from(designs)
    .where(includeDeleted ? eq(designs.boardId, boardId) : and(eq(designs.boardId, boardId), isNull(designs.deletedAt)))
    .orderBy(desc(designs.updatedAt));
}

/** Reads and validates a document's design; an invalid one answers 422 with the fields named. */
export function validatedDesign(doc: Y.Doc): Design {
  const result = parseDesign(readDesign(doc));
  if (result.ok) return result.design;
  throw invalidDesign(result.errors);
}

export function invalidDesign(errors: FieldError[]): HttpError {
  const fields = Object.fromEntries(errors.map((e) => [e.path, e.message]));
  return new HttpError(422, 'invalid_design', `The design has fields to fix first: ${errors.map((e) => `${e.path} ${e.message}`).join('; ')}`, fields);
}

/** Removes designs deleted more than 30 days ago for good. */
export async function purgeDeletedDesigns(db: Db, now = new Date()): Promise<void> {
  await db.delete(designs).where(and(isNotNull(designs.deletedAt), lt(designs.deletedAt, new Date(now.getTime() - DELETED_KEEP_DAYS * DAY_MS))));
}
