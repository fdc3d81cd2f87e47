import { ChangeDetectionStrategy, Component, computed, effect, inject, input, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ModerationCase } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { CaseCard } from '../cases/case-card';
import { CasesStore, type CaseList } from '../cases/cases-store';
import { itemPhrase } from '../cases/case-timeline';
import { askDecision } from '../cases/decision-dialog';
import type { Decision } from '../moderation-api';
import { DeskCount } from '../desk-count';

const DONE: Record<Decision, string> = {
  dismiss: 'Reports dismissed.',
  hide: 'Hidden. Its author sees your reason.',
  restore: 'Restored: everyone sees it again.',
  'suspend-author': 'Account suspended; its sessions have ended.',
};

/** The desk's lists: the open reports grouped by item (the queue), or the items hidden now. */
@Component({
  selector: 'bw-cases-page',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, CaseCard],
  providers: [CasesStore],
  template: `
    <div class="intro">
      <p class="bw-lede">
        @if (list() === 'queue') {
          Open reports, grouped by item, the one waiting longest first. Hiding never deletes: the author still sees it, with your reason.
        } @else {
          What is hidden now, the last hidden first. Restoring brings an item back where it was.
        }
      </p>
      <button mat-button type="button" (click)="reload()" data-testid="cases-reload"><mat-icon aria-hidden="true">refresh</mat-icon>Reload</button>
    </div>
    @if (stale()) {
      <p class="stale bw-with-icon" role="status" data-testid="cases-stale">
        <mat-icon aria-hidden="true">notifications_active</mat-icon>
        <span>The queue has changed: {{ desk.openReports() }} open {{ desk.openReports() === 1 ? 'report' : 'reports' }} now.</span>
        <button mat-button type="button" (click)="reload()">Show them</button>
      </p>
    }
    @if (store.cases(); as cases) {
      @if (cases.length === 0) {
        <p class="empty bw-panel" data-testid="cases-empty">{{ list() === 'queue' ? 'No open reports. All quiet.' : 'Nothing is hidden.' }}</p>
      } @else {
        <p class="bw-muted count" role="status">{{ countText() }}</p>
        <ul class="cases">
          @for (c of cases; track c.item.target.id) {
            <li><bw-case-card [case]="c" [busy]="store.busy() === c.item.target.id" (decide)="decide(c, $event)" /></li>
          }
        </ul>
      }
    } @else {
      <mat-progress-bar mode="indeterminate" aria-label="Loading" />
    }
  `,
  styles: `
    .intro {
      display: flex;
      flex-wrap: wrap;
      align-items: flex-start;
      justify-content: space-between;
      gap: 0.5rem 1rem;
    }
    .cases {
      display: flex;
      flex-direction: column;
      gap: 1rem;
      margin: 0;
      padding: 0;
      list-style: none;
    }
    .empty {
      margin: 0;
    }
    .stale {
      align-items: center;
      margin: 0 0 1rem;
      padding: 0.25rem 0.25rem 0.25rem 1rem;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CasesPage {
  protected readonly store = inject(CasesStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  protected readonly desk = inject(DeskCount);
  /** From the route's data. */
  readonly list = input<CaseList>('queue');

  /** New reports came in (or others were decided) since this list was loaded. */
  protected readonly stale = computed(() => {
    const live = this.desk.openReports();
    return this.list() === 'queue' && live !== null && this.store.cases() !== null && live !== this.store.openReports();
  });

  protected readonly countText = computed(() => {
    const cases = this.store.cases() ?? [];
    return this.list() === 'queue'
      ? `${cases.length} ${cases.length === 1 ? 'item' : 'items'}, ${this.store.openReports()} open ${this.store.openReports() === 1 ? 'report' : 'reports'}`
      : `${cases.length} hidden ${cases.length === 1 ? 'item' : 'items'}`;
  });

  constructor() {
    effect(() => {
      const list = this.list();
      untracked(() => void this.store.load(list));
    });
  }

  protected reload(): void {
    void this.store.refresh();
  }

  protected async decide(c: ModerationCase, decision: Decision): Promise<void> {
    const words = await askDecision(this.dialog, { decision, itemName: itemPhrase(c), authorName: c.item.author.displayName });
    if (words === null) return;
    await this.store.decide(c, decision, words);
    void this.notifier.tell(DONE[decision], undefined, 4000);
  }
}
