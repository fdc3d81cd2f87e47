import type { CommentNode } from '@barwright/contracts';

/** May `userId` still edit this comment at `now`? Their own, not deleted, inside the server's edit window. */
export function canEdit(node: CommentNode, userId: string | null, now: Date): boolean {
  if (!userId || node.deleted || node.author?.id !== userId || !node.editableUntil) return false;
  return Date.parse(node.editableUntil) > now.getTime();
}

export function canDelete(node: CommentNode, userId: string | null): boolean {
  return !!userId && !node.deleted && node.author?.id === userId;
}

/** "editable for 12 more minutes", "editable for 1 more minute", or '' once the window has closed. */
export function editWindowText(node: CommentNode, now: Date): string {
  if (!node.editableUntil) return '';
  const minutes = Math.ceil((Date.parse(node.editableUntil) - now.getTime()) / 60_000);
  if (!(minutes > 0)) return '';
  return minutes === 1 ? 'editable for 1 more minute' : `editable for ${minutes} more minutes`;
}
