import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatIconModule } from '@angular/material/icon';
import type { SweepCandidate } from '@barwright/contracts';
import { cardWords, cutterWords, rubberWords, travelWords } from '../candidate-words';
import type { SweepItem, SweepLight, SweepStudy } from '../run/sweep-types';
import { SweepThumb } from '../run/sweep-thumb';

/** One candidate of the sweep: its small lit study, what it is, its figures, and the star, compare pick and "Shown and opposite". */
@Component({
  selector: 'bw-sweep-card',
  imports: [MatButtonModule, MatCheckboxModule, MatIconModule, SweepThumb],
  template: `
    <article class="card" data-testid="sweep-card" [attr.data-loss]="words()?.lossYes ? 'yes' : 'no'" [attr.aria-label]="candidate().rosette.name">
      <div class="thumb">
        @if (item(); as it) {
          @if (it.ok) {
            <bw-sweep-thumb [item]="it" [study]="study()" [light]="light()" />
          } @else {
            <p class="refused" role="note">Not computed: {{ it.message }}</p>
          }
        } @else {
          <div class="pending" aria-hidden="true"></div>
        }
      </div>
      <header class="head">
        <h3 class="name" data-testid="sweep-card-name">{{ candidate().rosette.name }}</h3>
        <button mat-icon-button type="button" class="star" [class.on]="starred()" (click)="star.emit(!starred())"
                [attr.aria-pressed]="starred()" [attr.aria-label]="(starred() ? 'Unstar ' : 'Star ') + candidate().rosette.name" data-testid="sweep-star">
          <mat-icon aria-hidden="true">{{ starred() ? 'star' : 'star_outline' }}</mat-icon>
        </button>
      </header>
      <p class="what">{{ what() }}</p>
      @if (words(); as w) {
        <dl class="figures">
          <div><dt>Period</dt><dd>{{ w.period }}</dd></div>
          <div><dt>Bar height</dt><dd>{{ w.height }}</dd></div>
          <div class="span"><dt>Smallest crest radius</dt><dd [class.warn]="w.crestTight">{{ w.crest }}</dd></div>
          <div><dt>Detail lost</dt><dd [class.warn]="w.lossYes" data-testid="sweep-card-loss">{{ w.loss }}</dd></div>
          <div><dt>Keeper</dt><dd>{{ w.keeper }}</dd></div>
        </dl>
      } @else if (!item()) {
        <p class="working">Working it out…</p>
      }
      <footer class="actions">
        <mat-checkbox [checked]="picked()" [disabled]="!picked() && !canPick()" (change)="pick.emit($event.checked)" data-testid="sweep-compare-pick">Compare</mat-checkbox>
        <button mat-button type="button" [disabled]="!words()" (click)="opposite.emit()" data-testid="sweep-opposite">Shown and opposite</button>
      </footer>
    </article>
  `,
  styleUrl: './sweep-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepCard {
  readonly candidate = input.required<SweepCandidate>();
  readonly item = input<SweepItem | undefined>(undefined);
  /** The study and light the thumbnail draws with (mm). */
  readonly study = input.required<SweepStudy>();
  readonly light = input.required<SweepLight>();
  readonly starred = input(false);
  readonly picked = input(false);
  /** Whether another candidate may be picked for comparing (at most 4). */
  readonly canPick = input(true);
  /** Whether the sweep takes more than one cutter (then each card names its cutter). */
  readonly showCutter = input(false);

  readonly star = output<boolean>();
  readonly pick = output<boolean>();
  readonly opposite = output<void>();

  protected readonly words = computed(() => {
    const it = this.item();
    return it?.ok ? cardWords(this.candidate(), it.figures) : null;
  });
  protected readonly what = computed(() => {
    const c = this.candidate();
    const parts = [c.rubber.name || rubberWords(c.rubber, c.units), c.travel.name || travelWords(c.travel, c.units)];
    if (this.showCutter()) parts.push(c.cutter.name || cutterWords(c.cutter, c.units));
    return parts.join(' · ');
  });
}
