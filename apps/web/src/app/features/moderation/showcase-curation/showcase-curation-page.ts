import { LiveAnnouncer } from '@angular/cdk/a11y';
import { CdkDrag, CdkDragDrop, CdkDragHandle, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import { SHOWCASE_NOTE_MAX, type CuratedItem } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { fieldMessage } from '../../../shared/forms/field-message';
import { CurationStore } from './curation-store';
import { FeatureForm } from './feature-form';
import { movedText } from './move-item';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/**
 * Showcase curation: the featured bars in the order the home page shows them. Reorder by
 * dragging the handle, or with the move buttons (keyboard); edit a curator's note; take a bar out;
 * feature another.
 */
@Component({
  selector: 'bw-showcase-curation-page',
  imports: [DateTextPipe, ReactiveFormsModule, RouterLink, CdkDrag, CdkDragHandle, CdkDropList, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatTooltipModule, FeatureForm],
  providers: [CurationStore],
  templateUrl: './showcase-curation-page.html',
  styleUrl: './showcase-curation-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShowcaseCurationPage {
  protected readonly store = inject(CurationStore);
  private readonly announcer = inject(LiveAnnouncer);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  protected readonly editing = signal<string | null>(null);
  protected readonly note = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(SHOWCASE_NOTE_MAX)] });
  protected readonly noteMax = SHOWCASE_NOTE_MAX;
  protected readonly fieldMessage = fieldMessage;

  constructor() {
    void this.store.load();
  }

  protected featuredIds(items: readonly CuratedItem[]): string[] {
    return items.map((i) => i.entry.id);
  }

  protected dropped(event: CdkDragDrop<readonly CuratedItem[]>): void {
    void this.move(event.previousIndex, event.currentIndex);
  }

  protected async move(from: number, to: number): Promise<void> {
    const items = this.store.items() ?? [];
    const title = items[from]?.entry.title ?? '';
    await this.store.move(from, to);
    const count = this.store.items()?.length ?? 0;
    void this.announcer.announce(movedText(title, Math.max(0, Math.min(count - 1, to)), count), 'polite');
  }

  protected startEdit(item: CuratedItem): void {
    this.note.setValue(item.note);
    this.editing.set(item.entry.id);
  }

  protected async saveNote(item: CuratedItem): Promise<void> {
    this.note.setValue(this.note.value.trim());
    if (this.note.invalid) {
      this.note.markAsTouched();
      return;
    }
    await this.store.editNote(item.entry.id, this.note.value);
    this.editing.set(null);
    void this.notifier.tell('Note saved.', undefined, 3000);
  }

  protected async remove(item: CuratedItem): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: `Take “${item.entry.title}” out of the showcase?`,
      message: 'The bar stays published; only its place in the showcase and its note go. The audit log keeps the note.',
      confirmLabel: 'Take out',
    });
    if (!confirmed) return;
    await this.store.unfeature(item.entry.id);
    void this.notifier.tell(`“${item.entry.title}” is out of the showcase.`, undefined, 3000);
  }

  protected readonly featureEntry = async (entryId: string, note: string) => {
    const added = await this.store.feature(entryId, note);
    void this.notifier.tell(`“${added.entry.title}” is in the showcase, last. Move it where it belongs.`, undefined, 4000);
  };
}
