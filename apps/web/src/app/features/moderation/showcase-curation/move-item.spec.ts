import { describe, expect, it } from 'vitest';
import { movedText, moveItem } from './move-item';

describe('moving a showcase entry', () => {
  it('moves up, down and by drag, clamped to the ends, without touching the original', () => {
    const list = ['a', 'b', 'c', 'd'];
    expect(moveItem(list, 2, 1)).toEqual(['a', 'c', 'b', 'd']);
    expect(moveItem(list, 0, 3)).toEqual(['b', 'c', 'd', 'a']);
    expect(moveItem(list, 0, -1)).toEqual(list);
    expect(moveItem(list, 3, 9)).toEqual(list);
    expect(moveItem(list, 7, 0)).toEqual(list);
    expect(list).toEqual(['a', 'b', 'c', 'd']);
  });

  it('says where it went, counting from one', () => {
    expect(movedText('Sine 24', 1, 5)).toBe('Sine 24 moved to position 2 of 5.');
  });
});
