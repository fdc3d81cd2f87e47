import { computed, inject, Injectable, signal } from '@angular/core';
import type { ExplorePage } from '@barwright/contracts';
import { ApiError } from '../../core/http/api-error';
import { ExploreApi } from './explore-api';
import { apiParamsFromState, type ExploreState } from './explore-state';

/** The Explore page's results: the newest page asked for wins; an older answer arriving late is dropped. */
@Injectable()
export class ExploreStore {
  private readonly api = inject(ExploreApi);
  private readonly current = signal<ExplorePage | null>(null);
  private readonly inFlight = signal(false);
  private readonly refusal = signal<string | null>(null);
  private asked = 0;

  readonly page = this.current.asReadonly();
  readonly loading = this.inFlight.asReadonly();
  /** What the server refused in the query, in its words (a hand-edited URL, for instance). */
  readonly problem = this.refusal.asReadonly();
  readonly items = computed(() => this.current()?.items ?? []);
  readonly total = computed(() => this.current()?.total ?? 0);

  async load(state: ExploreState): Promise<void> {
    const ticket = ++this.asked;
    this.inFlight.set(true);
    try {
      const page = await this.api.page(apiParamsFromState(state));
      if (ticket !== this.asked) return;
      this.current.set(page);
      this.refusal.set(null);
    } catch (error) {
      if (ticket !== this.asked) return;
      if (error instanceof ApiError && error.status === 400) {
        const fields = Object.entries(error.fields).map(([k, v]) => `${k} ${v}`);
        this.refusal.set(fields.length ? fields.join('; ') : error.message);
        this.current.set(null);
        return;
      }
      throw error;
    } finally {
      if (ticket === this.asked) this.inFlight.set(false);
    }
  }
}
