import { ScrollingModule, VIRTUAL_SCROLL_STRATEGY } from '@angular/cdk/scrolling';
import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, output, signal } from '@angular/core';
import type { CandidateKey, SweepCandidate } from '@barwright/contracts';
import type { SweepItem, SweepLight, SweepStudy } from '../run/sweep-types';
import { columnsFor, gridRows, type GridRow } from '../sweep-filters';
import { RowHeightsStrategy } from './row-heights-strategy';
import { SweepCard } from './sweep-card';

/** Heights of the virtual scroll's rows (px): a group's heading, and a row of cards with its gap. */
const GROUP_ROW_PX = 48;
const CARD_PX = 416;
const CARD_ROW_PX = CARD_PX + 12;

/**
 * The sweep's grid: rows of cards in as many columns as fit (one on a phone), optionally grouped
 * under a heading per rosette, in a CDK virtual scroll so only the rows in view (and a buffer) exist,
 * and so only their thumbnails are drawn.
 */
@Component({
  selector: 'bw-sweep-grid',
  imports: [ScrollingModule, SweepCard],
  providers: [{ provide: VIRTUAL_SCROLL_STRATEGY, useFactory: () => new RowHeightsStrategy() }],
  template: `
    <cdk-virtual-scroll-viewport class="viewport" data-testid="sweep-grid" [style.--bw-card-height.px]="cardPx">
      <div *cdkVirtualFor="let row of rows(); trackBy: trackRow" class="row" [class.group]="row.kind === 'group'">
        @if (row.kind === 'group') {
          <h3 class="group-title" data-testid="sweep-group">{{ row.label }} <span class="count">{{ row.count }}</span></h3>
        } @else {
          <div class="cards" [style.grid-template-columns]="'repeat(' + columns() + ', minmax(0, 1fr))'">
            @for (i of row.indices; track i) {
              <bw-sweep-card [candidate]="entries()[i].candidate" [item]="itemOf(i)" [study]="study()" [light]="light()"
                             [starred]="starred().has(i)" [picked]="picked().includes(i)" [canPick]="picked().length < 4" [showCutter]="showCutter()"
                             (star)="star.emit({ index: i, on: $event })" (pick)="pick.emit({ index: i, on: $event })" (opposite)="opposite.emit(i)" />
            }
          </div>
        }
      </div>
    </cdk-virtual-scroll-viewport>
  `,
  styles: `
    :host { display: block; }
    .viewport { height: max(30rem, calc(100vh - 10rem)); }
    .row { box-sizing: border-box; padding-bottom: 12px; }
    .row.group { height: ${GROUP_ROW_PX}px; padding: 0; display: flex; align-items: flex-end; }
    .cards { display: grid; gap: 12px; height: ${CARD_PX}px; }
    .group-title { margin: 0 0 0.5rem; font-size: 1rem; font-weight: 500; }
    .count { font-weight: 400; font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); margin-left: 0.5rem; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepGrid {
  private readonly strategy = inject(VIRTUAL_SCROLL_STRATEGY) as RowHeightsStrategy;

  readonly entries = input.required<readonly { key: CandidateKey; candidate: SweepCandidate }[]>();
  /** The shown candidates' indices, filtered and sorted. */
  readonly indices = input.required<readonly number[]>();
  readonly items = input.required<readonly (SweepItem | undefined)[]>();
  /** Bumped whenever `items` gains results (the array itself is filled in place). */
  readonly version = input(0);
  readonly grouped = input(false);
  readonly study = input.required<SweepStudy>();
  readonly light = input.required<SweepLight>();
  readonly starred = input.required<ReadonlySet<number>>();
  readonly picked = input.required<readonly number[]>();
  readonly showCutter = input(false);

  readonly star = output<{ index: number; on: boolean }>();
  readonly pick = output<{ index: number; on: boolean }>();
  readonly opposite = output<number>();

  protected readonly cardPx = CARD_PX;
  private readonly width = signal(1024);
  protected readonly columns = computed(() => columnsFor(this.width()));
  protected readonly rows = computed<GridRow[]>(() => {
    const entries = this.entries();
    return gridRows(this.indices(), this.columns(), this.grouped() ? (i) => entries[i].candidate.rosette.name : undefined);
  });

  constructor() {
    const host = inject(ElementRef<HTMLElement>).nativeElement as HTMLElement;
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(([e]) => this.width.set(e.contentRect.width));
    observer?.observe(host);
    inject(DestroyRef).onDestroy(() => observer?.disconnect());
    effect(() => this.strategy.setHeights(this.rows().map((r) => (r.kind === 'group' ? GROUP_ROW_PX : CARD_ROW_PX))));
  }

  protected itemOf(i: number): SweepItem | undefined {
    this.version();
    return this.items()[i];
  }

  protected trackRow(_: number, row: GridRow): string {
    return row.kind === 'group' ? `g:${row.label}` : `c:${row.indices[0]}`;
  }
}
