import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { ExportFormat } from '@barwright/engine';
import { CollabSession } from '../../collab/collab-session';
import { StudioStore } from '../../studio-store';

interface ExportChoice {
  format: ExportFormat;
  label: string;
  what: string;
  icon: string;
}

const EXPORTS: readonly ExportChoice[] = [
  { format: 'pdf', label: 'PDF', what: 'printable 1:1 template and cut plan', icon: 'picture_as_pdf' },
  { format: 'svg', label: 'SVG', what: 'drawing of the bar, in mm', icon: 'draw' },
  { format: 'dxf', label: 'DXF', what: 'R12 polylines for CAD', icon: 'architecture' },
  { format: 'gcode', label: 'G-code', what: 'RS-274 program for the passes', icon: 'precision_manufacturing' },
  { format: 'csv', label: 'CSV', what: 'the profile’s points', icon: 'table_view' },
];

/** Downloads of the design as the server exports it (from the live document, validated there). */
@Component({
  selector: 'bw-export-buttons',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <section class="view" aria-labelledby="exports-title">
      <header class="view-head"><h2 id="exports-title">Downloads</h2></header>
      <ul class="exports">
        @for (choice of exports; track choice.format) {
          <li>
            <button mat-stroked-button type="button" (click)="download(choice.format)" [disabled]="!session.parsed().ok || busy() === choice.format"
                    [attr.data-testid]="'export-' + choice.format">
              <mat-icon aria-hidden="true">{{ choice.icon }}</mat-icon>
              {{ busy() === choice.format ? 'Preparing…' : choice.label }}
            </button>
            <span class="what">{{ choice.what }}</span>
          </li>
        }
      </ul>
      @if (!session.parsed().ok) { <p class="bw-muted note">Downloads come back once every field is valid.</p> }
    </section>
  `,
  styleUrl: './export-buttons.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExportButtons {
  protected readonly session = inject(CollabSession);
  private readonly store = inject(StudioStore);
  private readonly document = inject(DOCUMENT);
  protected readonly exports = EXPORTS;
  protected readonly busy = signal<ExportFormat | null>(null);

  protected async download(format: ExportFormat): Promise<void> {
    this.busy.set(format);
    try {
      const { blob, filename } = await this.store.exportFile(format);
      const url = URL.createObjectURL(blob);
      const link = this.document.createElement('a');
      link.href = url;
      link.download = filename;
      link.click();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    } finally {
      this.busy.set(null);
    }
  }
}
