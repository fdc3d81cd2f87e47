import { ChangeDetectionStrategy, Component, input, OnInit, output, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { COMMENT_MAX, newCommentBody } from '@barwright/contracts';
import { ApiError } from '../../../core/http/api-error';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';

/** A comment's text: a new comment, a reply, or an edit. Plain text; links become clickable when shown. */
@Component({
  selector: 'bw-comment-form',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <form (submit)="$event.preventDefault(); submit()" novalidate class="comment-form">
      <mat-form-field class="field">
        <mat-label>{{ label() }}</mat-label>
        <textarea matInput [formControl]="body" rows="3" [attr.maxlength]="max" [attr.data-testid]="testId() + '-body'"></textarea>
        <mat-hint>Plain text; web addresses become links. {{ body.value.length }} / {{ max }}</mat-hint>
        <mat-error>{{ fieldMessage(label(), body.errors) }}</mat-error>
      </mat-form-field>
      @if (problem(); as message) {
        <p class="bw-form-alert" role="alert" [attr.data-testid]="testId() + '-problem'">{{ message }}</p>
      }
      <div class="actions">
        @if (cancellable()) {
          <button mat-button type="button" (click)="cancelled.emit()">Cancel</button>
        }
        <button mat-flat-button type="submit" [disabled]="busy()" [attr.data-testid]="testId() + '-submit'">{{ busy() ? 'Sending…' : submitLabel() }}</button>
      </div>
    </form>
  `,
  styles: `
    .comment-form {
      display: flex;
      flex-direction: column;
      gap: 0.5rem;
    }
    .field {
      width: 100%;
    }
    .actions {
      display: flex;
      flex-wrap: wrap;
      justify-content: flex-end;
      gap: 0.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CommentForm implements OnInit {
  readonly label = input('Comment');
  readonly submitLabel = input('Post comment');
  readonly initial = input('');
  readonly cancellable = input(false);
  readonly testId = input('comment-new');
  /** Sends the trimmed text; a refusal stays in the form. */
  readonly save = input.required<(body: string) => Promise<void>>();
  readonly cancelled = output<void>();

  protected readonly max = COMMENT_MAX;
  protected readonly body = new FormControl('', { nonNullable: true, validators: [Validators.required, contractValidator(newCommentBody.shape.body)] });
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;

  ngOnInit(): void {
    this.body.setValue(this.initial());
  }

  protected async submit(): Promise<void> {
    this.problem.set(null);
    if (this.body.invalid) {
      this.body.markAsTouched();
      return;
    }
    this.busy.set(true);
    try {
      await this.save()(this.body.value.trim());
      this.body.reset('');
    } catch (error) {
      // The server's pace message names its limit; other refusals go through the usual form rules.
      this.problem.set(error instanceof ApiError && error.status === 429 ? error.message : formProblem(error, this.body));
    } finally {
      this.busy.set(false);
    }
  }
}
