import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { EntryCard as EntryCardData, Units } from '@barwright/contracts';
import { countText, cutterText, MATERIAL_NAMES, ratingText, SCHEDULE_NAMES, WAVE_NAMES } from '../entry-facts/entry-facts';
import { DateTextPipe } from '../dates/date-text-pipe';

/** A published bar as a card: its line-study thumbnail, title (the link), author and facts. */
@Component({
  selector: 'bw-entry-card',
  imports: [DateTextPipe, RouterLink, MatIconModule],
  templateUrl: './entry-card.html',
  styleUrl: './entry-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryCard {
  readonly entry = input.required<EntryCardData>();
  /** The reader's units for the cutter size. */
  readonly units = input<Units>('mm');
  /** Offers "more by this author" when set (Explore filters by author). */
  readonly authorFilter = input(false);
  readonly authorChosen = output<{ id: string; displayName: string }>();

  protected readonly waveName = computed(() => WAVE_NAMES[this.entry().wave]);
  protected readonly materialName = computed(() => MATERIAL_NAMES[this.entry().material]);
  /** Explore's cards carry the phase schedule; other lists may not. */
  protected readonly scheduleName = computed(() => {
    const kind = this.entry().schedule;
    return kind ? SCHEDULE_NAMES[kind] : null;
  });
  protected readonly cutter = computed(() => cutterText(this.entry().cutterDiameterMm, this.units()));
  protected readonly rating = computed(() => ratingText(this.entry().rating));
  protected readonly remixes = computed(() => countText(this.entry().remixCount, 'remix', 'remixes'));
  protected readonly comments = computed(() => countText(this.entry().commentCount, 'comment'));
}
