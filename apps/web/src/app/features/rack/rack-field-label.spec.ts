import { describe, expect, it } from 'vitest';
import { rackFieldLabel } from './rack-field-label';
import { parseTags, rackTags } from './rack-tags';

describe('rackFieldLabel', () => {
  it('names a rack file field in words, lists counted from 1', () => {
    expect(rackFieldLabel('rosettes.2.rosette.layers.0.lobes')).toBe('Rosette 3, layer 1, lobes');
    expect(rackFieldLabel('shop.travels[1].leverRatio')).toBe('Shop, travel setting 2, lever ratio');
    expect(rackFieldLabel('rosette.baseRadius')).toBe('Rosette, base radius');
    expect(rackFieldLabel('format')).toBe('Format');
  });
});

describe('tags', () => {
  it('splits at commas, drops empties and repeats of any case', () => {
    expect(parseTags(' sine, Deep ,, deep,measured ')).toEqual(['sine', 'Deep', 'measured']);
    expect(parseTags('')).toEqual([]);
  });
  it('lists every tag once, sorted', () => {
    expect(rackTags([{ tags: ['b', 'a'] }, { tags: ['a', 'c'] }])).toEqual(['a', 'b', 'c']);
  });
});
