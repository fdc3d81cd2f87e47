import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { RouterLink } from '@angular/router';
import type { EntryCard, Units } from '@barwright/contracts';
import { cutterText, MATERIAL_NAMES, WAVE_NAMES } from '../../../shared/entry-facts/entry-facts';

/** Explore as a table: one bar a row, for comparing figures side by side. Scrolls sideways on a phone. */
@Component({
  selector: 'bw-explore-table',
  imports: [DatePipe, RouterLink],
  template: `
    <div class="scroller" role="region" aria-label="Published bars, as a table" tabindex="0">
      <table data-testid="explore-table">
        <thead>
          <tr>
            <th scope="col">Bar</th>
            <th scope="col">Author</th>
            <th scope="col" class="num">Lobes</th>
            <th scope="col">Wave</th>
            <th scope="col">Material</th>
            <th scope="col" class="num">Cutter</th>
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
                <img [src]="e.thumbnailUrl" alt="" width="64" height="48" loading="lazy" />
                <a [routerLink]="['/entries', e.id]" data-testid="explore-row-link">{{ e.title }}</a>
              </th>
              <td><button type="button" class="author" (click)="authorChosen.emit(e.author)" [attr.aria-label]="'More bars by ' + e.author.displayName">{{ e.author.displayName }}</button></td>
              <td class="num">{{ e.lobes }}</td>
              <td>{{ waveName[e.wave] }}</td>
              <td>{{ materialName[e.material] }}</td>
              <td class="num">{{ cutter(e.cutterDiameterMm) }}</td>
              <td class="num">{{ e.rating.mean === null ? '—' : e.rating.mean.toFixed(1) }} <span class="muted">({{ e.rating.count }})</span></td>
              <td class="num">{{ e.remixCount }}</td>
              <td class="num">{{ e.commentCount }}</td>
              <td><time [attr.datetime]="e.publishedAt">{{ e.publishedAt | date: 'mediumDate' }}</time></td>
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

  protected cutter(mm: number): string {
    return cutterText(mm, this.units());
  }
}
