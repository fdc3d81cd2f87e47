import { describe, expect, it } from 'vitest';
import { filtersFromParams, filtersToParams, hasFilters, localDayStart, NO_FILTERS } from './audit-filters';

const ID = '0b6f7c1e-4b4a-4d8e-9a53-2f1a3c5d7e90';

describe('the audit log filters', () => {
  it('read only well-formed values from the URL', () => {
    expect(filtersFromParams({ action: 'item.hide', actor: ID, kind: 'comment', item: 'nope', from: '2026-03-01', to: '14 March', page: '3' })).toEqual({
      ...NO_FILTERS, action: 'item.hide', actor: ID, kind: 'comment', from: '2026-03-01', page: 3,
    });
    expect(filtersFromParams({ action: 'delete', page: '-2' })).toEqual(NO_FILTERS);
  });

  it('write back only what is set; for the API, days become the local day’s bounds', () => {
    const f = { ...NO_FILTERS, action: 'item.hide' as const, from: '2026-03-01', to: '2026-03-14' };
    expect(filtersToParams(f)).toEqual({ action: 'item.hide', from: '2026-03-01', to: '2026-03-14' });
    const api = filtersToParams(f, true, 50);
    expect(new Date(api['from']).getTime()).toBe(localDayStart('2026-03-01').getTime());
    expect(new Date(api['to']).getTime()).toBe(localDayStart('2026-03-15').getTime() - 1);
    expect(api['pageSize']).toBe('50');
    expect(hasFilters(NO_FILTERS)).toBe(false);
    expect(hasFilters(f)).toBe(true);
  });
});
