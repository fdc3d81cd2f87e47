import { describe, expect, it } from 'vitest';
import { showcaseColumns } from './showcase-columns';

describe('showcaseColumns', () => {
  it('fills rows so no card is left alone in a wide row', () => {
    expect([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11].map((n) => showcaseColumns(n))).toEqual([1, 2, 3, 4, 3, 4, 4, 4, 3, 4, 4]);
  });
  it('keeps to the columns allowed', () => {
    expect(showcaseColumns(3, 2)).toBe(2);
    expect(showcaseColumns(0)).toBe(1);
  });
});
