import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { CollabSession } from './collab-session';
import { STATUS_TEXT, type ConnectionStatus } from './connection-status';

const ICONS: Readonly<Record<ConnectionStatus, string>> = {
  connecting: 'sync',
  live: 'cloud_done',
  offline: 'cloud_off',
  'signed-out': 'lock',
  'no-access': 'block',
  refused: 'sync_problem',
};

/**
 * The link to the server, always in sight: connecting, live or offline (edits merge when it returns).
 * Shown only: ConnectionAnnouncer says it to screen readers, from one place that does not move.
 */
@Component({
  selector: 'bw-connection-chip',
  imports: [MatIconModule],
  template: `
    <span class="chip" [class]="'chip ' + session.status()" data-testid="connection-status" [attr.data-status]="session.status()">
      <mat-icon aria-hidden="true">{{ icon() }}</mat-icon>
      <span class="text">{{ text() }}</span>
    </span>
  `,
  styles: `
    .chip {
      display: inline-flex;
      align-items: center;
      gap: 0.375rem;
      max-width: 100%;
      padding: 0.25rem 0.75rem 0.25rem 0.5rem;
      border-radius: 999px;
      font: var(--mat-sys-label-large);
      background: var(--mat-sys-surface-container-high);
      color: var(--mat-sys-on-surface-variant);

      .mat-icon {
        flex: none;
        font-size: 18px;
        width: 18px;
        height: 18px;
      }
      &.live {
        background: color-mix(in srgb, #2e7d32 16%, var(--mat-sys-surface));
        color: light-dark(#1b5e20, #a5d6a7);
      }
      &.offline,
      &.signed-out,
      &.no-access,
      &.refused {
        background: var(--mat-sys-error-container);
        color: var(--mat-sys-on-error-container);
      }
    }
    .text {
      overflow: hidden;
      text-overflow: ellipsis;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConnectionChip {
  protected readonly session = inject(CollabSession);
  protected readonly icon = computed(() => ICONS[this.session.status()]);
  protected readonly text = computed(() => STATUS_TEXT[this.session.status()]);
}
