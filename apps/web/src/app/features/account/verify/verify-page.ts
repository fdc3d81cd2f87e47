import { ChangeDetectionStrategy, Component, computed, inject, input, OnInit, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../../core/auth/auth-store';
import { ApiError } from '../../../core/http/api-error';
import { AccountApi } from '../account-api';

type VerifyState = { step: 'checking' } | { step: 'verified' } | { step: 'failed'; reason: string };

/** Opened from the link in the verification mail: `/account/verify?token=…`. */
@Component({
  selector: 'bw-verify-page',
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressSpinnerModule],
  templateUrl: './verify-page.html',
  styles: `
    .checking {
      display: flex;
      align-items: center;
      gap: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VerifyPage implements OnInit {
  private readonly api = inject(AccountApi);
  protected readonly auth = inject(AuthStore);

  readonly token = input<string>();
  protected readonly state = signal<VerifyState>({ step: 'checking' });
  protected readonly failureReason = computed(() => {
    const state = this.state();
    return state.step === 'failed' ? state.reason : '';
  });

  ngOnInit(): void {
    void this.verify();
  }

  private async verify(): Promise<void> {
    const token = this.token();
    if (!token) {
      this.state.set({ step: 'failed', reason: 'This link has no verification code in it. Copy the whole link from the mail.' });
      return;
    }
    try {
      await this.api.verifyEmail(token);
      this.state.set({ step: 'verified' });
      if (this.auth.signedIn()) await this.auth.load();
    } catch (error) {
      if (error instanceof ApiError && error.retryable) throw error;
      this.state.set({ step: 'failed', reason: 'This link has expired, has been used already, or is not complete.' });
    }
  }
}
