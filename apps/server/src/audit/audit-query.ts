import { and, asc, count, desc, eq, gte, inArray, isNotNull, lt, type SQL } from 'drizzle-orm';
import { LATEST_INSTANT_MS, type AuditEntry, type AuditPage, type AuditQuery, type PersonRef } from '@barwright/contracts';
import { auditLog } from '../../../../db/schema';
import type { Db } from '../database/database';
import { toAuditEntry } from './audit-log';

const DAY_MS = 86_400_000;

/**
 * A bare date means the start of that UTC day; `to` as a bare date takes in the whole day. A `to` at
 * the end of the range needs no bound (its day after would be year 10000, which the database refuses).
 */
function bounds(q: Pick<AuditQuery, 'from' | 'to'>): { from?: Date; before?: Date } {
  const isDay = (v: string) => v.length === 10;
  const before = q.to ? (isDay(q.to) ? Date.parse(`${q.to}T00:00:00Z`) + DAY_MS : Date.parse(q.to) + 1) : undefined;
  return {
    from: q.from ? new Date(isDay(q.from) ? `${q.from}T00:00:00Z` : q.from) : undefined,
    before: before !== undefined && before <= LATEST_INSTANT_MS ? new Date(before) : undefined,
  };
}

export function auditConditions(q: AuditQuery): SQL | undefined {
  const { from, before } = bounds(q);
  const where: (SQL | undefined)[] = [
    q.action ? eq(auditLog.action, q.action) : undefined,
    q.actor ? eq(auditLog.actorId, q.actor) : undefined,
    q.kind ? eq(auditLog.targetKind, q.kind) : undefined,
    q.item ? eq(auditLog.targetId, q.item) : undefined,
    from ? gte(auditLog.at, from) : undefined,
    before ? lt(auditLog.at, before) : undefined,
  ];
  return and(...where);
}

/** One page of the log, newest first, with the total over all pages. */
export async function auditPage(db: Db, q: AuditQuery): Promise<AuditPage> {
  const where = auditConditions(q);
  const rows = await db
    .select()
    .from(auditLog)
    .where(where)
    .orderBy(desc(auditLog.at), desc(auditLog.seq))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  const [{ total }] = await db.select({ total: count() }).from(auditLog).where(where);
  const page: AuditPage = { items: rows.map(toAuditEntry), total, page: q.page, pageSize: q.pageSize };
  return q.item ? { ...page, item: await itemNamed(db, q.item) } : page;
}

/** An item as the log's newest line about it names it, so a filter by item shows a title, not an id. */
async function itemNamed(db: Db, id: string): Promise<AuditPage['item']> {
  const [row] = await db
    .select({ kind: auditLog.targetKind, label: auditLog.targetLabel })
    .from(auditLog)
    .where(eq(auditLog.targetId, id))
    .orderBy(desc(auditLog.at), desc(auditLog.seq))
    .limit(1);
  return row ? { id, kind: row.kind, label: row.label } : null;
}

/** The lines about some items, newest first (the desk's history of each case). */
export async function auditOfTargets(db: Db, targetIds: string[]): Promise<Map<string, AuditEntry[]>> {
  const byTarget = new Map<string, AuditEntry[]>();
  if (!targetIds.length) return byTarget;
  const rows = await db.select().from(auditLog).where(inArray(auditLog.targetId, targetIds)).orderBy(desc(auditLog.at), desc(auditLog.seq));
  for (const row of rows) byTarget.set(row.targetId!, [...(byTarget.get(row.targetId!) ?? []), toAuditEntry(row)]);
  return byTarget;
}

/** Everyone who appears in the log as the one acting, by name (for the actor filter). */
export async function auditActors(db: Db): Promise<PersonRef[]> {
  const rows = await db
    .selectDistinct({ id: auditLog.actorId, displayName: auditLog.actorName })
    .from(auditLog)
    .where(isNotNull(auditLog.actorId))
    .orderBy(asc(auditLog.actorName));
  // A renamed actor appears under each name used; keep the first per id.
  const seen = new Map<string, PersonRef>();
  for (const r of rows) if (!seen.has(r.id!)) seen.set(r.id!, { id: r.id!, displayName: r.displayName });
  return [...seen.values()];
}
