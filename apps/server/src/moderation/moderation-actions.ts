import type { ReportTarget } from '@barwright/contracts';
import { eq } from 'drizzle-orm';
import { entries, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { changeAccount, type AccountChangeDeps } from '../admin/account-changes';
import { findUserById } from '../auth/users';
import { recordAudit, type AuditInput } from '../audit/audit-log';
import { forbidden, HttpError, notFound } from '../http/http-error';
import type { NotificationEvents } from '../notifications/notification-events';
import { unreadCount, type Notifier } from '../notifications/notifier';
import { setHidden } from './item-hiding';
import type { ModerationEvents } from './moderation-events';
import { requireMayAct } from './moderation-rules';
import { loadTarget, type TargetFacts } from './moderation-targets';
import { closeReports, openReportCount } from './reports-service';

export interface ModerationActionDeps {
  db: Db;
  accounts: AccountChangeDeps;
  events: ModerationEvents;
  notificationEvents: NotificationEvents;
  /** Tells an item's author that it was hidden or restored (in the app and by their e-mail setting). */
  notifier: Pick<Notifier, 'notify'>;
}

type Target = Pick<ReportTarget, 'kind' | 'id'>;
const NAMES = { entry: 'bar', comment: 'comment', photo: 'photo' } as const;
const LABEL_EXCERPT = 120;

/** The item and its author, once the viewer is known to be allowed to decide on it. */
async function decidable(db: Db, target: Target, viewer: UserRow): Promise<{ facts: TargetFacts; author: UserRow }> {
  const facts = await loadTarget(db, target);
  if (!facts) throw notFound(NAMES[target.kind]);
  const author = await findUserById(db, facts.authorId);
  requireMayAct(viewer, author);
  return { facts, author: author! };
}

const labelOf = (f: TargetFacts) => (f.kind === 'entry' ? f.entryTitle : `${NAMES[f.kind]} on “${f.entryTitle}”`);

function auditOf(f: TargetFacts, viewer: UserRow, author: UserRow, action: AuditInput['action'], reason: string, reportsClosed: number): AuditInput {
  return {
    actor: viewer,
    action,
    target: { kind: f.kind, id: f.id, label: labelOf(f) },
    subject: author,
    reason,
    details: { entryId: f.entryId, reports: reportsClosed, ...(f.kind === 'entry' ? {} : { excerpt: f.excerpt.slice(0, LABEL_EXCERPT) }) },
  };
}

/** Tells the open desks the new open-report count. */
export async function announceQueue(deps: Pick<ModerationActionDeps, 'db' | 'events'>): Promise<void> {
  deps.events.emit('queue', { openReports: await openReportCount(deps.db) });
}

/** After a decision: the desks' count, and (a comment) the bell of the entry's author, whose notification of it came or went. */
async function announce(deps: ModerationActionDeps, f: TargetFacts | undefined) {
  await announceQueue(deps);
  if (f?.kind === 'comment') {
    const [{ authorId }] = await deps.db.select({ authorId: entries.authorId }).from(entries).where(eq(entries.id, f.entryId));
    deps.notificationEvents.emit('unread', { userId: authorId, unread: await unreadCount(deps.db, authorId) });
  }
}

/** Tells the item's author of the decision, as "the moderators"; a failure is logged by the notifier, never undoing the decision. */
function tellAuthor(deps: ModerationActionDeps, f: TargetFacts, viewer: UserRow, kind: 'item-hidden' | 'item-restored', reason?: string) {
  return deps.notifier.notify({
    userId: f.authorId,
    kind,
    actor: viewer,
    byModerators: true,
    entry: { id: f.entryId, title: f.entryTitle },
    data: { itemKind: NAMES[f.kind], ...(reason ? { reason } : {}) },
  });
}

/** Hides the item (never deletes it), upholds its open reports; the reason is shown to its author. */
export async function hideItem(deps: ModerationActionDeps, viewer: UserRow, target: Target, reason: string): Promise<void> {
  const { facts, author } = await decidable(deps.db, target, viewer);
  if (facts.gone) throw new HttpError(409, 'gone', `This ${NAMES[target.kind]} was deleted by its author; dismiss the reports instead.`);
  if (facts.hiddenAt) throw new HttpError(409, 'already_hidden', `This ${NAMES[target.kind]} is hidden already.`);
  await deps.db.transaction(async (tx) => {
    await setHidden(tx, facts, { at: new Date(), reason });
    const closed = await closeReports(tx, target, 'upheld', viewer);
    await recordAudit(tx, auditOf(facts, viewer, author, 'item.hide', reason, closed));
  });
  await announce(deps, facts);
  await tellAuthor(deps, facts, viewer, 'item-hidden', reason);
}

/** Shows a hidden item again, as it was. */
export async function restoreItem(deps: ModerationActionDeps, viewer: UserRow, target: Target, note: string): Promise<void> {
  const { facts, author } = await decidable(deps.db, target, viewer);
  if (!facts.hiddenAt) throw new HttpError(409, 'not_hidden', `This ${NAMES[target.kind]} is not hidden.`);
  await deps.db.transaction(async (tx) => {
    await setHidden(tx, facts, null);
    await recordAudit(tx, auditOf(facts, viewer, author, 'item.restore', note, 0));
  });
  await announce(deps, facts);
  await tellAuthor(deps, facts, viewer, 'item-restored');
}

/** Closes the item's open reports without acting on it. */
export async function dismissReports(deps: ModerationActionDeps, viewer: UserRow, target: Target, note: string): Promise<void> {
  const facts = await loadTarget(deps.db, target);
  // A photo deleted by its uploader leaves only its reports: anyone at the desk may close them.
  const author = facts ? await findUserById(deps.db, facts.authorId) : undefined;
  requireMayAct(viewer, author);
  const label = facts ? labelOf(facts) : `a deleted ${NAMES[target.kind]}`;
  await deps.db.transaction(async (tx) => {
    const closed = await closeReports(tx, target, 'dismissed', viewer);
    if (!closed) throw new HttpError(409, 'no_open_reports', 'There are no open reports on this item.');
    await recordAudit(tx, {
      actor: viewer,
      action: 'report.dismiss',
      target: { kind: target.kind, id: target.id, label },
      subject: author ?? null,
      reason: note,
      details: { entryId: facts?.entryId ?? null, reports: closed },
    });
  });
  await announce(deps, undefined);
}

/** Admins: suspends the item's author through the same code path as the People page (sessions and sockets end at once). */
export async function suspendAuthor(deps: ModerationActionDeps, viewer: UserRow, target: Target, reason: string): Promise<void> {
  if (viewer.role !== 'admin') throw forbidden('Only admins suspend accounts.');
  const { facts, author } = await decidable(deps.db, target, viewer);
  if (author.suspendedAt) throw new HttpError(409, 'already_suspended', `${author.displayName} is suspended already.`);
  await changeAccount(deps.accounts, viewer, author.id, { suspended: true }, { reason, item: { kind: facts.kind, id: facts.id, label: labelOf(facts) } });
}
