import { describe, expect, it } from 'vitest';
import { mapPosition, textSplice } from './text-change';

describe('textSplice', () => {
  it('is null when nothing changed', () => {
    expect(textSplice('rosette', 'rosette')).toBeNull();
  });

  it('finds typing, deleting and pasting over a selection', () => {
    expect(textSplice('cut in A2', 'cut it in A2', 7)).toEqual({ index: 4, remove: 0, insert: 'it ' });
    expect(textSplice('cut in A2', 'cut A2', 4)).toEqual({ index: 4, remove: 3, insert: '' });
    expect(textSplice('24 lobes', '30 lobes', 2)).toEqual({ index: 0, remove: 2, insert: '30' });
  });

  it('uses the caret to place a repeated character', () => {
    expect(textSplice('aa', 'aaa', 3)).toEqual({ index: 2, remove: 0, insert: 'a' });
    expect(textSplice('aa', 'aaa', 1)).toEqual({ index: 0, remove: 0, insert: 'a' });
  });

  it('applies back to the same text', () => {
    const before = 'Trial in acrylic first.';
    const after = 'Trial cut in acrylic, then A2.';
    const s = textSplice(before, after)!;
    expect(before.slice(0, s.index) + s.insert + before.slice(s.index + s.remove)).toBe(after);
  });
});

describe('mapPosition', () => {
  it('moves the caret past text inserted before it and keeps it before text inserted after it', () => {
    expect(mapPosition(5, [{ insert: 'abc' }])).toBe(8);
    expect(mapPosition(5, [{ retain: 7 }, { insert: 'abc' }])).toBe(5);
  });

  it('pulls the caret back for deletions before it, to the start of a deletion around it', () => {
    expect(mapPosition(10, [{ retain: 2 }, { delete: 3 }])).toBe(7);
    expect(mapPosition(4, [{ retain: 2 }, { delete: 5 }])).toBe(2);
  });

  it('keeps the caret in place for an insertion exactly at it from someone else typing ahead', () => {
    expect(mapPosition(5, [{ retain: 5 }, { insert: 'x' }])).toBe(5);
  });
});
