import { DOCUMENT } from '@angular/common';
import { inject, InjectionToken, Pipe, PipeTransform } from '@angular/core';
import { dateText, readerLocale, type DateStyle } from './date-text';

/** The member's locale for dates: the browser's languages, in their order. */
export const READER_LOCALE = new InjectionToken<string>('READER_LOCALE', {
  providedIn: 'root',
  factory: () => {
    const nav = inject(DOCUMENT).defaultView?.navigator;
    return readerLocale(nav?.languages?.length ? nav.languages : nav?.language ? [nav.language] : undefined);
  },
});

/** `{{ at | dateText }}` → "2 Dec 2026"; `{{ at | dateText: 'time' }}` → "2 Dec 2026, 07:47" (the reader's locale). */
@Pipe({ name: 'dateText' })
export class DateTextPipe implements PipeTransform {
  private readonly locale = inject(READER_LOCALE);

  transform(value: string | number | Date | null | undefined, style: DateStyle = 'date'): string {
    return dateText(value, this.locale, style);
  }
}
