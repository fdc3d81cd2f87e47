import { describe, expect, it } from 'vitest';
import { ENTRY_TAGS_MAX } from '@barwright/contracts';
import { addTags } from './tag-entry';

describe('addTags', () => {
  it('normalises a tag as the server stores it', () => {
    expect(addTags([], '  Basket Weave ')).toEqual({ tags: ['basket-weave'], problem: null });
  });

  it('takes several tags separated by commas and drops duplicates', () => {
    expect(addTags(['sine'], 'sine, barleycorn,,A2')).toEqual({ tags: ['sine', 'barleycorn', 'a2'], problem: null });
  });

  it('keeps the good tags and names the first one refused', () => {
    const entry = addTags([], 'moiré, fine');
    expect(entry.tags).toEqual(['fine']);
    expect(entry.problem).toBe('Tag “moiré” may hold only letters, digits and hyphens');
  });

  it('stops at the contract’s tag count', () => {
    const full = Array.from({ length: ENTRY_TAGS_MAX }, (_, i) => `t${i}`);
    expect(addTags(full, 'one-more')).toEqual({ tags: full, problem: `A bar takes at most ${ENTRY_TAGS_MAX} tags` });
  });
});
