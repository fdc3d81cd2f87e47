import * as z from 'zod';
import { dayOrInstant } from './instant';

/**
 * The audit log: every moderation and role action — who, what, which item, why, when. Append-only.
 *   GET /api/moderation/audit?action=&actor=&from=&to=&kind=&item=&page=&pageSize=  → AuditPage (newest first)
 *   GET /api/moderation/audit/actors                                                 → PersonRef[] (who appears as actor)
 * Moderators and admins only. No route changes or removes an entry.
 */
export const AUDIT_ACTIONS = [
  'report.dismiss',
  'item.hide',
  'item.restore',
  'user.suspend',
  'user.unsuspend',
  'user.role',
  'showcase.feature',
  'showcase.unfeature',
  'showcase.note',
  'showcase.reorder',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

/** How the log names each action (past tense, for a line of the log). */
export const AUDIT_ACTION_LABELS: Record<AuditAction, string> = {
  'report.dismiss': 'dismissed the reports',
  'item.hide': 'hid',
  'item.restore': 'restored',
  'user.suspend': 'suspended',
  'user.unsuspend': 'lifted the suspension of',
  'user.role': 'changed the role of',
  'showcase.feature': 'featured',
  'showcase.unfeature': 'took out of the showcase',
  'showcase.note': "edited the curator's note of",
  'showcase.reorder': 'reordered the showcase',
};

export const AUDIT_TARGET_KINDS = ['entry', 'comment', 'photo', 'user', 'showcase'] as const;
export type AuditTargetKind = (typeof AUDIT_TARGET_KINDS)[number];

export const AUDIT_PAGE_SIZE_MAX = 100;

/** A day (YYYY-MM-DD, UTC) or an exact time (ISO 8601 with offset). */
const instant = dayOrInstant();
const intParam = (min: number, max: number) =>
  z.coerce.number({ error: 'must be a number' }).int('must be a whole number').min(min, `must be at least ${min}`).max(max, `must be at most ${max}`);

/**
 * `GET /api/moderation/audit` query. `from` and `to` are inclusive: a bare date `to` takes in
 * that whole day (UTC). `item` is the id of the entry, comment, photo or account acted on.
 */
export const auditQuery = z
  .strictObject({
    action: z.enum(AUDIT_ACTIONS, { error: `must be one of ${AUDIT_ACTIONS.join(', ')}` }).optional(),
    actor: z.uuid('must be a user id').optional(),
    kind: z.enum(AUDIT_TARGET_KINDS, { error: `must be one of ${AUDIT_TARGET_KINDS.join(', ')}` }).optional(),
    item: z.uuid('must be an id').optional(),
    from: instant.optional(),
    to: instant.optional(),
    page: intParam(1, 10_000).default(1),
    pageSize: intParam(1, AUDIT_PAGE_SIZE_MAX).default(50),
  })
  .refine((q) => !q.from || !q.to || q.from.slice(0, 10) <= q.to.slice(0, 10), { path: ['to'], message: 'must not be before from' });
export type AuditQuery = z.output<typeof auditQuery>;
export type AuditQueryInput = z.input<typeof auditQuery>;

const personSchema = z.object({ id: z.string(), displayName: z.string() });

export const auditEntrySchema = z.object({
  id: z.string(),
  /** When (ISO 8601). */
  at: z.string(),
  /** Who acted; `id` null for the command line. */
  actor: z.object({ id: z.string().nullable(), displayName: z.string() }),
  action: z.enum(AUDIT_ACTIONS),
  /** What was acted on; `label` is its title or name at the time. */
  target: z.object({ kind: z.enum(AUDIT_TARGET_KINDS), id: z.string().nullable(), label: z.string() }),
  /** Whom it concerns: the item's author, or the account changed. */
  subject: personSchema.nullable(),
  reason: z.string().nullable(),
  /**
   * Particulars of the action: `{ from, to }` of a role, `reports` closed, `entryId` of a comment or photo;
   * for a reorder `moves` ({ entryId, title, from, to }, places counted from 1) and the new `order`.
   */
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditPageSchema = z.object({
  items: z.array(auditEntrySchema),
  /** With the `item` filter: that item as the log last named it (its title), or null when no line is about it. */
  item: z.object({ id: z.string(), kind: z.enum(AUDIT_TARGET_KINDS), label: z.string() }).nullable().optional(),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type AuditPage = z.infer<typeof auditPageSchema>;

export const auditActorsSchema = z.array(personSchema);
