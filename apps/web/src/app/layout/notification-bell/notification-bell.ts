import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatBadgeModule } from '@angular/material/badge';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { NotificationCenter } from '../../core/notifications/notification-center';

/** The bell in the top bar: the unread count, live; opens the notifications page. */
@Component({
  selector: 'bw-notification-bell',
  imports: [RouterLink, RouterLinkActive, MatBadgeModule, MatButtonModule, MatIconModule],
  template: `
    <a mat-button routerLink="/notifications" routerLinkActive="active" class="bell" [class.compact]="compact()" [attr.aria-label]="label()"
       data-testid="notification-bell">
      <mat-icon aria-hidden="true" [matBadge]="badge()" [matBadgeHidden]="center.unread() === 0" matBadgeSize="medium" matBadgeColor="accent"
                matBadgeOverlap="true" [matBadgeDescription]="''">notifications</mat-icon>
      @if (!compact()) { <span class="text">Notifications</span> }
      <span class="bw-visually-hidden" data-testid="notification-bell-count">{{ center.unread() }}</span>
    </a>
  `,
  styles: `
    .bell {
      --mat-badge-background-color: var(--bw-brass);
      --mat-badge-text-color: var(--bw-on-brass);
      &.compact {
        min-width: 48px;
        padding-inline: 0.75rem;
      }
      &.active {
        background: var(--mat-sys-secondary-container);
      }
    }
    .mat-icon {
      overflow: visible;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotificationBell {
  protected readonly center = inject(NotificationCenter);
  /** Narrow top bar: the icon and count only (the link keeps its name for screen readers). */
  readonly compact = input(false);
  protected readonly badge = computed(() => (this.center.unread() > 99 ? '99+' : String(this.center.unread())));
  protected readonly label = computed(() => {
    const n = this.center.unread();
    return n === 0 ? 'Notifications, none unread' : `Notifications, ${n} unread`;
  });
}
