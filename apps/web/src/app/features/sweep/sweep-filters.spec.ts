import { describe, expect, it } from 'vitest';
import type { CandidateFigures } from '@barwright/engine';
import { columnsFor, gridRows, NO_FILTER, shownIndices, type SweepLookup } from './sweep-filters';

const fig = (over: Partial<CandidateFigures>): CandidateFigures => ({
  period: 4,
  barHeight: 1,
  crestRadius: 3,
  cutterRadius: 1.5,
  crestBelowCutter: false,
  detailLoss: false,
  detailLost: 0,
  keeperMinutes: 30,
  ...over,
});

const figures: (CandidateFigures | null | undefined)[] = [
  fig({ period: 6 }),
  fig({ detailLoss: true, detailLost: 0.05, barHeight: 2 }),
  undefined,
  fig({ detailLoss: true, detailLost: 0.005, period: 2 }),
  null,
];
const tags = [['sine'], ['weave'], ['sine'], ['Measured'], ['sine']];
const look: SweepLookup = { count: 5, tags: (i) => tags[i], figures: (i) => figures[i] };

describe('shownIndices', () => {
  it('shows everything, uncomputed and refused included, with no filter', () => {
    expect(shownIndices(look, NO_FILTER, 'order')).toEqual([0, 1, 2, 3, 4]);
  });

  it('hides detail loss above the limit, and every loss at 0; then only computed candidates show', () => {
    expect(shownIndices(look, { ...NO_FILTER, maxLossMm: 0.01 }, 'order')).toEqual([0, 3]);
    expect(shownIndices(look, { ...NO_FILTER, maxLossMm: 0 }, 'order')).toEqual([0]);
  });

  it('keeps period and height within their ranges, ends included', () => {
    expect(shownIndices(look, { ...NO_FILTER, period: { min: 4, max: 6 } }, 'order')).toEqual([0, 1]);
    expect(shownIndices(look, { ...NO_FILTER, height: { min: 1.5, max: null } }, 'order')).toEqual([1]);
  });

  it('filters by the rosette tags in any case', () => {
    expect(shownIndices(look, { ...NO_FILTER, tags: ['measured', 'WEAVE'] }, 'order')).toEqual([1, 3]);
  });

  it('sorts by the figure, ties and uncomputed candidates in the chosen order at the end', () => {
    expect(shownIndices(look, NO_FILTER, 'loss')).toEqual([0, 3, 1, 2, 4]);
    expect(shownIndices(look, NO_FILTER, 'period')).toEqual([3, 1, 0, 2, 4]);
    expect(shownIndices(look, NO_FILTER, 'height')).toEqual([1, 0, 3, 2, 4]);
  });
});

describe('gridRows', () => {
  it('fills rows of the column count', () => {
    expect(gridRows([0, 1, 2, 3, 4], 2)).toEqual([
      { kind: 'cards', indices: [0, 1] },
      { kind: 'cards', indices: [2, 3] },
      { kind: 'cards', indices: [4] },
    ]);
  });

  it('groups under a heading row per group, in first-seen order', () => {
    const group = (i: number) => (i % 2 ? 'odd' : 'even');
    expect(gridRows([3, 0, 1, 2], 3, group)).toEqual([
      { kind: 'group', label: 'odd', count: 2 },
      { kind: 'cards', indices: [3, 1] },
      { kind: 'group', label: 'even', count: 2 },
      { kind: 'cards', indices: [0, 2] },
    ]);
  });
});

describe('columnsFor', () => {
  it('gives one column on a 360 px phone and several on a desktop', () => {
    expect(columnsFor(328)).toBe(1);
    expect(columnsFor(1200)).toBe(5);
  });
});
