import { and, count, eq, gt, sql } from 'drizzle-orm';
import type { NewReportBody, Report, ReportTarget } from '@barwright/contracts';
import { reports, type ReportRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { forbidden, HttpError, notFound } from '../http/http-error';
import { seesHiddenItem } from './hidden-visibility';
import { isModerator } from './moderation-rules';
import { loadTarget, type TargetFacts } from './moderation-targets';

const NAMES = { entry: 'bar', comment: 'comment', photo: 'photo' } as const;

export const toReport = (r: ReportRow): Report => ({
  id: r.id,
  target: { kind: r.targetKind, id: r.targetId },
  reason: r.reason,
  details: r.details,
  status: r.status,
  createdAt: r.createdAt.toISOString(),
});

/** The item as the reporter may see it: 404 when it is gone or hidden from them, 409 when already hidden, 403 for their own. */
async function reportableTarget(db: Db, target: ReportTarget, reporter: UserRow): Promise<TargetFacts> {
  const found = await loadTarget(db, target);
  const what = NAMES[target.kind];
  if (!found || found.gone) throw notFound(what);
  const closed = found.hiddenAt !== null || found.entryClosed;
  if (closed && !isModerator(reporter) && !seesHiddenItem(found.authorId, reporter)) throw notFound(what);
  if (found.authorId === reporter.id) throw forbidden(`You cannot report your own ${what}. Delete it if it should not be shown.`);
  if (closed) throw new HttpError(409, 'already_hidden', `This ${what} is hidden already.`);
  return found;
}

/**
 * Files a member's report: one open report per member per item (409 for a second while the
 * first is open), and at most `perHour` reports in a rolling hour (429).
 */
export async function fileReport(db: Db, reporter: UserRow, body: NewReportBody & { details: string }, perHour: number): Promise<Report> {
  const since = new Date(Date.now() - 3600_000);
  const [{ n }] = await db.select({ n: count() }).from(reports).where(and(eq(reports.reporterId, reporter.id), gt(reports.createdAt, since)));
  if (n >= perHour) throw new HttpError(429, 'rate_limited', `You have filed ${perHour} reports in the last hour, the limit. The moderators are looking; try again later.`);
  const target = await reportableTarget(db, body.target, reporter);
  // The partial unique index keeps one open report per member and item even when two arrive at once.
  const [row] = await db
    .insert(reports)
    .values({ targetKind: target.kind, targetId: target.id, entryId: target.entryId, reporterId: reporter.id, reason: body.reason, details: body.details })
    .onConflictDoNothing()
    .returning();
  if (!row) throw new HttpError(409, 'already_reported', `You have reported this ${NAMES[target.kind]} already; the moderators will look at it.`);
  return toReport(row);
}

/** Open reports in all: the number the desk's badge shows. */
export async function openReportCount(db: Db): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(reports).where(eq(reports.status, 'open'));
  return n;
}

/** Closes every open report of an item as dismissed or upheld; returns how many were closed. */
export async function closeReports(db: Db, target: Pick<ReportTarget, 'kind' | 'id'>, status: 'dismissed' | 'upheld', by: UserRow): Promise<number> {
  const closed = await db
    .update(reports)
    .set({ status, resolvedAt: sql`now()`, resolvedBy: by.id })
    .where(and(eq(reports.targetKind, target.kind), eq(reports.targetId, target.id), eq(reports.status, 'open')))
    .returning({ id: reports.id });
  return closed.length;
}
