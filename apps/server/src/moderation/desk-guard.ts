import type { RequestHandler } from 'express';
import { requireRole } from '../admin/admin-router';

/**
 * Everything under /api/moderation (the desk, the showcase curation, the audit log) is for
 * moderators and admins: 401 signed out, 403 otherwise. The role is read from the database on
 * every request (passport's deserializeUser), so a role removed takes effect at once.
 */
export const DESK_PATH = '/moderation';
export const deskOnly: RequestHandler = requireRole('moderator', 'admin');
