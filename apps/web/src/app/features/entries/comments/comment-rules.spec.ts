import { describe, expect, it } from 'vitest';
import type { CommentNode } from '@barwright/contracts';
import { canDelete, canEdit, editWindowText } from './comment-rules';

const now = new Date('2026-05-01T10:00:00Z');
const node = (over: Partial<CommentNode> = {}): CommentNode => ({
  id: 'c1',
  parentId: null,
  author: { id: 'u1', displayName: 'Maren' },
  body: 'Lovely crest',
  deleted: false,
  createdAt: '2026-05-01T09:55:00Z',
  editedAt: null,
  editableUntil: '2026-05-01T10:10:00Z',
  replies: [],
  ...over,
});

describe('canEdit', () => {
  it('lets the author edit inside the window only', () => {
    expect(canEdit(node(), 'u1', now)).toBe(true);
    expect(canEdit(node({ editableUntil: '2026-05-01T09:59:59Z' }), 'u1', now)).toBe(false);
  });

  it('refuses others, visitors and deleted comments', () => {
    expect(canEdit(node(), 'u2', now)).toBe(false);
    expect(canEdit(node(), null, now)).toBe(false);
    expect(canEdit(node({ deleted: true, author: null, body: null, editableUntil: null }), 'u1', now)).toBe(false);
  });
});

describe('canDelete', () => {
  it('is for the author of a comment still there', () => {
    expect(canDelete(node(), 'u1')).toBe(true);
    expect(canDelete(node(), 'u2')).toBe(false);
    expect(canDelete(node({ deleted: true }), 'u1')).toBe(false);
  });
});

describe('editWindowText', () => {
  it('counts the minutes left, rounding up', () => {
    expect(editWindowText(node(), now)).toBe('editable for 10 more minutes');
    expect(editWindowText(node({ editableUntil: '2026-05-01T10:00:30Z' }), now)).toBe('editable for 1 more minute');
    expect(editWindowText(node({ editableUntil: '2026-05-01T09:00:00Z' }), now)).toBe('');
  });
});
