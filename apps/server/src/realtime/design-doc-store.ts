import * as Y from 'yjs';
import { asc, count, eq, and, lte, sql } from 'drizzle-orm';
import { designUpdates } from '../../../../db/schema';
import type { Db } from '../database/database';

/**
 * The stored form of the design documents: every Yjs update as it arrived, appended in order, and
 * now and then compacted into one merged update. Loading applies them all; Yjs updates commute
 * and are idempotent, so an update stored twice or applied twice does no harm.
 */
export class DesignDocStore {
  constructor(private readonly db: Db) {}

  async append(designId: string, update: Uint8Array): Promise<void> {
    await this.db.insert(designUpdates).values({ designId, update });
  }

  /** All stored updates merged into one (an empty update when none). */
  async loadUpdate(designId: string): Promise<Uint8Array> {
    const rows = await this.db
      .select({ update: designUpdates.update })
      .from(designUpdates)
      .where(eq(designUpdates.designId, designId))
      .orderBy(asc(designUpdates.seq));
    return rows.length === 1 ? rows[0].update : Y.mergeUpdates(rows.map((r) => r.update));
  }

  /** A fresh Y.Doc holding the stored state (for reads outside a live session). */
  async loadDoc(designId: string): Promise<Y.Doc> {
    const doc = new Y.Doc();
    Y.applyUpdate(doc, await this.loadUpdate(designId));
    return doc;
  }

  async rowCount(designId: string): Promise<number> {
    const [{ n }] = await this.db.select({ n: count() }).from(designUpdates).where(eq(designUpdates.designId, designId));
    return n;
  }

  /**
   * Replaces the rows up to the newest one read with their merge, in one transaction, so rows
   * appended meanwhile stay as they are and nothing is lost if the process dies half-way.
   */
  async compact(designId: string): Promise<{ before: number; after: number }> {
    return this.db.transaction(async (tx) => {
      const rows = await tx
        .select({ seq: designUpdates.seq, update: designUpdates.update, merged: designUpdates.merged })
        .from(designUpdates)
        .where(eq(designUpdates.designId, designId))
        .orderBy(asc(designUpdates.seq));
      if (rows.length < 2) return { before: rows.length, after: rows.length };
      const last = rows[rows.length - 1].seq;
      const merged = Y.mergeUpdates(rows.map((r) => r.update));
      const total = rows.reduce((s, r) => s + r.merged, 0);
      await tx.delete(designUpdates).where(and(eq(designUpdates.designId, designId), lte(designUpdates.seq, last)));
      await tx.insert(designUpdates).values({ designId, update: merged, merged: total });
      return { before: rows.length, after: 1 };
    });
  }

  /** Designs with more than `threshold` stored rows: candidates for compaction. */
  async designsToCompact(threshold: number): Promise<string[]> {
    const rows = await this.db
      .select({ designId: designUpdates.designId })
      .from(designUpdates)
      .groupBy(designUpdates.designId)
      .having(sql`count(*) > ${threshold}`);
    return rows.map((r) => r.designId);
  }
}
