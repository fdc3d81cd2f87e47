import { and, asc, count, desc, eq, inArray, isNotNull, min, sql } from 'drizzle-orm';
import type { CaseReport, ModerationCase, ModerationItem, ReportTarget } from '@barwright/contracts';
import { comments, entries, photos, reports, users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { auditOfTargets } from '../audit/audit-query';
import { canActOn } from './moderation-rules';
import { loadTargets, targetKey, type TargetFacts } from './moderation-targets';

type Target = Pick<ReportTarget, 'kind' | 'id'>;
/** Most cases one desk page shows. */
const CASES_MAX = 200;

type ReportWithNames = { report: typeof reports.$inferSelect; reporterName: string; entryTitle: string };

async function reportsOf(db: Db, targets: Target[]): Promise<ReportWithNames[]> {
  if (!targets.length) return [];
  return db
    .select({ report: reports, reporterName: users.displayName, entryTitle: entries.title })
    .from(reports)
    .innerJoin(users, eq(users.id, reports.reporterId))
    .innerJoin(entries, eq(entries.id, reports.entryId))
    .where(inArray(reports.targetId, targets.map((t) => t.id)))
    .orderBy(desc(reports.createdAt));
}

/** How many reports each reporter has filed, and how many of them were upheld. */
async function reporterStats(db: Db, ids: string[]) {
  const rows = ids.length
    ? await db
        .select({ id: reports.reporterId, filed: count(), upheld: sql<number>`count(*) filter (where ${reports.status} = 'upheld')`.mapWith(Number) })
        .from(reports)
        .where(inArray(reports.reporterId, ids))
        .groupBy(reports.reporterId)
    : [];
  return new Map(rows.map((r) => [r.id, r]));
}

function toItem(target: Target, facts: TargetFacts | undefined, author: UserRow | undefined, fallbackEntry: { id: string; title: string }): ModerationItem {
  return {
    target: { kind: target.kind, id: target.id },
    entryId: facts?.entryId ?? fallbackEntry.id,
    entryTitle: facts?.entryTitle ?? fallbackEntry.title,
    author: author ? { id: author.id, displayName: author.displayName, role: author.role, suspended: Boolean(author.suspendedAt) } : { id: '', displayName: 'unknown', role: 'member', suspended: false },
    excerpt: facts?.excerpt ?? '',
    thumbnailUrl: facts && !facts.gone ? facts.thumbnailUrl : null,
    link: facts?.link ?? `/entries/${fallbackEntry.id}`,
    createdAt: (facts?.createdAt ?? new Date(0)).toISOString(),
    hidden: Boolean(facts?.hiddenAt),
    hiddenReason: facts?.hiddenReason ?? null,
    hiddenAt: facts?.hiddenAt?.toISOString() ?? null,
    // A photo its uploader deleted leaves no row: only its reports remain.
    gone: !facts || facts.gone,
  };
}

/** The cases of some items for this viewer: each item in context, its reports (open and earlier), its audit history, and what the viewer may do. */
export async function buildCases(db: Db, targets: Target[], viewer: UserRow): Promise<ModerationCase[]> {
  const facts = await loadTargets(db, targets);
  const allReports = (await reportsOf(db, targets)).filter((r) => targets.some((t) => t.kind === r.report.targetKind && t.id === r.report.targetId));
  const stats = await reporterStats(db, [...new Set(allReports.map((r) => r.report.reporterId))]);
  const authorIds = [...new Set([...facts.values()].map((f) => f.authorId))];
  const authors = new Map((authorIds.length ? await db.select().from(users).where(inArray(users.id, authorIds)) : []).map((u) => [u.id, u]));
  const history = await auditOfTargets(db, targets.map((t) => t.id));
  const cases: ModerationCase[] = [];
  for (const target of targets) {
    const own = allReports.filter((r) => r.report.targetKind === target.kind && r.report.targetId === target.id);
    const found = facts.get(targetKey(target));
    if (!found && !own.length) continue;
    const toCaseReport = ({ report: r, reporterName }: ReportWithNames): CaseReport => ({
      id: r.id,
      reason: r.reason,
      details: r.details,
      status: r.status,
      createdAt: r.createdAt.toISOString(),
      resolvedAt: r.resolvedAt?.toISOString() ?? null,
      reporter: { id: r.reporterId, displayName: reporterName, reportsFiled: stats.get(r.reporterId)?.filed ?? 0, reportsUpheld: stats.get(r.reporterId)?.upheld ?? 0 },
    });
    const author = found ? authors.get(found.authorId) : undefined;
    cases.push({
      item: toItem(target, found, author, { id: own[0]?.report.entryId ?? '', title: own[0]?.entryTitle ?? '' }),
      openReports: own.filter((r) => r.report.status === 'open').reverse().map(toCaseReport),
      earlierReports: own.filter((r) => r.report.status !== 'open').map(toCaseReport),
      actions: history.get(target.id) ?? [],
      canAct: canActOn(viewer, author),
    });
  }
  return cases;
}

/** The items with open reports, the one waiting longest first. */
export async function queueTargets(db: Db): Promise<Target[]> {
  const first = min(reports.createdAt);
  const rows = await db
    .select({ kind: reports.targetKind, id: reports.targetId, first })
    .from(reports)
    .where(eq(reports.status, 'open'))
    .groupBy(reports.targetKind, reports.targetId)
    .orderBy(asc(first))
    .limit(CASES_MAX);
  return rows.map(({ kind, id }) => ({ kind, id }));
}

/** The items hidden now, the last hidden first (comments and photos on deleted entries left out). */
export async function hiddenTargets(db: Db): Promise<Target[]> {
  const liveEntry = sql`${entries.deletedAt} IS NULL`;
  const [e, c, p] = await Promise.all([
    db.select({ id: entries.id, at: entries.hiddenAt }).from(entries).where(and(isNotNull(entries.hiddenAt), liveEntry)).orderBy(desc(entries.hiddenAt)).limit(CASES_MAX),
    db.select({ id: comments.id, at: comments.hiddenAt }).from(comments).innerJoin(entries, eq(entries.id, comments.entryId)).where(and(isNotNull(comments.hiddenAt), sql`${comments.deletedAt} IS NULL`, liveEntry)).orderBy(desc(comments.hiddenAt)).limit(CASES_MAX),
    db.select({ id: photos.id, at: photos.hiddenAt }).from(photos).innerJoin(entries, eq(entries.id, photos.entryId)).where(and(isNotNull(photos.hiddenAt), liveEntry)).orderBy(desc(photos.hiddenAt)).limit(CASES_MAX),
  ]);
  const all = [...e.map((r) => ({ kind: 'entry' as const, ...r })), ...c.map((r) => ({ kind: 'comment' as const, ...r })), ...p.map((r) => ({ kind: 'photo' as const, ...r }))];
  return all.sort((a, b) => b.at!.getTime() - a.at!.getTime()).slice(0, CASES_MAX).map(({ kind, id }) => ({ kind, id }));
}
