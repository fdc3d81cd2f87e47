import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { createVersionBody, VERSION_NAME_MAX, type DesignVersion } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { askForName } from '../../../shared/name-dialog/name-dialog';
import { CollabSession } from '../collab/collab-session';
import { StudioStore } from '../studio-store';
import { designDifferences, type FieldDifference } from './design-diff';

interface Comparison {
  versionId: string;
  differences: FieldDifference[];
  notesChanged: boolean;
}

/** Named versions of the design: save one, compare one with now, restore one as a new edit. */
@Component({
  selector: 'bw-history-panel',
  imports: [DatePipe, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './history-panel.html',
  styleUrl: './history-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HistoryPanel {
  protected readonly store = inject(StudioStore);
  protected readonly session = inject(CollabSession);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  protected readonly comparison = signal<Comparison | null>(null);
  protected readonly comparing = signal<string | null>(null);

  protected async save(): Promise<void> {
    await askForName(this.dialog, {
      title: 'Save a version',
      label: 'Version name',
      hint: 'Say what is special about it, e.g. “trial cut 1, acrylic”',
      maxLength: VERSION_NAME_MAX,
      schema: createVersionBody.shape.name,
      confirmLabel: 'Save version',
      testId: 'version-name',
      save: async (name) => {
        await this.store.saveVersion(name);
        void this.notifier.tell(`Version “${name}” saved.`, undefined, 3000);
      },
    });
  }

  protected async compare(version: DesignVersion): Promise<void> {
    if (this.comparison()?.versionId === version.id) return this.comparison.set(null);
    this.comparing.set(version.id);
    try {
      const content = await this.store.versionContent(version.id);
      // Compared with the document as it is now, so the list follows live edits only when asked again.
      this.comparison.set({
        versionId: version.id,
        differences: designDifferences(content.design, this.session.design()),
        notesChanged: content.notes !== this.session.notes.toString(),
      });
    } finally {
      this.comparing.set(null);
    }
  }

  protected async restore(version: DesignVersion): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: `Restore “${version.name}”?`,
      message: 'Its values and notes are written over the current ones as a new edit, for everyone on the design. Nothing is lost: save a version of the current state first if you may want it back.',
      confirmLabel: 'Restore version',
    });
    if (!confirmed) return;
    await this.store.restoreVersion(version.id);
    this.comparison.set(null);
    void this.notifier.tell(`“${version.name}” restored as a new edit.`, undefined, 4000);
  }
}
