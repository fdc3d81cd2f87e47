import * as z from 'zod';
import { ROLES } from './auth';
import { auditEntrySchema } from './audit';

/**
 * Reports and the moderation desk.
 *   POST /api/reports                                    NewReportBody → 201 Report (signed in; 409 one open report per member per item; 429 too many)
 *   GET  /api/moderation/queue                           → ModerationQueue (open reports grouped by item, oldest waiting first)
 *   GET  /api/moderation/hidden                          → ModerationCase[] (items hidden now, last hidden first)
 *   GET  /api/moderation/items/:kind/:id                 → ModerationCase
 *   POST /api/moderation/items/:kind/:id/dismiss         DismissBody → ModerationCase (closes the open reports; 409 when there are none)
 *   POST /api/moderation/items/:kind/:id/hide            HideBody → ModerationCase (the reason is shown to the author; 409 already hidden)
 *   POST /api/moderation/items/:kind/:id/restore         RestoreBody → ModerationCase (409 not hidden)
 *   POST /api/moderation/items/:kind/:id/suspend-author  SuspendAuthorBody → ModerationCase (admins)
 * Moderators and admins only, except the report itself. Nobody acts on their own content, and
 * moderators do not act on an admin's (403). Hiding never deletes: a hidden item answers 404 to
 * everyone but its author (who sees it with the reason) and the moderators (who see it labelled).
 */
export const REPORT_TARGET_KINDS = ['entry', 'comment', 'photo'] as const;
export type ReportTargetKind = (typeof REPORT_TARGET_KINDS)[number];

export const REPORT_REASONS = ['spam', 'unsafe', 'not_their_work', 'offensive', 'other'] as const;
export type ReportReason = (typeof REPORT_REASONS)[number];
export const REPORT_REASON_LABELS: Record<ReportReason, string> = {
  spam: 'Spam',
  unsafe: 'Unsafe practice',
  not_their_work: 'Not their work',
  offensive: 'Offensive',
  other: 'Other',
};

export const REPORT_DETAILS_MAX = 1000;
export const MODERATION_REASON_MAX = 500;
/** Default per-member pace of reports (the server's setting may differ). */
export const REPORTS_PER_HOUR = 20;

export const reportTargetSchema = z.strictObject({
  kind: z.enum(REPORT_TARGET_KINDS, { error: `must be one of ${REPORT_TARGET_KINDS.join(', ')}` }),
  id: z.uuid('must be an id'),
});
export type ReportTarget = z.infer<typeof reportTargetSchema>;

export const newReportBody = z
  .strictObject({
    target: reportTargetSchema,
    reason: z.enum(REPORT_REASONS, { error: `must be one of ${REPORT_REASONS.join(', ')}` }),
    details: z.string({ error: 'must be text' }).trim().max(REPORT_DETAILS_MAX, `must be at most ${REPORT_DETAILS_MAX} characters`).default(''),
  })
  .refine((b) => b.reason !== 'other' || b.details.length > 0, { path: ['details'], message: 'is required when the reason is other: say what is wrong' });
export type NewReportBody = z.input<typeof newReportBody>;

const reason = z
  .string({ error: 'is required' })
  .trim()
  .min(1, 'is required')
  .max(MODERATION_REASON_MAX, `must be at most ${MODERATION_REASON_MAX} characters`);
const note = z.string({ error: 'must be text' }).trim().max(MODERATION_REASON_MAX, `must be at most ${MODERATION_REASON_MAX} characters`).default('');

/** The reason is shown to the author beside the hidden item. */
export const hideBody = z.strictObject({ reason });
export const dismissBody = z.strictObject({ note });
export const restoreBody = z.strictObject({ note });
export const suspendAuthorBody = z.strictObject({ reason });
export type HideBody = z.input<typeof hideBody>;
export type DismissBody = z.input<typeof dismissBody>;
export type RestoreBody = z.input<typeof restoreBody>;
export type SuspendAuthorBody = z.input<typeof suspendAuthorBody>;

export const REPORT_STATUSES = ['open', 'dismissed', 'upheld'] as const;

/** `POST /api/reports`: the report as filed. */
export const reportSchema = z.object({
  id: z.string(),
  target: reportTargetSchema,
  reason: z.enum(REPORT_REASONS),
  details: z.string(),
  status: z.enum(REPORT_STATUSES),
  createdAt: z.string(),
});
export type Report = z.infer<typeof reportSchema>;

/** The item a case is about, shown in its context. */
export const moderationItemSchema = z.object({
  target: reportTargetSchema,
  /** The entry it belongs to (itself for an entry) and that entry's title. */
  entryId: z.string(),
  entryTitle: z.string(),
  author: z.object({ id: z.string(), displayName: z.string(), role: z.enum(ROLES), suspended: z.boolean() }),
  /** The comment's text, the photo's caption, or the entry's description (plain text). */
  excerpt: z.string(),
  /** The entry's line-study thumbnail or the photo's thumbnail. */
  thumbnailUrl: z.string().nullable(),
  /** Where the web app shows it. */
  link: z.string(),
  createdAt: z.string(),
  hidden: z.boolean(),
  hiddenReason: z.string().nullable(),
  hiddenAt: z.string().nullable(),
  /** Deleted by its author since (nothing left to act on). */
  gone: z.boolean(),
});
export type ModerationItem = z.infer<typeof moderationItemSchema>;

export const caseReportSchema = z.object({
  id: z.string(),
  reason: z.enum(REPORT_REASONS),
  details: z.string(),
  status: z.enum(REPORT_STATUSES),
  createdAt: z.string(),
  resolvedAt: z.string().nullable(),
  /** Who reported, with how many reports they have filed in all and how many of those were upheld. */
  reporter: z.object({ id: z.string(), displayName: z.string(), reportsFiled: z.number().int(), reportsUpheld: z.number().int() }),
});
export type CaseReport = z.infer<typeof caseReportSchema>;

export const moderationCaseSchema = z.object({
  item: moderationItemSchema,
  openReports: z.array(caseReportSchema),
  /** Reports closed before, newest first. */
  earlierReports: z.array(caseReportSchema),
  /** The audit log's lines about this item, newest first. */
  actions: z.array(auditEntrySchema),
  /** What the viewer may do here; `why` says why not. */
  canAct: z.object({ act: z.boolean(), suspend: z.boolean(), why: z.string().nullable() }),
});
export type ModerationCase = z.infer<typeof moderationCaseSchema>;

export const moderationQueueSchema = z.object({
  cases: z.array(moderationCaseSchema),
  /** Open reports in all (the cases' openReports summed). */
  openReports: z.number().int(),
});
export type ModerationQueue = z.infer<typeof moderationQueueSchema>;

export const hiddenListSchema = z.array(moderationCaseSchema);

/**
 * The desk's live socket: the socket.io namespace MODERATION_NAMESPACE on the notification
 * socket's path. Only moderators and admins connect (else `connect_error` with a
 * MODERATION_REFUSALS message); when the role is removed or the account suspended, the server
 * ends the socket at once.
 */
export const MODERATION_NAMESPACE = '/moderation';
export const MODERATION_REFUSALS = { unauthorized: 'unauthorized', forbidden: 'forbidden' } as const;

export interface ModerationServerEvents {
  /** The number of open reports: once on connecting, then whenever it changes. */
  'moderation:queue': (openReports: number) => void;
}
export interface ModerationClientEvents {}
