import { describe, expect, it } from 'vitest';
import { countText, cutterText, ratingText } from './entry-facts';

describe('cutterText', () => {
  it('states the cutter in the reader’s units, inch = 25.4 mm exactly', () => {
    expect(cutterText(4.7625, 'mm')).toBe('4.76 mm');
    expect(cutterText(4.7625, 'in')).toBe('0.188 in (3/16)');
    expect(cutterText(6, 'mm')).toBe('6 mm');
  });
});

describe('ratingText', () => {
  it('shows the count beside the mean', () => {
    expect(ratingText({ count: 12, mean: 4.25 })).toBe('4.3 of 5 (12 ratings)');
    expect(ratingText({ count: 1, mean: 5 })).toBe('5.0 of 5 (1 rating)');
  });

  it('says so when nobody has rated', () => {
    expect(ratingText({ count: 0, mean: null })).toBe('No ratings yet');
  });
});

describe('countText', () => {
  it('counts with the right plural', () => {
    expect(countText(0, 'remix', 'remixes')).toBe('no remixes');
    expect(countText(1, 'remix', 'remixes')).toBe('1 remix');
    expect(countText(1200, 'comment')).toBe('1,200 comments');
  });
});
