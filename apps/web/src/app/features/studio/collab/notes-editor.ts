import { afterNextRender, ChangeDetectionStrategy, Component, DestroyRef, ElementRef, inject, viewChild } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type * as Y from 'yjs';
import { FieldPresence } from '../fields/field-presence/field-presence';
import { CollabSession } from './collab-session';
import { mapPosition, textSplice, type TextDelta } from './text-change';

/**
 * The design's shared notes: a textarea bound to the document's Y.Text. Your typing goes in as one
 * splice per edit; someone else's edit arrives with your caret and selection kept where they were in the text.
 */
@Component({
  selector: 'bw-notes-editor',
  imports: [MatFormFieldModule, MatInputModule, FieldPresence],
  template: `
    <bw-field-presence field="notes">
      <mat-form-field class="notes">
        <mat-label>Notes on this design</mat-label>
        <textarea #box matInput rows="7" (input)="typed()" [disabled]="session.readOnly()" data-testid="notes"
                  placeholder="Set-up, trial results, what to try next…"></textarea>
        <mat-hint>Shared with everyone on the board, saved as you type</mat-hint>
      </mat-form-field>
    </bw-field-presence>
  `,
  styles: `
    .notes {
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotesEditor {
  protected readonly session = inject(CollabSession);
  private readonly box = viewChild.required<ElementRef<HTMLTextAreaElement>>('box');

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      const text = this.session.notes;
      this.box().nativeElement.value = text.toString();
      const observer = (event: Y.YTextEvent, transaction: Y.Transaction) => {
        if (transaction.origin !== this.session.origin || transaction.local === false) this.applyRemote(event.delta as TextDelta);
      };
      text.observe(observer);
      destroyRef.onDestroy(() => text.unobserve(observer));
    });
  }

  protected typed(): void {
    const box = this.box().nativeElement;
    const text = this.session.notes;
    const splice = textSplice(text.toString(), box.value, box.selectionEnd);
    if (!splice || this.session.readOnly()) return;
    this.session.doc.transact(() => {
      if (splice.remove > 0) text.delete(splice.index, splice.remove);
      if (splice.insert) text.insert(splice.index, splice.insert);
    }, this.session.origin);
  }

  /** Someone else's edit (or an undo): new text in the box, the caret and selection carried through the change. */
  private applyRemote(delta: TextDelta): void {
    const box = this.box().nativeElement;
    const focused = box.ownerDocument.activeElement === box;
    const [start, end] = [box.selectionStart, box.selectionEnd];
    box.value = this.session.notes.toString();
    if (focused) box.setSelectionRange(mapPosition(start, delta), mapPosition(end, delta));
  }
}
