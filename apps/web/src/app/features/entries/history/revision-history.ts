import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { RevisionListItem } from '@barwright/contracts';
import { DESIGN_DOWNLOADS } from '../../../shared/views/downloads/downloads';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** Every published revision, newest first, each with its own thumbnail and files. */
@Component({
  selector: 'bw-revision-history',
  imports: [DateTextPipe],
  template: `
    <section class="block" aria-labelledby="history-title" data-testid="entry-history">
      <h2 id="history-title">Revision history</h2>
      <ol class="revisions" reversed>
        @for (r of revisions(); track r.number) {
          <li class="revision" data-testid="entry-revision">
            <img [src]="thumb(r.number)" alt="" width="96" height="72" loading="lazy" />
            <div class="text">
              <span class="name">Revision {{ r.number }}@if (r.number === latest()) { <span class="tag">latest</span> }</span>
              <span class="title">{{ r.title }}</span>
              <span class="by">{{ r.author.displayName }} · <time [attr.datetime]="r.createdAt">{{ r.createdAt | dateText: 'time' }}</time></span>
              <span class="files">
                @for (d of downloads; track d.format; let last = $last) {
                  <a [href]="file(r.number, d.format)" download [title]="d.what" [attr.data-testid]="'revision-download-' + d.format">{{ d.label }}</a>@if (!last) { <span aria-hidden="true"> · </span> }
                }
              </span>
            </div>
          </li>
        }
      </ol>
    </section>
  `,
  styles: `
    :host {
      display: block;
    }
    h2 {
      font: var(--mat-sys-title-large);
    }
    .revisions {
      margin: 0;
      padding: 0;
      list-style: none;
    }
    .revision {
      display: flex;
      gap: 1rem;
      padding: 0.75rem 0;
      & + & {
        border-top: 1px solid var(--bw-rule);
      }
      img {
        flex: none;
        border: 1px solid var(--bw-rule);
        border-radius: var(--mat-sys-corner-extra-small);
        background: #f8f5ee;
        object-fit: cover;
      }
    }
    .text {
      display: flex;
      flex-direction: column;
      gap: 0.125rem;
      min-width: 0;
      font: var(--mat-sys-body-small);
    }
    .name {
      font: var(--mat-sys-title-small);
    }
    .title {
      overflow-wrap: anywhere;
    }
    .tag {
      margin-left: 0.5rem;
      font: var(--mat-sys-label-small);
      color: var(--bw-brass-ink);
      text-transform: uppercase;
      letter-spacing: 0.05em;
    }
    .by {
      color: var(--mat-sys-on-surface-variant);
    }
    .files a {
      display: inline-block;
      padding: 0.25rem 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RevisionHistory {
  readonly entryId = input.required<string>();
  readonly revisions = input.required<readonly RevisionListItem[]>();
  readonly latest = input.required<number>();
  /** Every file the design page offers, for each revision. */
  protected readonly downloads = DESIGN_DOWNLOADS;

  protected thumb(n: number): string {
    return `/api/entries/${encodeURIComponent(this.entryId())}/revisions/${n}/thumbnail.svg`;
  }

  protected file(n: number, format: string): string {
    return `/api/entries/${encodeURIComponent(this.entryId())}/export?format=${format}&revision=${n}`;
  }
}
