import type { AuditAction, AuditEntry, AuditTargetKind } from '@barwright/contracts';
import { auditLog, type AuditRow } from '../../../../db/schema';
import type { Db } from '../database/database';

/** The name the log gives to actions taken outside the app. */
export const COMMAND_LINE_ACTOR = 'command line';

export interface AuditInput {
  /** Who acted; null for the command line. */
  actor: { id: string; displayName: string } | null;
  action: AuditAction;
  target: { kind: AuditTargetKind; id: string | null; label: string };
  /** Whom it concerns: the item's author, or the account changed. */
  subject?: { id: string; displayName: string } | null;
  reason?: string | null;
  details?: Record<string, unknown>;
}

/**
 * Appends one line to the audit log. This is the only write the log ever gets: there is no
 * update or delete of it anywhere in the server, and the database refuses both (migration 0003).
 * Pass the transaction of the action itself, so the action and its line land together or not at all.
 */
export async function recordAudit(db: Db, input: AuditInput): Promise<AuditRow> {
  const [row] = await db
    .insert(auditLog)
    .values({
      actorId: input.actor?.id ?? null,
      actorName: input.actor?.displayName ?? COMMAND_LINE_ACTOR,
      action: input.action,
      targetKind: input.target.kind,
      targetId: input.target.id,
      targetLabel: input.target.label,
      subjectId: input.subject?.id ?? null,
      subjectName: input.subject?.displayName ?? null,
      reason: input.reason || null,
      details: input.details ?? {},
    })
    .returning();
  return row;
}

export const toAuditEntry = (row: AuditRow): AuditEntry => ({
  id: row.id,
  at: row.at.toISOString(),
  actor: { id: row.actorId, displayName: row.actorName },
  action: row.action as AuditAction,
  target: { kind: row.targetKind, id: row.targetId, label: row.targetLabel },
  subject: row.subjectId ? { id: row.subjectId, displayName: row.subjectName ?? '' } : null,
  reason: row.reason,
  details: row.details,
});
