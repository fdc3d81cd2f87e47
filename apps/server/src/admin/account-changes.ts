import { eq } from 'drizzle-orm';
import type { AdminUpdateUserBody, AuditTargetKind } from '@barwright/contracts';
import { users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import type { DatabaseSessionStore } from '../auth/session-store';
import { findUserById } from '../auth/users';
import { recordAudit } from '../audit/audit-log';
import { HttpError, notFound } from '../http/http-error';
import type { ModerationEvents } from '../moderation/moderation-events';

export interface AccountChangeDeps {
  db: Db;
  sessionStore: DatabaseSessionStore;
  /** Ends every open socket of the user (the realtime gateways provide it). */
  closeUserSockets: (userId: string) => void;
  /** Told of the change, so the moderation socket drops someone who lost the role. */
  moderationEvents?: ModerationEvents;
}

/** Why and on account of what (a reported item) the change is made; both go into the audit log. */
export interface AccountChangeContext {
  reason?: string;
  item?: { kind: AuditTargetKind; id: string; label: string };
  /** The change puts back what the previous one did (the People page's Undo). */
  undo?: boolean;
}

/**
 * Changes an account's role or suspension: the one code path behind `PATCH /api/admin/users/:id`
 * and the desk's "suspend the author". A suspension ends the account's sessions and sockets at
 * once; every change is written to the audit log in the same transaction as the change.
 */
export async function changeAccount(deps: AccountChangeDeps, actor: UserRow, targetId: string, body: Pick<AdminUpdateUserBody, 'role' | 'suspended'>, context: AccountChangeContext = {}): Promise<UserRow> {
  const target = await findUserById(deps.db, targetId);
  if (!target) throw notFound('user');
  // An admin cannot lock themselves out: another admin must do it.
  if (target.id === actor.id && ((body.role && body.role !== 'admin') || body.suspended)) {
    throw new HttpError(409, 'conflict', 'You cannot demote or suspend your own account; ask another admin.');
  }
  const changes: Partial<typeof users.$inferInsert> = {};
  if (body.role) changes.role = body.role;
  if (body.suspended !== undefined) changes.suspendedAt = body.suspended ? (target.suspendedAt ?? new Date()) : null;
  const row = await deps.db.transaction(async (tx) => {
    const [updated] = await tx.update(users).set(changes).where(eq(users.id, target.id)).returning();
    await auditChanges(tx, actor, target, updated, context);
    return updated;
  });
  if (body.suspended) {
    await deps.sessionStore.destroyUserSessions(target.id);
    deps.closeUserSockets(target.id);
  }
  deps.moderationEvents?.emit('account', { userId: row.id, role: row.role, suspended: Boolean(row.suspendedAt) });
  return row;
}

/** One audit line per real change (setting a role an account already has is no action). */
async function auditChanges(db: Db, actor: UserRow, before: UserRow, after: UserRow, context: AccountChangeContext) {
  const base = {
    actor,
    target: { kind: 'user' as const, id: after.id, label: after.displayName },
    subject: { id: after.id, displayName: after.displayName },
    reason: context.reason,
    details: { ...(context.item ? { item: context.item } : {}), ...(context.undo ? { undo: true } : {}) },
  };
  if (before.role !== after.role) await recordAudit(db, { ...base, action: 'user.role', details: { ...base.details, from: before.role, to: after.role } });
  if (!before.suspendedAt && after.suspendedAt) await recordAudit(db, { ...base, action: 'user.suspend' });
  if (before.suspendedAt && !after.suspendedAt) await recordAudit(db, { ...base, action: 'user.unsuspend' });
}
