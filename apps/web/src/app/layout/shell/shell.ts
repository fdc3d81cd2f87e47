import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, inject } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { NavigationEnd, Router, RouterOutlet } from '@angular/router';
import { filter, skip } from 'rxjs';
import { GroundStore } from '../../core/appearance/ground-store';
import { ConfigStore } from '../../core/config/config-store';
import { TopBar } from '../top-bar/top-bar';

/** The frame around every page: skip link, top bar, main region, footer. */
@Component({
  selector: 'bw-shell',
  imports: [RouterOutlet, TopBar, MatButtonModule, MatIconModule],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly document = inject(DOCUMENT);
  protected readonly config = inject(ConfigStore);
  protected readonly ground = inject(GroundStore);

  constructor() {
    // After a route change, move focus to the new page so keyboard and screen-reader users start there.
    inject(Router)
      .events.pipe(
        filter((e) => e instanceof NavigationEnd),
        skip(1),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe(() => this.focusMain());
  }

  protected skipToMain(event: Event): void {
    event.preventDefault();
    this.focusMain();
  }

  protected reload(): void {
    this.document.location.reload();
  }

  private focusMain(): void {
    this.document.getElementById('main')?.focus({ preventScroll: true });
  }
}
