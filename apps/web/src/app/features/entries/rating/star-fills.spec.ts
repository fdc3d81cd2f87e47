import { describe, expect, it } from 'vitest';
import { starFills, starsText } from './star-fills';

describe('starFills', () => {
  it('rounds the mean to the nearest half star', () => {
    expect(starFills(4.3)).toEqual(['full', 'full', 'full', 'full', 'half']);
    expect(starFills(4.2)).toEqual(['full', 'full', 'full', 'full', 'empty']);
    expect(starFills(1)).toEqual(['full', 'empty', 'empty', 'empty', 'empty']);
    expect(starFills(5)).toEqual(['full', 'full', 'full', 'full', 'full']);
  });

  it('fills nothing without ratings', () => {
    expect(starFills(null)).toEqual(['empty', 'empty', 'empty', 'empty', 'empty']);
  });
});

describe('starsText', () => {
  it('says star or stars', () => {
    expect(starsText(1)).toBe('1 star');
    expect(starsText(3)).toBe('3 stars');
  });
});
