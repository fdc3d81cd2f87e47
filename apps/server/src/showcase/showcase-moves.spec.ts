import { describe, expect, it } from 'vitest';
import { showcaseMoves } from './showcase-moves';

const titles = new Map([['a', 'Sine 24'], ['b', 'Basket'], ['c', 'Moiré'], ['d', 'Flat 12']]);

describe('showcase moves', () => {
  it('name the one entry a drag or an arrow moved, with its places counted from 1', () => {
    expect(showcaseMoves(['a', 'b', 'c', 'd'], ['c', 'a', 'b', 'd'], titles)).toEqual([{ entryId: 'c', title: 'Moiré', from: 3, to: 1 }]);
    expect(showcaseMoves(['a', 'b', 'c', 'd'], ['b', 'c', 'd', 'a'], titles)).toEqual([{ entryId: 'a', title: 'Sine 24', from: 1, to: 4 }]);
  });

  it('take a swap of neighbours as one move (either entry reads the same; the first is named)', () => {
    expect(showcaseMoves(['a', 'b', 'c'], ['b', 'a', 'c'], titles)).toEqual([{ entryId: 'b', title: 'Basket', from: 2, to: 1 }]);
    // …unless the curator says which they moved: "move Sine 24 down".
    expect(showcaseMoves(['a', 'b', 'c'], ['b', 'a', 'c'], titles, 'a')).toEqual([{ entryId: 'a', title: 'Sine 24', from: 1, to: 2 }]);
    // A claim no single move bears out is not believed.
    expect(showcaseMoves(['a', 'b', 'c', 'd'], ['c', 'a', 'b', 'd'], titles, 'a')).toEqual([{ entryId: 'c', title: 'Moiré', from: 3, to: 1 }]);
  });

  it('list every entry that changed place when no single move explains the new order, and nothing when it is the same', () => {
    expect(showcaseMoves(['a', 'b', 'c', 'd'], ['b', 'a', 'd', 'c'], titles)).toEqual([
      { entryId: 'b', title: 'Basket', from: 2, to: 1 },
      { entryId: 'a', title: 'Sine 24', from: 1, to: 2 },
      { entryId: 'd', title: 'Flat 12', from: 4, to: 3 },
      { entryId: 'c', title: 'Moiré', from: 3, to: 4 },
    ]);
    expect(showcaseMoves(['a', 'b'], ['a', 'b'], titles)).toEqual([]);
  });
});
