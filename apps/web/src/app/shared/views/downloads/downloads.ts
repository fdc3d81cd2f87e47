import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { GCODE_SUMMARY } from '@barwright/engine';

/** One file a design can be downloaded as. `format` is the export route's `format` parameter. */
export interface DownloadChoice {
  format: string;
  label: string;
  what: string;
  icon: string;
}

/** The design's files, as the server exports them (`EXPORT_FORMATS` in the engine, each listed once here). */
export const DESIGN_DOWNLOADS: readonly DownloadChoice[] = [
  { format: 'pdf', label: 'PDF', what: 'printable 1:1 template: set-up, period, line study, cut plan', icon: 'picture_as_pdf' },
  { format: 'pdf-pair', label: 'PDF pair', what: 'the same, with the opposite blank of the cut at 1:1', icon: 'flip' },
  { format: 'svg', label: 'SVG', what: 'drawing of the bar, in mm', icon: 'draw' },
  { format: 'study-svg', label: 'Study SVG', what: 'the line study as a drawing', icon: 'texture' },
  { format: 'dxf', label: 'DXF', what: 'R12 polylines for CAD', icon: 'architecture' },
  { format: 'gcode', label: 'G-code', what: GCODE_SUMMARY, icon: 'precision_manufacturing' }, // the command line's words too
  { format: 'csv', label: 'CSV', what: 'the profile’s points, to 0.001 mm', icon: 'table_view' },
  { format: 'json', label: 'Design file', what: 'the design itself, for the command line', icon: 'data_object' },
];

/**
 * The downloads block: plain links when `hrefFor` is given (the server names each file), else
 * buttons that say which was chosen (the page fetches the file itself).
 */
@Component({
  selector: 'bw-downloads',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <section class="view" aria-labelledby="downloads-title">
      <header class="view-head"><h2 id="downloads-title">Downloads</h2></header>
      @if (note()) { <p class="bw-muted note">{{ note() }}</p> }
      <ul class="downloads">
        @for (d of choices(); track d.format) {
          <li>
            @if (hrefFor(); as href) {
              <a mat-stroked-button [href]="href(d.format)" download [attr.data-testid]="testIdPrefix() + d.format">
                <mat-icon aria-hidden="true">{{ d.icon }}</mat-icon>{{ d.label }}
              </a>
            } @else {
              <button mat-stroked-button type="button" (click)="chosen.emit(d.format)" [disabled]="disabled() || busy() === d.format"
                      [attr.data-testid]="testIdPrefix() + d.format">
                <mat-icon aria-hidden="true">{{ d.icon }}</mat-icon>{{ busy() === d.format ? 'Preparing…' : d.label }}
              </button>
            }
            <span class="what">{{ d.what }}</span>
          </li>
        }
      </ul>
      @if (disabled() && disabledNote()) { <p class="bw-muted note">{{ disabledNote() }}</p> }
    </section>
  `,
  styleUrl: './downloads.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Downloads {
  readonly choices = input<readonly DownloadChoice[]>(DESIGN_DOWNLOADS);
  /** The link of each format; without it the block shows buttons and emits `chosen`. */
  readonly hrefFor = input<((format: string) => string) | null>(null);
  readonly disabled = input(false);
  readonly disabledNote = input('');
  /** The format being prepared (its button says so). */
  readonly busy = input<string | null>(null);
  readonly note = input('');
  readonly testIdPrefix = input('export-');
  readonly chosen = output<string>();
}
