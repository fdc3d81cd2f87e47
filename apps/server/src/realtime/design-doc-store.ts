import * as Y from 'yjs';
import { asc, count, eq, and, gt, sql } from 'drizzle-orm';
import { designUpdates } from '../../../../db/schema';
import type { Db } from '../database/database';
import { ADVISORY_LOCKS, tryAdvisoryXactLock } from '../database/advisory-locks';

/** Told of every stored update with its row's sequence number (the cross-instance relay publishes it). */
export type AppendListener = (designId: string, seq: number, update: Uint8Array) => void;

/**
 * The stored form of the design documents: every Yjs update as it arrived, appended in order, and
 * now and then compacted into one merged update. Loading applies them all; Yjs updates commute
 * and are idempotent, so an update stored twice or applied twice does no harm.
 */
export class DesignDocStore {
  constructor(
    private readonly db: Db,
    private readonly report: (message: string) => void = (message) => console.error(`[barwright] ${message}`),
    private readonly appended?: AppendListener,
  ) {}

  /** Stores an update; returns its row's sequence number once it is on disk (and tells the listener). */
  async append(designId: string, update: Uint8Array): Promise<number> {
    const [{ seq }] = await this.db.insert(designUpdates).values({ designId, update }).returning({ seq: designUpdates.seq });
    this.appended?.(designId, seq, update);
    return seq;
  }

  /** All stored updates merged into one (an empty update when none); rows that do not decode are skipped and reported. */
  async loadUpdate(designId: string): Promise<Uint8Array> {
    return (await this.loadAfter(designId, 0)).update;
  }

  /**
   * The stored rows with a sequence number above `after`, merged, and the highest sequence number
   * read (`after` when none). Compaction replaces rows by one with a higher number, so rows above
   * `after` always hold every update stored after the row `after`.
   */
  async loadAfter(designId: string, after: number): Promise<{ update: Uint8Array; lastSeq: number }> {
    const rows = await this.db
      .select({ seq: designUpdates.seq, update: designUpdates.update })
      .from(designUpdates)
      .where(and(eq(designUpdates.designId, designId), gt(designUpdates.seq, after)))
      .orderBy(asc(designUpdates.seq));
    const lastSeq = rows.length ? rows[rows.length - 1].seq : after;
    return { update: this.decodable(designId, rows).update, lastSeq };
  }

  /** A fresh Y.Doc holding the stored state (for reads outside a live session). */
  async loadDoc(designId: string): Promise<Y.Doc> {
    const doc = new Y.Doc();
    Y.applyUpdate(doc, await this.loadUpdate(designId));
    return doc;
  }

  /**
   * The rows that apply, and their merge. A row that throws (stored before updates were checked, or
   * damaged on disk) would fail the whole design, so it is left out and reported; it stays in the
   * table. The rows are tried one by one only when their merge does not apply.
   */
  private decodable<R extends { seq: number; update: Uint8Array }>(designId: string, rows: R[]): { good: R[]; update: Uint8Array } {
    const merge = (rs: R[]) => (rs.length === 1 ? rs[0].update : Y.mergeUpdates(rs.map((r) => r.update)));
    try {
      const update = merge(rows);
      if (this.applies(update)) return { good: rows, update };
    } catch {
      // a row does not decode: find it below
    }
    const good = rows.filter((r) => this.applies(r.update));
    const kept = new Set(good);
    for (const r of rows) if (!kept.has(r)) this.report(`design ${designId}: stored update ${r.seq} (${r.update.length} bytes) does not decode; skipped`);
    return { good, update: merge(good) };
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
   * Replaces the rows read with their merge, in one transaction, so nothing is lost if the process
   * dies half-way. It deletes exactly the rows it merged (seq = ANY), never "up to the newest read":
   * a row whose insert began earlier but committed after the read has a lower number than the newest
   * read and must stay. One compaction per design at a time, across instances (an advisory lock;
   * a second one meanwhile does nothing).
   */
  async compact(designId: string): Promise<{ before: number; after: number }> {
    return this.db.transaction(async (tx) => {
      if (!(await tryAdvisoryXactLock(tx, ADVISORY_LOCKS.compaction, designId))) return { before: 0, after: 0 };
      const rows = await tx
        .select({ seq: designUpdates.seq, update: designUpdates.update, merged: designUpdates.merged })
        .from(designUpdates)
        .where(eq(designUpdates.designId, designId))
        .orderBy(asc(designUpdates.seq));
      if (rows.length < 2) return { before: rows.length, after: rows.length };
      const { good, update: merged } = this.decodable(designId, rows); // a row that does not decode stays as it is, for inspection
      const total = good.reduce((s, r) => s + r.merged, 0);
      // One array parameter, not one per row (PostgreSQL takes at most 65 535 bind parameters).
      const seqs = `{${good.map((r) => r.seq).join(',')}}`;
      await tx.delete(designUpdates).where(and(eq(designUpdates.designId, designId), sql`${designUpdates.seq} = ANY(${seqs}::bigint[])`));
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
