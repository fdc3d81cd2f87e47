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
import { openCompare } from '../../../shared/compare/compare-dialog';
import { dateText } from '../../../shared/dates/date-text';
import { DateTextPipe, READER_LOCALE } from '../../../shared/dates/date-text-pipe';
import { KeepMotion } from '../../../shared/motion/keep-motion';

/** Named versions of the design: save one, compare one with now side by side, restore one as a new edit. */
@Component({
  selector: 'bw-history-panel',
  imports: [DateTextPipe, KeepMotion, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './history-panel.html',
  styleUrl: './history-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HistoryPanel {
  protected readonly store = inject(StudioStore);
  protected readonly session = inject(CollabSession);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly locale = inject(READER_LOCALE);
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

  /** The version against the document as it is now (taken when asked, so it does not follow later edits). */
  protected async compare(version: DesignVersion): Promise<void> {
    this.comparing.set(version.id);
    let content: { design: unknown; notes: string };
    try {
      content = await this.store.versionContent(version.id);
    } finally {
      this.comparing.set(null);
    }
    const now = this.session.design();
    const when = dateText(version.createdAt, this.locale, 'time');
    await openCompare(this.dialog, {
      title: `“${version.name}” against now`,
      sides: [
        { label: version.name, note: `${version.authorName}, ${when}`, design: content.design, notes: content.notes },
        { label: 'Now', note: 'the design as it stands', design: now, notes: this.session.notes.toString() },
      ],
      units: (now as { units?: 'mm' | 'in' } | null)?.units === 'in' ? 'in' : 'mm',
    });
  }

  protected async restore(version: DesignVersion): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: `Restore “${version.name}”?`,
      message: 'Its values and notes are written over the current ones as a new edit, for everyone on the design. Nothing is lost: save a version of the current state first if you may want it back.',
      confirmLabel: 'Restore version',
    });
    if (!confirmed) return;
    await this.store.restoreVersion(version.id);
    void this.notifier.tell(`“${version.name}” restored as a new edit.`, undefined, 4000);
  }
}
