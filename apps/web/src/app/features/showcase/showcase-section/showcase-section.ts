import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { ShowcaseItem, Units } from '@barwright/contracts';
import { showcaseColumns } from './showcase-columns';
import { cutterText, ratingText, WAVE_NAMES } from '../../../shared/entry-facts/entry-facts';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/**
 * The showcase as the home page opens on it: the bars the moderators chose, in their order, each
 * with the curator's note and when it was featured. The first is drawn large.
 */
@Component({
  selector: 'bw-showcase-section',
  imports: [DateTextPipe, RouterLink, MatIconModule],
  templateUrl: './showcase-section.html',
  styleUrl: './showcase-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShowcaseSection {
  /** Null while loading. */
  readonly items = input.required<readonly ShowcaseItem[] | null>();
  readonly units = input<Units>('mm');
  /** Moderators get a link to the curation. */
  readonly canCurate = input(false);

  protected readonly first = computed(() => this.items()?.[0] ?? null);
  protected readonly rest = computed(() => this.items()?.slice(1) ?? []);
  /** Columns for the cards after the first on a wide screen, and on a tablet. */
  protected readonly columns = computed(() => showcaseColumns(this.rest().length));
  protected readonly columnsMid = computed(() => showcaseColumns(this.rest().length, 2));
  protected readonly waveNames = WAVE_NAMES;
  protected readonly cutter = (mm: number) => cutterText(mm, this.units());
  protected readonly rating = ratingText;
}
