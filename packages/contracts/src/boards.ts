import * as z from 'zod';
import { emailSchema } from './auth';

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
export const createDesignBody = z.strictObject({
  title: name(DESIGN_TITLE_MAX),
  preset: z.enum(DESIGN_PRESETS, { error: `must be one of ${DESIGN_PRESETS.join(', ')}` }).default('example'),
});
export const updateDesignBody = z.strictObject({ title: name(DESIGN_TITLE_MAX) });
export const createVersionBody = z.strictObject({ name: name(VERSION_NAME_MAX) });

export interface BoardSummary {
  id: string;
  name: string;
  role: BoardRole;
  ownerName: string;
  archived: boolean;
  designCount: number;
  updatedAt: string;
}

export interface BoardMember {
  userId: string;
  displayName: string;
  email: string;
  role: BoardRole;
}

export interface BoardInvitation {
  id: string;
  email: string;
  role: 'editor' | 'viewer';
  expiresAt: string;
  invitedBy: string;
}

export interface DesignSummary {
  id: string;
  boardId: string;
  title: string;
  updatedAt: string;
  /** Set while a deleted design waits out its 30 days; restorable until `purgeAt`. */
  deletedAt: string | null;
  purgeAt: string | null;
}

export interface BoardDetail extends BoardSummary {
  members: BoardMember[];
  /** Open invitations; only the owner sees them. */
  invitations: BoardInvitation[];
  designs: DesignSummary[];
}

export interface DesignVersion {
  id: string;
  name: string;
  authorName: string;
  createdAt: string;
}

/** `GET /api/designs/:id/meta`: what the editor needs besides the document. */
export interface DesignMeta extends DesignSummary {
  boardName: string;
  role: BoardRole;
}
