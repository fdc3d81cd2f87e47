import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { ExplorePage } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** `GET /api/entries`: one page of published bars for the filters, search and sort given. */
@Injectable({ providedIn: 'root' })
export class ExploreApi {
  private readonly http = inject(HttpClient);

  page(params: Record<string, string>): Promise<ExplorePage> {
    return firstValueFrom(this.http.get<ExplorePage>('/api/entries', { params }));
  }
}
