import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import type { ReportTarget } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';

/**
 * “Moderation”: a menu other features drop beside an item, shown only to moderators and admins,
 * leading to the desk and to the item's own lines in the audit log (no id to copy by hand).
 */
@Component({
  selector: 'bw-moderator-menu',
  imports: [RouterLink, MatButtonModule, MatIconModule, MatMenuModule],
  template: `
    @if (shown()) {
      <button mat-button type="button" class="moderation" [matMenuTriggerFor]="menu" [attr.aria-label]="'Moderation of ' + what()" data-testid="moderator-menu">
        <mat-icon aria-hidden="true">shield</mat-icon>Moderation
      </button>
      <mat-menu #menu="matMenu">
        <a mat-menu-item routerLink="/moderation/audit" [queryParams]="{ item: target().id }" data-testid="moderator-menu-audit">
          <mat-icon aria-hidden="true">history</mat-icon><span>History in the audit log</span>
        </a>
        <a mat-menu-item [routerLink]="hidden() ? '/moderation/hidden' : '/moderation/reports'" data-testid="moderator-menu-desk">
          <mat-icon aria-hidden="true">gavel</mat-icon><span>{{ hidden() ? 'Hidden items at the desk' : 'Reports at the desk' }}</span>
        </a>
      </mat-menu>
    }
  `,
  styles: `
    .moderation {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ModeratorMenu {
  private readonly auth = inject(AuthStore);
  readonly target = input.required<ReportTarget>();
  /** The item in words, for the button's accessible name. */
  readonly what = input.required<string>();
  /** The item is hidden now (the desk's hidden list holds its case). */
  readonly hidden = input(false);

  protected readonly shown = computed(() => this.auth.hasRole(['moderator', 'admin']));
}
