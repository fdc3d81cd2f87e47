import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import type { ReportTarget } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { openReportDialog } from './report-dialog';

/**
 * “Report”: a quiet button other features drop beside an entry, a comment or a photo. It shows
 * only to signed-in members who are not the item's author, and opens the report dialog itself.
 */
@Component({
  selector: 'bw-report-button',
  imports: [MatButtonModule, MatIconModule],
  template: `
    @if (shown()) {
      <button mat-button type="button" class="report" (click)="report()" [attr.aria-label]="'Report ' + what()" [attr.data-testid]="testId()">
        <mat-icon aria-hidden="true">outlined_flag</mat-icon>Report
      </button>
    }
  `,
  styles: `
    .report {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReportButton {
  private readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  readonly target = input.required<ReportTarget>();
  /** What is reported, in words, for the dialog's title and the button's accessible name. */
  readonly what = input.required<string>();
  /** The item's author: nobody reports their own work. */
  readonly authorId = input<string | null>(null);
  readonly testId = input('report');

  protected readonly shown = computed(() => {
    const me = this.auth.me();
    return me !== null && me.id !== this.authorId();
  });

  protected async report(): Promise<void> {
    if (await openReportDialog(this.dialog, { target: this.target(), what: this.what() })) {
      void this.notifier.tell('Thank you. The moderators will look at it.', undefined, 4000);
    }
  }
}
