import { describe, expect, it } from 'vitest';
import type { Notification } from '@barwright/contracts';
import { markedRead, mergeNotifications } from './notification-list';

const n = (id: string, createdAt: string, read = false): Notification => ({
  id, kind: 'remix', text: `n ${id}`, link: '/entries/x', actor: null, entryId: null, boardId: null, read, createdAt,
});

describe('mergeNotifications', () => {
  it('puts a live arrival on top and drops the copy REST also brought', () => {
    const list = [n('b', '2026-05-01T10:00:00Z'), n('a', '2026-05-01T09:00:00Z')];
    const merged = mergeNotifications(list, [n('c', '2026-05-01T11:00:00Z'), n('b', '2026-05-01T10:00:00Z')]);
    expect(merged.map((x) => x.id)).toEqual(['c', 'b', 'a']);
  });
});

describe('markedRead', () => {
  it('marks the given ones, or all', () => {
    const list = [n('a', '2026-05-01T09:00:00Z'), n('b', '2026-05-01T10:00:00Z')];
    expect(markedRead(list, ['a']).map((x) => x.read)).toEqual([true, false]);
    expect(markedRead(list).every((x) => x.read)).toBe(true);
  });
});
