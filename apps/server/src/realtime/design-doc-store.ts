import * as Y from 'yjs';
import { asc, count, eq, and, inArray, sql } from 'drizzle-orm';
import { designUpdates } from '../../../../db/schema';
import type { Db } from '../database/database';

/**
 * The stored form of the design documents: every Yjs update as it arrived, appended in order, and
 * now and then compacted into one merged update. Loading applies them all; Yjs updates commute
 * and are idempotent, so an update stored twice or applied twice does no harm.
 */
export class DesignDocStore {
  constructor(
    private readonly db: Db,
    private readonly report: (message: string) => void = (message) => console.error(`[barwright] ${message}`),
  ) {}

  async append(designId: string, update: Uint8Array): Promise<void> {
    await this.db.insert(designUpdates).values({ designId, update });
  }

  /** All stored updates merged into one (an empty update when none); rows that do not decode are skipped and reported. */
  async loadUpdate(designId: string): Promise<Uint8Array> {
    const rows = await this.db
      .select({ seq: designUpdates.seq, update: designUpdates.update })
      .from(designUpdates)
      .where(eq(designUpdates.designId, designId))
      .orderBy(asc(designUpdates.seq));
    const good = this.decodable(designId, rows);
    return good.length === 1 ? good[0].update : Y.mergeUpdates(good.map((r) => r.update));
  }

  /** A fresh Y.Doc holding the stored state (for reads outside a live session). */
  async loadDoc(designId: string): Promise<Y.Doc> {
    const doc = new Y.Doc();
    Y.applyUpdate(doc, await this.loadUpdate(designId));
    return doc;
  }

  /**
   * The rows that apply on their own. A row that throws (stored before updates were checked, or
   * damaged on disk) would fail the whole design, so it is left out and reported; it stays in the table.
   */
  private decodable<R extends { seq: number; update: Uint8Array }>(designId: string, rows: R[]): R[] {
    if (rows.length === 1 && this.applies(rows[0].update)) return rows;
    const good = rows.filter((r) => this.applies(r.update));
    for (const r of rows) if (!good.includes(r)) this.report(`design ${designId}: stored update ${r.seq} (${r.update.length} bytes) does not decode; skipped`);
    return good;
  }

  private applies(update: Uint8Array): boolean {
    try {
      Y.applyUpdate(new Y.Doc(), update);
      return true;
    } catch {
      return false;
    }
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
      const good = this.decodable(designId, rows); // a row that does not decode stays as it is, for inspection
      const merged = Y.mergeUpdates(good.map((r) => r.update));
      const total = good.reduce((s, r) => s + r.merged, 0);
      await tx.delete(designUpdates).where(and(eq(designUpdates.designId, designId), inArray(designUpdates.seq, good.map((r) => r.seq))));
      await tx.insert(designUpdates).values({ designId, update: merged, merged: total });
      return { before: rows.length, after: 1 + rows.length - good.length };
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
