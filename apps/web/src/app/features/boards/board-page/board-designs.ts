import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { Router, RouterLink } from '@angular/router';
import { createDesignBody, DESIGN_TITLE_MAX, type DesignSummary } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { openPublishDialog } from '../../../shared/publish-dialog/publish-dialog';
import { askForName } from '../../../shared/name-dialog/name-dialog';
import { keptFor } from '../bin-time';
import { BoardStore } from '../board-store';
import { askForNewDesign } from '../new-design-dialog/new-design-dialog';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';
import { DesignRowSketch } from './design-row-sketch';

/** The designs on a board, and (for the owner) the bin of deleted designs still restorable. */
@Component({
  selector: 'bw-board-designs',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatIconModule, MatMenuModule, DesignRowSketch],
  templateUrl: './board-designs.html',
  styleUrl: './board-designs.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardDesigns {
  protected readonly store = inject(BoardStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  protected keptFor(design: DesignSummary): string {
    return design.purgeAt ? keptFor(design.purgeAt, new Date()) : '';
  }

  protected async newDesign(): Promise<void> {
    const id = await askForNewDesign(this.dialog, (title, preset) => this.store.createDesign(title, preset));
    if (id) await this.router.navigate(['/studio', id]);
  }

  /** Community: publishes the design (a new entry, or the next revision of its entry) and opens the entry page. */
  protected async publish(design: DesignSummary): Promise<void> {
    const result = await openPublishDialog(this.dialog, { designId: design.id, title: design.title });
    if (!result) return;
    void this.notifier.tell(result.created ? `“${result.title}” is published.` : `Revision ${result.revision} of “${result.title}” is published.`, undefined, 4000);
    await this.router.navigate(['/entries', result.entryId]);
  }

  protected async duplicate(design: DesignSummary): Promise<void> {
    await this.store.duplicate(design.id);
    void this.notifier.tell(`“${design.title}” duplicated.`, undefined, 3000);
  }

  protected async rename(design: DesignSummary): Promise<void> {
    await askForName(this.dialog, {
      title: 'Rename design',
      label: 'Title',
      initial: design.title,
      maxLength: DESIGN_TITLE_MAX,
      schema: createDesignBody.shape.title,
      confirmLabel: 'Rename',
      testId: 'design-rename',
      save: (title) => this.store.renameDesign(design.id, title),
    });
  }

  protected async remove(design: DesignSummary): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: `Delete “${design.title}”?`,
      message: 'The design goes to the bin on this board. You can restore it for 30 days; after that it is removed for good. Anyone editing it now is disconnected.',
      confirmLabel: 'Delete design',
      danger: true,
    });
    if (!confirmed) return;
    await this.store.deleteDesign(design.id);
    void this.notifier.tell(`“${design.title}” is in the bin for 30 days.`, undefined, 4000);
  }

  protected async restore(design: DesignSummary): Promise<void> {
    await this.store.restoreDesign(design.id);
    void this.notifier.tell(`“${design.title}” is back on the board.`, undefined, 3000);
  }
}
