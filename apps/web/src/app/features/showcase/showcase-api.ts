import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { ExplorePage, ShowcaseItem } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** What the home page shows: the showcase, and bars of Explore for its new and top-rated rows. */
@Injectable({ providedIn: 'root' })
export class ShowcaseApi {
  private readonly http = inject(HttpClient);

  showcase(): Promise<ShowcaseItem[]> {
    return firstValueFrom(this.http.get<ShowcaseItem[]>('/api/showcase'));
  }

  /** A short row of Explore in one order (`newest`, `top`). */
  async row(sort: 'newest' | 'top', count: number): Promise<ExplorePage['items']> {
    return (await firstValueFrom(this.http.get<ExplorePage>('/api/entries', { params: { sort, pageSize: String(count) } }))).items;
  }
}
