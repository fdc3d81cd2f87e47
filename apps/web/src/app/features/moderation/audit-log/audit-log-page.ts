import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { AUDIT_ACTIONS, type AuditPage, type PersonRef } from '@barwright/contracts';
import { map } from 'rxjs';
import { ModerationApi } from '../moderation-api';
import { filtersFromParams, filtersToParams, hasFilters, NO_FILTERS, type AuditFilters } from './audit-filters';
import { auditLink, auditSentence, itemTitle } from './audit-lines';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

const PAGE_SIZE = 50;
/** The filter menu's words for each action (the log's own sentence has them in context). */
const ACTION_NAMES: Record<string, string> = {
  'report.dismiss': 'Reports dismissed', 'item.hide': 'Hidden', 'item.restore': 'Restored', 'user.suspend': 'Account suspended',
  'user.unsuspend': 'Suspension lifted', 'user.role': 'Role changed', 'showcase.feature': 'Featured', 'showcase.unfeature': 'Taken out of the showcase',
  'showcase.note': 'Note edited', 'showcase.reorder': 'Showcase reordered',
};

/** The audit log: every moderation and role action, newest first, filtered by what the URL says. */
@Component({
  selector: 'bw-audit-log-page',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatPaginatorModule, MatProgressBarModule, MatSelectModule],
  templateUrl: './audit-log-page.html',
  styleUrl: './audit-log-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuditLogPage {
  private readonly api = inject(ModerationApi);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  protected readonly filters = toSignal(this.route.queryParams.pipe(map((p) => filtersFromParams(p))), { initialValue: NO_FILTERS });
  protected readonly page = signal<AuditPage | null>(null);
  protected readonly actors = signal<PersonRef[]>([]);
  protected readonly actions = AUDIT_ACTIONS;
  protected readonly actionNames = ACTION_NAMES;
  protected readonly pageSize = PAGE_SIZE;
  protected readonly filtered = computed(() => hasFilters(this.filters()));
  /** The item the log is filtered by, named by its title ("the bar “Sine 24”"); its id when no line names it. */
  protected readonly itemName = computed(() => {
    const id = this.filters().item;
    if (!id) return null;
    const item = this.page()?.item;
    return item ? itemTitle(item) : `item ${id}`;
  });
  protected readonly lines = computed(() => (this.page()?.items ?? []).map((e) => ({ entry: e, sentence: auditSentence(e), link: auditLink(e) })));

  constructor() {
    void this.api.auditActors().then((a) => this.actors.set(a));
    effect(() => {
      const f = this.filters();
      untracked(() => void this.load(f));
    });
  }

  private async load(f: AuditFilters): Promise<void> {
    this.page.set(null);
    this.page.set(await this.api.audit(filtersToParams(f, true, PAGE_SIZE)));
  }

  /** Changes one filter (back to the first page) through the URL, so the view can be shared and reloaded. */
  protected set<K extends keyof AuditFilters>(key: K, value: AuditFilters[K]): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: filtersToParams({ ...this.filters(), [key]: value, page: 1 }) });
  }

  protected setItem(value: string): void {
    const id = value.trim();
    if (id === '' || /^[0-9a-f-]{36}$/i.test(id)) this.set('item', id);
  }

  protected turnPage(event: PageEvent): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: filtersToParams({ ...this.filters(), page: event.pageIndex + 1 }) });
  }

  protected clear(): void {
    void this.router.navigate([], { relativeTo: this.route, queryParams: {} });
  }
}
