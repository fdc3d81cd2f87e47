import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { EntryCard as EntryCardData, Units } from '@barwright/contracts';
import { EntryCard } from '../../../shared/entry-card/entry-card';

/** A row of bars under the showcase (new, top rated), with the way to the rest in Explore. */
@Component({
  selector: 'bw-entry-row',
  imports: [RouterLink, MatIconModule, EntryCard],
  template: `
    <section class="row" [attr.aria-labelledby]="testId() + '-title'" [attr.data-testid]="testId()">
      <header class="head">
        <h2 [id]="testId() + '-title'">{{ title() }}</h2>
        <a class="all" routerLink="/explore" [queryParams]="{ sort: sort() }">See all in Explore<mat-icon aria-hidden="true">arrow_forward</mat-icon></a>
      </header>
      @if (entries(); as list) {
        @if (list.length === 0) {
          <p class="bw-muted">No bars published yet.</p>
        } @else {
          <ul class="cards">
            @for (e of list; track e.id) { <li><bw-entry-card [entry]="e" [units]="units()" /></li> }
          </ul>
        }
      } @else {
        <div class="placeholder" aria-hidden="true"></div>
      }
    </section>
  `,
  styles: `
    .head {
      display: flex;
      flex-wrap: wrap;
      align-items: baseline;
      justify-content: space-between;
      gap: 0.25rem 1rem;
      margin-bottom: 1rem;
    }
    h2 {
      margin: 0;
    }
    .all {
      display: inline-flex;
      align-items: center;
      gap: 0.25rem;
      font: var(--mat-sys-label-large);
      .mat-icon {
        width: 18px;
        height: 18px;
        font-size: 18px;
      }
    }
    .cards {
      display: grid;
      grid-template-columns: repeat(4, minmax(0, 1fr));
      gap: 1rem;
      margin: 0;
      padding: 0;
      list-style: none;
      li {
        display: flex;
      }
    }
    .placeholder {
      height: 14rem;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-surface-container-low);
    }
    @media (max-width: 1023.98px) {
      .cards {
        grid-template-columns: repeat(2, minmax(0, 1fr));
      }
    }
    /* A phone scrolls the row sideways, one card and a glimpse of the next at a time. */
    @media (max-width: 599.98px) {
      .cards {
        display: flex;
        overflow-x: auto;
        scroll-snap-type: x mandatory;
        padding-bottom: 0.5rem;
        li {
          flex: 0 0 78%;
          scroll-snap-align: start;
        }
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryRow {
  readonly title = input.required<string>();
  /** Explore's sort for "see all". */
  readonly sort = input.required<string>();
  readonly entries = input.required<readonly EntryCardData[] | null>();
  readonly units = input<Units>('mm');
  readonly testId = input('row');
}
