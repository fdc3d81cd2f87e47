import * as z from 'zod';
import { emailSchema } from './auth';
import { designSchema } from './design';

export const BOARD_ROLES = ['owner', 'editor', 'viewer'] as const;
export type BoardRole = (typeof BOARD_ROLES)[number];
export const INVITE_ROLES = ['editor', 'viewer'] as const;
export const inviteRoleSchema = z.enum(INVITE_ROLES, { error: 'must be editor or viewer' });

export const BOARD_NAME_MAX = 80;
export const DESIGN_TITLE_MAX = 100;
export const VERSION_NAME_MAX = 80;

const name = (max: number) => z.string({ error: 'is required' }).trim().min(1, 'is required').max(max, `must be at most ${max} characters`);

export const createBoardBody = z.strictObject({ name: name(BOARD_NAME_MAX) });
export const updateBoardBody = z
  .strictObject({ name: name(BOARD_NAME_MAX).optional(), archived: z.boolean({ error: 'must be true or false' }).optional() })
  .refine((b) => b.name !== undefined || b.archived !== undefined, { message: 'give name or archived' });
export const inviteBody = z.strictObject({ email: emailSchema, role: inviteRoleSchema });
export const memberRoleBody = z.strictObject({ role: inviteRoleSchema });
export const acceptInvitationBody = z.strictObject({ token: z.string({ error: 'is required' }).min(16, 'is not a valid link').max(200, 'is not a valid link') });

export const DESIGN_PRESETS = ['blank', 'example', 'barleycorn', 'basket-weave', 'moire'] as const;
export type DesignPreset = (typeof DESIGN_PRESETS)[number];
/** A new design starts from a preset, or from a whole design file (an import); `file` wins when both are given. */
export const createDesignBody = z.strictObject({
  title: name(DESIGN_TITLE_MAX),
  preset: z.enum(DESIGN_PRESETS, { error: `must be one of ${DESIGN_PRESETS.join(', ')}` }).default('example'),
  file: designSchema.optional(),
});
export const updateDesignBody = z.strictObject({ title: name(DESIGN_TITLE_MAX) });
export const createVersionBody = z.strictObject({ name: name(VERSION_NAME_MAX) });

const boardRoleSchema = z.enum(BOARD_ROLES);

export const boardSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  role: boardRoleSchema,
  ownerName: z.string(),
  archived: z.boolean(),
  designCount: z.number().int(),
  updatedAt: z.string(),
});
export type BoardSummary = z.infer<typeof boardSummarySchema>;

export const boardMemberSchema = z.object({
  userId: z.string(),
  displayName: z.string(),
  /** Sent to the board's owners only: editors and viewers see names, not addresses. */
  email: z.string().optional(),
  role: boardRoleSchema,
});
export type BoardMember = z.infer<typeof boardMemberSchema>;

export const boardInvitationSchema = z.object({ id: z.string(), email: z.string(), role: inviteRoleSchema, expiresAt: z.string(), invitedBy: z.string() });
export type BoardInvitation = z.infer<typeof boardInvitationSchema>;

export const designSummarySchema = z.object({
  id: z.string(),
  boardId: z.string(),
  title: z.string(),
  updatedAt: z.string(),
  /** Set while a deleted design waits out its 30 days; restorable until `purgeAt`. */
  deletedAt: z.string().nullable(),
  purgeAt: z.string().nullable(),
});
export type DesignSummary = z.infer<typeof designSummarySchema>;

export const boardDetailSchema = boardSummarySchema.extend({
  members: z.array(boardMemberSchema),
  /** Open invitations; only the owner sees them. */
  invitations: z.array(boardInvitationSchema),
  designs: z.array(designSummarySchema),
});
export type BoardDetail = z.infer<typeof boardDetailSchema>;

export const boardListSchema = z.object({ mine: z.array(boardSummarySchema), shared: z.array(boardSummarySchema) });

export const designVersionSchema = z.object({ id: z.string(), name: z.string(), authorName: z.string(), createdAt: z.string() });
export type DesignVersion = z.infer<typeof designVersionSchema>;

/** `GET /api/designs/:id/meta`: what the editor needs besides the document. */
export const designMetaSchema = designSummarySchema.extend({ boardName: z.string(), role: boardRoleSchema });
export type DesignMeta = z.infer<typeof designMetaSchema>;
