import { inject, Injectable, signal } from '@angular/core';
import type { EntryCard, ShowcaseItem } from '@barwright/contracts';
import { ShowcaseApi } from './showcase-api';

/** How many bars the home page's new and top-rated rows hold. */
export const ROW_LENGTH = 4;

/** The home page's bars: the showcase, then the newest and the top-rated (null while loading). */
@Injectable()
export class ShowcaseStore {
  private readonly api = inject(ShowcaseApi);
  private readonly featured = signal<readonly ShowcaseItem[] | null>(null);
  private readonly newestRow = signal<readonly EntryCard[] | null>(null);
  private readonly topRow = signal<readonly EntryCard[] | null>(null);

  readonly showcase = this.featured.asReadonly();
  readonly newest = this.newestRow.asReadonly();
  readonly top = this.topRow.asReadonly();

  /** Each part arrives on its own; one failing leaves the others standing. */
  load(): void {
    void this.api.showcase().then((s) => this.featured.set(s), () => this.featured.set([]));
    void this.api.row('newest', ROW_LENGTH).then((r) => this.newestRow.set(r), () => this.newestRow.set([]));
    void this.api.row('top', ROW_LENGTH).then((r) => this.topRow.set(r), () => this.topRow.set([]));
  }
}
