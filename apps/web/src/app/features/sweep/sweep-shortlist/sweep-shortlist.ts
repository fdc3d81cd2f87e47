import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

/** The starred candidates, and sending them to a board. */
@Component({
  selector: 'bw-sweep-shortlist',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <section class="panel" aria-labelledby="shortlist-title" data-testid="sweep-shortlist">
      <h2 id="shortlist-title">Shortlist <span class="count">{{ items().length }}</span></h2>
      @if (items().length) {
        <ol class="list">
          @for (s of items(); track s.index) {
            <li data-testid="sweep-shortlist-item">
              <span class="title">{{ s.title }}</span>
              <button mat-icon-button type="button" (click)="unstar.emit(s.index)" [attr.aria-label]="'Unstar ' + s.title"><mat-icon aria-hidden="true">close</mat-icon></button>
            </li>
          }
        </ol>
        <button mat-flat-button type="button" (click)="send.emit()" data-testid="sweep-send">Send to board</button>
      } @else {
        <p class="empty">Star the candidates worth cutting; send them to a board as bar designs in one go.</p>
      }
    </section>
  `,
  styles: `
    .panel { border: 1px solid var(--mat-sys-outline-variant); border-radius: 8px; padding: 0.5rem 0.75rem 0.75rem; }
    h2 { font-size: 1rem; font-weight: 500; margin: 0.25rem 0 0.5rem; }
    .count { font-weight: 400; color: var(--mat-sys-on-surface-variant); margin-left: 0.25rem; }
    .list { margin: 0 0 0.5rem; padding-left: 1.25rem; max-height: 16rem; overflow: auto; }
    li { font-size: 0.875rem; }
    li > * { vertical-align: middle; }
    .title { overflow-wrap: anywhere; }
    .empty { margin: 0; font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepShortlist {
  readonly items = input.required<readonly { index: number; title: string }[]>();
  readonly unstar = output<number>();
  readonly send = output<void>();
}
