import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { emailSchema } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { ApiError } from '../../../core/http/api-error';
import { safeReturnUrl } from '../../../core/auth/return-url';
import { Notifier } from '../../../core/error-handling/notifier';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';

const SIGN_IN_PROBLEMS = {
  invalid_credentials: 'That e-mail and password do not match an account. Check both, or reset the password.',
  suspended: 'This account is suspended. Ask an admin of your club to restore it.',
  rate_limited: 'Too many attempts. Wait a few minutes, then try again.',
  // The server locks an account for 15 minutes after 8 failed sign-ins (rate-limits.ts), right password or not.
  locked: 'After too many failed sign-ins this account is locked for up to 15 minutes, even with the right password. Wait, or',
};

@Component({
  selector: 'bw-sign-in-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule],
  templateUrl: './sign-in-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {
  protected readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);

  /** `?next=` — where the visitor was going before being asked to sign in. */
  readonly next = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, contractValidator(emailSchema)]],
    password: ['', Validators.required],
  });
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  /** The account is locked: the page offers the password reset beside the message. */
  protected readonly locked = signal(false);
  protected readonly passwordVisible = signal(false);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected async signIn(): Promise<void> {
    this.problem.set(null);
    this.locked.set(false);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const me = await this.auth.signIn(this.form.getRawValue());
      await this.router.navigateByUrl(safeReturnUrl(this.next()));
      void this.notifier.tell(`Signed in as ${me.displayName}.`, undefined, 4000);
    } catch (error) {
      this.problem.set(formProblem(error, this.form, SIGN_IN_PROBLEMS));
      this.locked.set(error instanceof ApiError && error.code === 'locked');
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}
