import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { DISPLAY_NAME_MAX, displayNameSchema, emailSchema, PASSWORD_MAX, PASSWORD_MIN, passwordSchema } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { ConfigStore } from '../../../core/config/config-store';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';
import { AccountApi } from '../account-api';

@Component({
  selector: 'bw-sign-up-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './sign-up-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignUpPage {
  private readonly api = inject(AccountApi);
  protected readonly auth = inject(AuthStore);
  protected readonly config = inject(ConfigStore);

  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: ['', [Validators.required, contractValidator(displayNameSchema)]],
    email: ['', [Validators.required, contractValidator(emailSchema)]],
    password: ['', [Validators.required, contractValidator(passwordSchema)]],
  });
  protected readonly limits = { displayName: DISPLAY_NAME_MAX, passwordMin: PASSWORD_MIN, passwordMax: PASSWORD_MAX };
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly passwordVisible = signal(false);
  /** The address the verification mail went to, once the account exists. */
  protected readonly sentTo = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected async signUp(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    const body = this.form.getRawValue();
    try {
      await this.api.signUp(body);
      this.sentTo.set(body.email.trim());
    } catch (error) {
      this.problem.set(formProblem(error, this.form, { conflict: 'That e-mail address cannot be used for a new account. If it is yours, sign in or reset the password.' }));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}
