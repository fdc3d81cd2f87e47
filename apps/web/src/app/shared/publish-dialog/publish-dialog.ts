import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatChipInputEvent, MatChipsModule } from '@angular/material/chips';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { ENTRY_DESCRIPTION_MAX, ENTRY_TAGS_MAX, ENTRY_TITLE_MAX, publishBody, type PublishResult } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { contractValidator } from '../forms/contract-validator';
import { fieldMessage } from '../forms/field-message';
import { formProblem } from '../forms/form-problem';
import { injectInvalidFocus } from '../forms/invalid-focus';
import { PublishApi } from './publish-api';
import { addTags } from './tag-entry';

/** Which design to publish, and what to start the form with. */
export interface PublishRequest {
  designId: string;
  title: string;
  description?: string;
  tags?: readonly string[];
}

/** Publishes a board design as an entry (or a new revision of its entry); closes with the server's answer. */
@Component({
  selector: 'bw-publish-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatChipsModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './publish-dialog.html',
  styleUrl: './publish-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublishDialog {
  private readonly request = inject<PublishRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<PublishDialog, PublishResult>>(MatDialogRef);
  private readonly api = inject(PublishApi);
  protected readonly form = inject(NonNullableFormBuilder).group({
    title: [this.request.title.slice(0, ENTRY_TITLE_MAX), [Validators.required, contractValidator(publishBody.shape.title)]],
    description: [this.request.description ?? '', [contractValidator(publishBody.shape.description)]],
  });
  protected readonly tags = signal<string[]>([...(this.request.tags ?? [])]);
  protected readonly tagProblem = signal<string | null>(null);
  protected readonly titleMax = ENTRY_TITLE_MAX;
  protected readonly descriptionMax = ENTRY_DESCRIPTION_MAX;
  protected readonly tagsMax = ENTRY_TAGS_MAX;
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected addTag(event: MatChipInputEvent): void {
    const entry = addTags(this.tags(), event.value);
    this.tags.set(entry.tags);
    this.tagProblem.set(entry.problem);
    event.chipInput.clear();
  }

  protected removeTag(tag: string): void {
    this.tags.update((tags) => tags.filter((t) => t !== tag));
    this.tagProblem.set(null);
  }

  protected async submit(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const { title, description } = this.form.getRawValue();
      this.ref.close(await this.api.publish(this.request.designId, { title: title.trim(), description: description.trim(), tags: this.tags() }));
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
export async function openPublishDialog(dialog: MatDialog, request: PublishRequest): Promise<PublishResult | undefined> {
  const ref = dialog.open<PublishDialog, PublishRequest, PublishResult>(PublishDialog, {
    data: request,
    width: '34rem',
    maxWidth: 'calc(100vw - 2rem)',
    autoFocus: 'first-tabbable',
  });
  return firstValueFrom(ref.afterClosed());
}
