import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { RouterLink } from '@angular/router';
import type { EntryCard, Units } from '@barwright/contracts';
import { cutterText, MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES } from '../../../shared/entry-facts/entry-facts';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** Explore as a table: one bar a row, for comparing figures side by side; fits the results column at 1280 px, scrolls sideways on a phone. */
@Component({
  selector: 'bw-explore-table',
  imports: [DateTextPipe, RouterLink],
  template: `
    <div class="scroller" role="region" aria-label="Published bars, as a table" tabindex="0">
      <table data-testid="explore-table">
        <thead>
          <tr>
            <th scope="col">Bar</th>
            <th scope="col">Pattern</th>
            <th scope="col">Cut in</th>
            <th scope="col" class="num">Rating</th>
            <th scope="col" class="num">Remixes</th>
            <th scope="col" class="num">Comments</th>
            <th scope="col">Published</th>
          </tr>
        </thead>
        <tbody>
          @for (e of entries(); track e.id) {
            <tr data-testid="explore-row">
              <th scope="row" class="bar">
                <img [src]="e.thumbnailUrl" alt="" width="112" height="84" loading="lazy" />
                <span class="name">
                  <a [routerLink]="['/entries', e.id]" [title]="e.title" data-testid="explore-row-link">{{ e.title }}</a>
                  <button type="button" class="author" (click)="authorChosen.emit(e.author)" [attr.aria-label]="'More bars by ' + e.author.displayName">{{ e.author.displayName }}</button>
                </span>
              </th>
              <td>{{ e.lobes }} lobes, {{ waveName[e.wave] }}@if (e.schedule) {<br /><span class="muted" data-testid="explore-row-schedule">{{ scheduleName[e.schedule] }}</span>}</td>
              <td>{{ materialName[e.material] }}<br /><span class="muted">{{ cutter(e.cutterDiameterMm) }} cutter</span></td>
              <td class="num">{{ e.rating.mean === null ? '—' : e.rating.mean.toFixed(1) }} <span class="muted">({{ e.rating.count }})</span></td>
              <td class="num">{{ e.remixCount }}</td>
              <td class="num">{{ e.commentCount }}</td>
              <td class="date"><time [attr.datetime]="e.publishedAt">{{ e.publishedAt | dateText }}</time></td>
            </tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './explore-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExploreTable {
  readonly entries = input.required<readonly EntryCard[]>();
  readonly units = input<Units>('mm');
  readonly authorChosen = output<{ id: string; displayName: string }>();
  protected readonly waveName = WAVE_NAMES;
  protected readonly materialName = MATERIAL_NAMES;
  protected readonly scheduleName = SCHEDULE_NAMES;

  protected cutter(mm: number): string {
    return cutterText(mm, this.units());
  }
}
