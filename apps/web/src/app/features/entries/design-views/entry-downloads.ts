import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

interface DownloadChoice {
  format: 'pdf' | 'svg' | 'dxf' | 'gcode' | 'csv';
  label: string;
  what: string;
  icon: string;
}

const DOWNLOADS: readonly DownloadChoice[] = [
  { format: 'pdf', label: 'PDF', what: 'printable 1:1 template and cut plan', icon: 'picture_as_pdf' },
  { format: 'svg', label: 'SVG', what: 'drawing of the bar, in mm', icon: 'draw' },
  { format: 'dxf', label: 'DXF', what: 'R12 polylines for CAD', icon: 'architecture' },
  { format: 'gcode', label: 'G-code', what: 'RS-274 program for the passes', icon: 'precision_manufacturing' },
  { format: 'csv', label: 'CSV', what: 'the profile’s points', icon: 'table_view' },
];

/** The published revision's files, as the server exports them (plain links: the server names each file). */
@Component({
  selector: 'bw-entry-downloads',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <section class="block" aria-labelledby="downloads-title">
      <h2 id="downloads-title">Downloads</h2>
      <p class="bw-muted note">Revision {{ revision() }}. The G-code and the PDF carry the safety cautions with them.</p>
      <ul class="downloads">
        @for (d of downloads; track d.format) {
          <li>
            <a mat-stroked-button [href]="href(d.format)" download [attr.data-testid]="'entry-download-' + d.format">
              <mat-icon aria-hidden="true">{{ d.icon }}</mat-icon>
              {{ d.label }}
            </a>
            <span class="what">{{ d.what }}</span>
          </li>
        }
      </ul>
    </section>
  `,
  styles: `
    :host {
      display: block;
    }
    h2 {
      font: var(--mat-sys-title-medium);
      margin: 0 0 0.25rem;
    }
    .note {
      margin: 0 0 0.75rem;
      font: var(--mat-sys-body-small);
    }
    .downloads {
      display: flex;
      flex-direction: column;
      gap: 0.5rem;
      margin: 0;
      padding: 0;
      list-style: none;

      li {
        display: flex;
        align-items: center;
        gap: 0.75rem;
      }
      a {
        flex: none;
        width: 7.5rem;
        justify-content: flex-start;
      }
    }
    .what {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryDownloads {
  readonly entryId = input.required<string>();
  readonly revision = input.required<number>();
  protected readonly downloads = DOWNLOADS;
  private readonly base = computed(() => `/api/entries/${encodeURIComponent(this.entryId())}/export`);

  protected href(format: string): string {
    return `${this.base()}?format=${format}&revision=${this.revision()}`;
  }
}
