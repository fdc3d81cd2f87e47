import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { PASSWORD_MAX, PASSWORD_MIN, passwordSchema } from '@barwright/contracts';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';
import { ApiError } from '../../../core/http/api-error';
import { AccountApi } from '../account-api';

const BAD_LINK = 'This link has expired or has been used already. Ask for a new one below.';

/** A spent, expired or mangled token: the server names the `token` field or answers with a 4xx of its own. */
function isBadLink(error: unknown): boolean {
  if (!(error instanceof ApiError) || error.retryable) return false;
  return 'token' in error.fields || ['not_found', 'gone', 'invalid_token', 'token_expired'].includes(error.code);
}

/** Opened from the link in the reset mail: `/account/reset?token=…`. */
@Component({
  selector: 'bw-reset-password-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule],
  templateUrl: './reset-password-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage {
  private readonly api = inject(AccountApi);

  readonly token = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, contractValidator(passwordSchema)]],
  });
  protected readonly limits = { min: PASSWORD_MIN, max: PASSWORD_MAX };
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly done = signal(false);
  protected readonly passwordVisible = signal(false);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected async setPassword(): Promise<void> {
    this.problem.set(null);
    const token = this.token();
    if (!token || this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      await this.api.confirmPasswordReset(token, this.form.getRawValue().password);
      this.done.set(true);
    } catch (error) {
      this.problem.set(isBadLink(error) ? BAD_LINK : formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}
