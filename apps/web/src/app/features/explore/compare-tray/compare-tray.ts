import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { openCompare } from '../../../shared/compare/compare-dialog';
import { EntriesApi } from '../../entries/entries-api';
import { ComparePicks, MAX_PICKS } from './compare-picks';

/** The tray of picked bars at the foot of Explore: two to four open side by side. */
@Component({
  selector: 'bw-compare-tray',
  imports: [MatButtonModule, MatIconModule],
  template: `
    @if (picks.picks().length > 0) {
      <!-- Room at the foot of the page, so the tray never hides the last cards or the pages. -->
      <div class="room" aria-hidden="true"></div>
      <aside class="tray" aria-label="Bars picked for comparing" data-testid="compare-tray">
        <ul class="picked">
          @for (p of picks.picks(); track p.id) {
            <li>
              <img [src]="p.thumbnailUrl" alt="" width="48" height="36" />
              <span class="title">{{ p.title }}</span>
              <button mat-icon-button type="button" (click)="picks.remove(p.id)" [attr.aria-label]="'Take “' + p.title + '” off the tray'">
                <mat-icon aria-hidden="true">close</mat-icon>
              </button>
            </li>
          }
        </ul>
        <div class="actions">
          <span class="count bw-muted">{{ picks.picks().length }} of {{ max }}</span>
          <button mat-button type="button" (click)="picks.clear()" data-testid="compare-clear">Clear</button>
          <button mat-flat-button class="bw-brass" type="button" (click)="open()" [disabled]="picks.picks().length < 2 || opening()"
                  data-testid="compare-open">
            <mat-icon aria-hidden="true">compare</mat-icon>
            {{ picks.picks().length < 2 ? 'Pick one more' : 'Compare ' + picks.picks().length }}
          </button>
        </div>
      </aside>
    }
  `,
  styleUrl: './compare-tray.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CompareTray {
  protected readonly picks = inject(ComparePicks);
  private readonly api = inject(EntriesApi);
  private readonly dialog = inject(MatDialog);
  protected readonly opening = signal(false);
  protected readonly max = MAX_PICKS;

  /** Fetches each picked bar's latest revision and opens them side by side. */
  protected async open(): Promise<void> {
    this.opening.set(true);
    let details;
    try {
      details = await Promise.all(this.picks.picks().map((p) => this.api.detail(p.id)));
    } finally {
      this.opening.set(false);
    }
    await openCompare(this.dialog, {
      title: `${details.length} bars side by side`,
      sides: details.map((d) => ({ label: d.title, note: `by ${d.author.displayName}, revision ${d.latest.number}`, link: ['/entries', d.id], design: d.latest.design })),
    });
  }
}
