import { describe, expect, it } from 'vitest';
import { activeFilterCount, apiParamsFromState, EXPLORE_DEFAULTS, paramsFromState, stateFromParams, withChange } from './explore-state';

const AUTHOR = '3f1c2a4e-8b9d-4c1e-9f00-1a2b3c4d5e6f';

describe('stateFromParams', () => {
  it('reads every filter from the URL with the contract’s own rules', () => {
    const s = stateFromParams({ q: 'weave', lobes: '24', wave: 'sine', material: 'a2', schedule: 'ramp', cutterMin: '3', cutterMax: '6.35', tags: 'basket-weave,fine', author: AUTHOR, sort: 'top', page: '3', pageSize: '48', view: 'table' });
    expect(s).toEqual({ q: 'weave', lobes: 24, wave: 'sine', material: 'a2', schedule: 'ramp', cutterMin: 3, cutterMax: 6.35, tags: ['basket-weave', 'fine'], author: AUTHOR, sort: 'top', page: 3, pageSize: 48, view: 'table' });
  });

  it('drops what the server would refuse instead of failing the page', () => {
    const s = stateFromParams({ lobes: '0', wave: 'zigzag', material: 'wood', schedule: 'spiral', cutterMin: '-1', author: 'maren', page: 'two', pageSize: '500', view: 'cards' });
    expect(s).toEqual(EXPLORE_DEFAULTS);
  });

  it('takes repeated tags and ignores relevance without a search', () => {
    expect(stateFromParams({ tags: ['a2', 'fine'] }).tags).toEqual(['a2', 'fine']);
    expect(stateFromParams({ sort: 'relevance' }).sort).toBeNull();
    expect(stateFromParams({ sort: 'relevance', q: 'sine' }).sort).toBe('relevance');
  });
});

describe('paramsFromState', () => {
  it('leaves defaults out of the URL, so a plain Explore link stays plain', () => {
    expect(Object.values(paramsFromState(EXPLORE_DEFAULTS)).every((v) => v === null)).toBe(true);
  });

  it('round-trips through the URL', () => {
    const s = { ...EXPLORE_DEFAULTS, q: 'moiré', lobes: 36, tags: ['fine'], sort: 'remixed' as const, page: 2, view: 'table' as const };
    const url = Object.fromEntries(Object.entries(paramsFromState(s)).filter(([, v]) => v !== null)) as Record<string, string>;
    expect(stateFromParams(url)).toEqual(s);
  });

  it('does not send the layout to the server', () => {
    expect(apiParamsFromState({ ...EXPLORE_DEFAULTS, view: 'table', wave: 'pointed' })).toEqual({ wave: 'pointed' });
  });
});

describe('withChange', () => {
  it('starts a new filter or search at page 1', () => {
    expect(withChange({ ...EXPLORE_DEFAULTS, page: 4 }, { lobes: 12 }).page).toBe(1);
    expect(withChange({ ...EXPLORE_DEFAULTS, page: 4 }, { q: 'sine' }).page).toBe(1);
  });

  it('keeps the page when only the page or the layout changes', () => {
    expect(withChange({ ...EXPLORE_DEFAULTS, page: 4 }, { view: 'table' }).page).toBe(4);
    expect(withChange(EXPLORE_DEFAULTS, { page: 3 }).page).toBe(3);
  });

  it('drops relevance when the search is cleared', () => {
    expect(withChange({ ...EXPLORE_DEFAULTS, q: 'sine', sort: 'relevance' }, { q: '' }).sort).toBeNull();
  });
});

describe('activeFilterCount', () => {
  it('counts the filters set, tags as one', () => {
    expect(activeFilterCount(EXPLORE_DEFAULTS)).toBe(0);
    expect(activeFilterCount({ ...EXPLORE_DEFAULTS, lobes: 3, tags: ['a', 'b'], q: 'x' })).toBe(2);
  });
});
