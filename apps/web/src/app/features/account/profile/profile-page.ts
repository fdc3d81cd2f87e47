import { ChangeDetectionStrategy, Component, effect, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { RouterLink } from '@angular/router';
import { DISPLAY_NAME_MAX, displayNameSchema, type Units } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { ConfigStore } from '../../../core/config/config-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';
import { AccountApi } from '../account-api';

@Component({
  selector: 'bw-profile-page',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatRadioModule],
  templateUrl: './profile-page.html',
  styleUrl: './profile-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProfilePage {
  private readonly auth = inject(AuthStore);
  private readonly api = inject(AccountApi);
  private readonly notifier = inject(Notifier);
  protected readonly config = inject(ConfigStore);

  /** The route is guarded, so `me` is set while this page lives. */
  protected readonly me = this.auth.me;
  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: ['', [Validators.required, contractValidator(displayNameSchema)]],
    units: ['mm' as Units],
  });
  protected readonly displayNameMax = DISPLAY_NAME_MAX;
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly resend = signal<'idle' | 'sending' | 'sent'>('idle');
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  constructor() {
    // Fill the form from the account whenever the server's answer changes (after a save, too).
    effect(() => {
      const me = this.auth.me();
      if (me) this.form.reset({ displayName: me.displayName, units: me.units });
    });
  }

  protected async saveProfile(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const { displayName, units } = this.form.getRawValue();
      await this.auth.updateProfile({ displayName: displayName.trim(), units });
      void this.notifier.tell('Profile saved.', undefined, 3000);
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }

  protected async resendVerification(): Promise<void> {
    this.resend.set('sending');
    try {
      await this.api.resendVerification();
      this.resend.set('sent');
    } catch (error) {
      this.resend.set('idle');
      throw error;
    }
  }
}
