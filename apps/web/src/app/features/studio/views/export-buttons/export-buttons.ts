import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import type { ExportFormat } from '@barwright/engine';
import { Downloads } from '../../../../shared/views/downloads/downloads';
import { CollabSession } from '../../collab/collab-session';
import { StudioStore } from '../../studio-store';

/** Downloads of the design as the server exports it (from the live document, validated there). */
@Component({
  selector: 'bw-export-buttons',
  imports: [Downloads],
  template: `
    <bw-downloads [disabled]="!session.parsed().ok" disabledNote="Downloads come back once every field is valid." [busy]="busy()"
                  (chosen)="download($any($event))" />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExportButtons {
  protected readonly session = inject(CollabSession);
  private readonly store = inject(StudioStore);
  private readonly document = inject(DOCUMENT);
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
