import { describe, expect, it } from 'vitest';
import { daysUntil, keptFor } from './bin-time';

const now = new Date('2026-03-01T12:00:00Z');

describe('daysUntil', () => {
  it('rounds a part day up, so the last day still counts', () => {
    expect(daysUntil('2026-03-31T12:00:00Z', now)).toBe(30);
    expect(daysUntil('2026-03-01T13:00:00Z', now)).toBe(1);
  });

  it('is 0 once the date has passed or cannot be read', () => {
    expect(daysUntil('2026-02-01T00:00:00Z', now)).toBe(0);
    expect(daysUntil('not a date', now)).toBe(0);
  });
});

describe('keptFor', () => {
  it('says how long the design stays restorable', () => {
    expect(keptFor('2026-03-31T12:00:00Z', now)).toBe('kept 30 more days');
    expect(keptFor('2026-03-02T11:00:00Z', now)).toBe('kept 1 more day');
    expect(keptFor('2026-02-27T00:00:00Z', now)).toBe('removed for good today');
  });
});
