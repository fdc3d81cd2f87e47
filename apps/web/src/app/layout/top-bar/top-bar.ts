import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { map } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { ConfigStore } from '../../core/config/config-store';
import { AccountMenu } from '../account-menu/account-menu';
import { NotificationBell } from '../notification-bell/notification-bell';
import { navLinksFor } from './nav-links';
import { DeskCount } from '../../features/moderation/desk-count';

/** Below this width the navigation folds into a "Menu" button. */
const COMPACT_QUERY = '(max-width: 719.98px)';
/** Below this width it folds too when it holds more than MEDIUM_LINKS_MAX links (moderators and admins have more destinations). */
const MEDIUM_QUERY = '(max-width: 1023.98px)';
const MEDIUM_LINKS_MAX = 4;

@Component({
  selector: 'bw-top-bar',
  imports: [RouterLink, RouterLinkActive, MatButtonModule, MatIconModule, MatMenuModule, AccountMenu, NotificationBell],
  templateUrl: './top-bar.html',
  styleUrl: './top-bar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TopBar {
  protected readonly auth = inject(AuthStore);
  private readonly config = inject(ConfigStore);
  private readonly desk = inject(DeskCount);

  private readonly widths = toSignal(
    inject(BreakpointObserver)
      .observe([COMPACT_QUERY, MEDIUM_QUERY])
      .pipe(map((state) => ({ narrow: state.breakpoints[COMPACT_QUERY], medium: state.breakpoints[MEDIUM_QUERY] }))),
    { initialValue: { narrow: false, medium: false } },
  );
  protected readonly compact = computed(() => this.widths().narrow || (this.widths().medium && this.links().length > MEDIUM_LINKS_MAX));

  protected readonly links = computed(() =>
    navLinksFor({
      isAdmin: this.auth.isAdmin(),
      isModerator: this.auth.role() === 'moderator',
      openReports: this.desk.openReports(),
      localMail: this.config.config().localMail,
      signedIn: this.auth.signedIn(),
    }),
  );
}
