import { ChangeDetectionStrategy, Component, inject, input, OnInit, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { Router, RouterLink } from '@angular/router';
import { Notifier } from '../../../core/error-handling/notifier';
import { ApiError } from '../../../core/http/api-error';
import { BoardsApi } from '../boards-api';

type AcceptState = { step: 'accepting' } | { step: 'failed'; reason: string };

/** Opened from the invitation mail: `/boards/invitations/accept?token=…` (the route makes visitors sign in first). */
@Component({
  selector: 'bw-invitation-accept-page',
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressSpinnerModule],
  template: `
    <section class="bw-page bw-page--narrow" aria-labelledby="accept-title">
      @switch (state().step) {
        @case ('accepting') {
          <h1 id="accept-title">Joining the board</h1>
          <div class="bw-panel checking" role="status">
            <mat-spinner diameter="28" aria-hidden="true" />
            <span>Accepting the invitation…</span>
          </div>
        }
        @case ('failed') {
          <h1 id="accept-title">This invitation did not work</h1>
          <div class="bw-panel" role="alert" data-testid="invitation-failed">
            <p>{{ reason() }}</p>
            <a mat-flat-button class="bw-brass" routerLink="/boards">Go to your boards</a>
          </div>
        }
      }
    </section>
  `,
  styles: `
    .checking {
      display: flex;
      align-items: center;
      gap: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InvitationAcceptPage implements OnInit {
  private readonly api = inject(BoardsApi);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);

  readonly token = input<string>();
  protected readonly state = signal<AcceptState>({ step: 'accepting' });
  protected readonly reason = () => {
    const s = this.state();
    return s.step === 'failed' ? s.reason : '';
  };

  ngOnInit(): void {
    void this.accept();
  }

  private async accept(): Promise<void> {
    const token = this.token();
    if (!token) {
      this.state.set({ step: 'failed', reason: 'This link has no invitation code in it. Copy the whole link from the mail.' });
      return;
    }
    try {
      const { boardId } = await this.api.acceptInvitation(token);
      await this.router.navigate(['/boards', boardId], { replaceUrl: true });
      void this.notifier.tell('You have joined the board.', undefined, 4000);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const reason = error.status === 400 && error.code === 'invalid_input' ? 'This link is not complete. Copy the whole link from the mail.' : error.message;
      this.state.set({ step: 'failed', reason });
    }
  }
}
