import { describe, expect, it } from 'vitest';
import { dateText, readerLocale } from './date-text';

describe('dateText', () => {
  const at = '2026-12-02T07:47:00Z';

  it('writes a day and a day with its time in one style per locale', () => {
    // Expected strings from the CLDR medium date and short time patterns (Intl, ICU).
    expect(dateText(at, 'en-US')).toBe('Dec 2, 2026');
    expect(dateText(at, 'en-GB')).toBe('2 Dec 2026');
    expect(dateText(at, 'de-DE')).toBe('02.12.2026');
    const withTime = dateText(at, 'en-US', 'time');
    expect(withTime.startsWith('Dec 2, 2026')).toBe(true);
    expect(withTime).toMatch(/\d{1,2}:47/);
  });

  it('leaves out missing and unreadable values', () => {
    expect(dateText(null, 'en-US')).toBe('');
    expect(dateText(undefined, 'en-US')).toBe('');
    expect(dateText('not a date', 'en-US')).toBe('');
  });

  it('takes the first usable browser language, else English', () => {
    expect(readerLocale(['en-GB', 'de'])).toBe('en-GB');
    expect(readerLocale(['not a tag!', 'fr-FR'])).toBe('fr-FR');
    expect(readerLocale(undefined)).toBe('en');
    expect(readerLocale([])).toBe('en');
  });
});
