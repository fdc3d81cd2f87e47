/** How much of an instant to show: the day, or the day and the time of day. */
export type DateStyle = 'date' | 'time';

const formats = new Map<string, Intl.DateTimeFormat>();

/** One formatter per locale and style, built once (Intl formatters are costly to create). */
function formatter(locale: string, style: DateStyle): Intl.DateTimeFormat {
  const key = `${locale}|${style}`;
  let f = formats.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, style === 'date' ? { dateStyle: 'medium' } : { dateStyle: 'medium', timeStyle: 'short' });
    formats.set(key, f);
  }
  return f;
}

/**
 * Every date the app shows, in the reader's locale and one style: "2 Dec 2026" / "Dec 2, 2026",
 * with the time "2 Dec 2026, 07:47". Empty for a missing or unreadable value (pure).
 */
export function dateText(value: string | number | Date | null | undefined, locale: string, style: DateStyle = 'date'): string {
  if (value === null || value === undefined || value === '') return '';
  const date = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(date.getTime())) return '';
  return formatter(locale, style).format(date);
}

/** The reader's locale as the browser states it, else English. */
export function readerLocale(languages: readonly string[] | undefined): string {
  for (const tag of languages ?? []) {
    try {
      return Intl.DateTimeFormat.supportedLocalesOf(tag)[0] ?? tag;
    } catch {
      // a malformed tag: try the next one
    }
  }
  return 'en';
}
