import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatTabsModule } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';

interface DeskTab {
  path: string;
  label: string;
  icon: string;
  testId: string;
}

/** The moderation desk's frame: its title and tabs (reports, hidden items, showcase, audit log) around the page chosen. */
@Component({
  selector: 'bw-desk-shell',
  imports: [RouterLink, RouterLinkActive, RouterOutlet, MatIconModule, MatTabsModule],
  template: `
    <section class="bw-page desk" aria-labelledby="desk-title">
      <h1 id="desk-title">Moderation desk</h1>
      <nav mat-tab-nav-bar [tabPanel]="panel" mat-stretch-tabs="false" mat-align-tabs="start" aria-label="Moderation desk" class="tabs">
        @for (tab of tabs; track tab.path) {
          <a mat-tab-link [routerLink]="tab.path" routerLinkActive #rla="routerLinkActive" [active]="rla.isActive" [attr.data-testid]="tab.testId">
            <mat-icon aria-hidden="true">{{ tab.icon }}</mat-icon><span>{{ tab.label }}</span>
          </a>
        }
      </nav>
      <mat-tab-nav-panel #panel class="panel"><router-outlet /></mat-tab-nav-panel>
    </section>
  `,
  styles: `
    .tabs {
      margin-bottom: 1.5rem;
      --mat-tab-header-divider-color: var(--bw-rule);
    }
    .mat-mdc-tab-link .mat-icon {
      margin-right: 0.5rem;
    }
    @media (max-width: 599.98px) {
      .mat-mdc-tab-link {
        min-width: 0;
        padding-inline: 0.75rem;
      }
      .mat-mdc-tab-link .mat-icon {
        display: none;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeskShell {
  protected readonly tabs: DeskTab[] = [
    { path: 'reports', label: 'Reports', icon: 'outlined_flag', testId: 'desk-tab-reports' },
    { path: 'hidden', label: 'Hidden', icon: 'visibility_off', testId: 'desk-tab-hidden' },
    { path: 'showcase', label: 'Showcase', icon: 'collections', testId: 'desk-tab-showcase' },
    { path: 'audit', label: 'Audit log', icon: 'history', testId: 'desk-tab-audit' },
  ];
}
