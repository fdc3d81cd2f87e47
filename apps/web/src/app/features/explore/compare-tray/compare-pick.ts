import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatCheckboxModule } from '@angular/material/checkbox';
import type { EntryCard } from '@barwright/contracts';
import { ComparePicks } from './compare-picks';

/** The "Compare" tick under a card in Explore. */
@Component({
  selector: 'bw-compare-pick',
  imports: [MatCheckboxModule],
  template: `
    <mat-checkbox [checked]="picked()" [disabled]="!picked() && picks.full()" (change)="picks.toggle(entry())"
                  data-testid="compare-pick" [title]="picked() || !picks.full() ? '' : 'Four bars are picked: take one off first'">
      Compare<span class="bw-visually-hidden"> “{{ entry().title }}”</span>
    </mat-checkbox>
  `,
  styles: `
    :host {
      display: block;
      margin-top: 0.125rem;
      font: var(--mat-sys-label-large);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComparePick {
  protected readonly picks = inject(ComparePicks);
  readonly entry = input.required<EntryCard>();
  protected readonly picked = computed(() => this.picks.picks().some((p) => p.id === this.entry().id));
}
