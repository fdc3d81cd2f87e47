import { describe, expect, it } from 'vitest';
import { ENTRY_TITLE_MAX } from '@barwright/contracts';
import { publishStart } from './publish-start';

describe('publishStart', () => {
  it('starts a first publish from the design title, cut to the entry title limit', () => {
    const start = publishStart({ designId: 'd', title: 'x'.repeat(ENTRY_TITLE_MAX + 5) }, null);
    expect(start).toEqual({ title: 'x'.repeat(ENTRY_TITLE_MAX), description: '', tags: [], revision: null });
  });

  it('starts a republish from the entry’s words and names the revision it adds', () => {
    const link = { entryId: 'e', title: 'Guild sine', description: 'Cut in A2.', tags: ['barleycorn', 'a2'], latestRevision: 2 };
    const start = publishStart({ designId: 'd', title: 'Sine for the guild' }, link);
    expect(start).toEqual({ title: 'Guild sine', description: 'Cut in A2.', tags: ['barleycorn', 'a2'], revision: { next: 3, entryTitle: 'Guild sine' } });
    start.tags.push('moire');
    expect(link.tags).toEqual(['barleycorn', 'a2']);
  });
});
