import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, Router } from '@angular/router';
import { exploreQuery, type ExploreSort } from '@barwright/contracts';
import { debounceTime, distinctUntilChanged, map } from 'rxjs';
import { AuthStore } from '../../../core/auth/auth-store';
import { EntryCard } from '../../../shared/entry-card/entry-card';
import { countText } from '../../../shared/entry-facts/entry-facts';
import { fieldMessage } from '../../../shared/forms/field-message';
import { ExploreFilters } from '../explore-filters/explore-filters';
import { optionalContract } from '../explore-filters/optional-contract';
import { activeFilterCount, PAGE_SIZES, paramsFromState, stateFromParams, withChange, type ExploreState } from '../explore-state';
import { ExploreStore } from '../explore-store';
import { ExploreTable } from '../explore-table/explore-table';
import { ComparePick } from '../compare-tray/compare-pick';
import { CompareTray } from '../compare-tray/compare-tray';

const SORT_LABELS: Record<ExploreSort, string> = {
  relevance: 'Best match',
  top: 'Top rated',
  newest: 'Newest',
  remixed: 'Most remixed',
  discussed: 'Most discussed',
  schedule: 'Phase schedule',
};

/** Explore: every published bar, filtered, searched, sorted and paged on the server; the query lives in the URL. */
@Component({
  selector: 'bw-explore-page',
  imports: [
    ReactiveFormsModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule, MatPaginatorModule,
    MatProgressBarModule, MatSelectModule, EntryCard, ExploreFilters, ExploreTable, ComparePick, CompareTray,
  ],
  providers: [ExploreStore],
  templateUrl: './explore-page.html',
  styleUrl: './explore-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExplorePage {
  protected readonly store = inject(ExploreStore);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly auth = inject(AuthStore);

  private readonly params = toSignal(this.route.queryParamMap.pipe(map((p) => Object.fromEntries(p.keys.map((k) => [k, p.getAll(k)])))), { initialValue: {} });
  protected readonly state = computed(() => stateFromParams(this.params()));
  protected readonly units = computed(() => this.auth.me()?.units ?? 'mm');
  protected readonly search = new FormControl('', { nonNullable: true, validators: optionalContract(exploreQuery.shape.q) });
  protected readonly filtersOpen = signal(false);
  protected readonly filterCount = computed(() => activeFilterCount(this.state()));
  protected readonly pageSizes = PAGE_SIZES;
  protected readonly sorts = computed<ExploreSort[]>(() => (this.state().q ? ['relevance', 'top', 'newest', 'remixed', 'discussed', 'schedule'] : ['top', 'newest', 'remixed', 'discussed', 'schedule']));
  protected readonly sortLabel = SORT_LABELS;
  protected readonly shownSort = computed<ExploreSort>(() => this.state().sort ?? this.store.page()?.sort ?? (this.state().q ? 'relevance' : 'newest'));
  protected readonly summary = computed(() => {
    const total = this.store.total();
    if (!this.store.page()) return '';
    const q = this.state().q;
    return `${countText(total, 'published bar')}${q ? ` ${total === 1 ? 'matches' : 'match'} “${q}”` : ''}`;
  });
  protected readonly authorName = computed(() => {
    const id = this.state().author;
    return id ? (this.store.items().find((e) => e.author.id === id)?.author.displayName ?? null) : null;
  });
  protected readonly fieldMessage = fieldMessage;

  constructor() {
    effect(() => {
      const state = this.state();
      untracked(() => {
        if (this.search.value.trim() !== state.q) this.search.setValue(state.q, { emitEvent: false });
        void this.store.load(state);
      });
    });
    this.search.valueChanges
      .pipe(debounceTime(350), map((q) => q.trim()), distinctUntilChanged(), takeUntilDestroyed(inject(DestroyRef)))
      .subscribe((q) => {
        // A result chosen while the pause ran wins: the late search must not pull the member back to Explore.
        if (this.router.currentNavigation()) return;
        if (this.search.valid && q !== this.state().q) this.go({ q }, true);
      });
  }

  protected go(change: Partial<ExploreState>, replaceUrl = false): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: paramsFromState(withChange(this.state(), change)), replaceUrl });
  }

  protected setSort(sort: ExploreSort): void {
    this.go({ sort });
  }

  protected setPage(event: PageEvent): void {
    this.go(event.pageSize !== this.state().pageSize ? { pageSize: event.pageSize, page: 1 } : { page: event.pageIndex + 1 });
  }

  protected chooseAuthor(author: { id: string }): void {
    this.go({ author: author.id });
  }
}
