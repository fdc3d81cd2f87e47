import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatChipInputEvent, MatChipsModule } from '@angular/material/chips';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ENTRY_DESCRIPTION_MAX, ENTRY_TAGS_MAX, ENTRY_TITLE_MAX, publishBody, type PublishResult } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { ApiError } from '../../core/http/api-error';
import { contractValidator } from '../forms/contract-validator';
import { fieldMessage } from '../forms/field-message';
import { formProblem } from '../forms/form-problem';
import { injectInvalidFocus } from '../forms/invalid-focus';
import { PublishApi } from './publish-api';
import { publishStart, type PublishRequest, type PublishStart } from './publish-start';
import { addTags } from './tag-entry';

export type { PublishRequest } from './publish-start';

/** The server's answer to a publish, with the entry title it was published under. */
export type PublishedEntry = PublishResult & { title: string };

/**
 * Publishes a board design as an entry, or as the next revision of the entry it was published as
 * before (then the form starts from that entry's words); closes with the server's answer.
 */
@Component({
  selector: 'bw-publish-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatChipsModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule],
  templateUrl: './publish-dialog.html',
  styleUrl: './publish-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublishDialog {
  private readonly request = inject<PublishRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<PublishDialog, PublishedEntry>>(MatDialogRef);
  private readonly api = inject(PublishApi);
  private readonly first = publishStart(this.request, null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    title: [this.first.title, [Validators.required, contractValidator(publishBody.shape.title)]],
    description: [this.first.description, [contractValidator(publishBody.shape.description)]],
  });
  protected readonly tags = signal<string[]>(this.first.tags);
  private tagsEdited = false;
  protected readonly tagProblem = signal<string | null>(null);
  /** True until the server has said whether the design was published before. */
  protected readonly checking = signal(true);
  protected readonly checkProblem = signal<string | null>(null);
  protected readonly revision = signal<PublishStart['revision']>(null);
  protected readonly heading = computed(() => (this.revision() ? `Publish revision ${this.revision()!.next}` : 'Publish bar design'));
  protected readonly submitLabel = computed(() => (this.revision() ? `Publish revision ${this.revision()!.next}` : 'Publish'));
  protected readonly titleMax = ENTRY_TITLE_MAX;
  protected readonly descriptionMax = ENTRY_DESCRIPTION_MAX;
  protected readonly tagsMax = ENTRY_TAGS_MAX;
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  constructor() {
    void this.checkEntry();
  }

  /** Asks for the design's entry; publishing waits for the answer so a republish never goes out with blank words. */
  protected async checkEntry(): Promise<void> {
    this.checking.set(true);
    this.checkProblem.set(null);
    try {
      this.startFrom(publishStart(this.request, await this.api.entryOf(this.request.designId)));
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      this.checkProblem.set(`Could not tell whether this design was published before. ${error.message}`);
    } finally {
      this.checking.set(false);
    }
  }

  /** Fills in the entry's words, except in the fields the member has already typed in. */
  private startFrom(start: PublishStart): void {
    this.revision.set(start.revision);
    const { title, description } = this.form.controls;
    if (title.pristine) title.setValue(start.title);
    if (description.pristine) description.setValue(start.description);
    if (!this.tagsEdited) this.tags.set(start.tags);
  }

  protected addTag(event: MatChipInputEvent): void {
    const entry = addTags(this.tags(), event.value);
    if (entry.tags.length !== this.tags().length) this.tagsEdited = true;
    this.tags.set(entry.tags);
    this.tagProblem.set(entry.problem);
    event.chipInput.clear();
  }

  protected removeTag(tag: string): void {
    this.tagsEdited = true;
    this.tags.update((tags) => tags.filter((t) => t !== tag));
    this.tagProblem.set(null);
  }

  protected async submit(): Promise<void> {
    this.problem.set(null);
    if (this.checking() || this.checkProblem()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const title = this.form.controls.title.value.trim();
      const description = this.form.controls.description.value.trim();
      const result = await this.api.publish(this.request.designId, { title, description, tags: this.tags() });
      this.ref.close({ ...result, title });
    } catch (error) {
      // A design with invalid fields answers 422 naming them (paths of the design file): shown above the form.
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}

/** Opens the publish dialog; resolves with the entry and revision made, or undefined when cancelled. */
export async function openPublishDialog(dialog: MatDialog, request: PublishRequest): Promise<PublishedEntry | undefined> {
  const ref = dialog.open<PublishDialog, PublishRequest, PublishedEntry>(PublishDialog, {
    data: request,
    width: '34rem',
    maxWidth: 'calc(100vw - 2rem)',
    autoFocus: 'first-tabbable',
  });
  return firstValueFrom(ref.afterClosed());
}
