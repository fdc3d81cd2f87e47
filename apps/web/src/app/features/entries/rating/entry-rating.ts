import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { STARS_MAX, type RatingSummary } from '@barwright/contracts';
import { ratingText } from '../../../shared/entry-facts/entry-facts';
import { starFills, starsText } from './star-fills';

/**
 * The bar's rating (mean with the count beside it) and, for a signed-in member who is not the author,
 * their own stars: five radio buttons (arrow keys move between them), changeable and removable.
 */
@Component({
  selector: 'bw-entry-rating',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './entry-rating.html',
  styleUrl: './entry-rating.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryRating {
  readonly rating = input.required<RatingSummary>();
  readonly myStars = input<number | null>(null);
  readonly canRate = input(false);
  readonly isAuthor = input(false);
  readonly signedIn = input(false);
  readonly busy = input(false);
  readonly returnUrl = input('/');
  readonly rated = output<number>();
  readonly removed = output<void>();

  protected readonly fills = computed(() => starFills(this.rating().mean));
  protected readonly summary = computed(() => ratingText(this.rating()));
  protected readonly choices = Array.from({ length: STARS_MAX }, (_, i) => i + 1);
  protected readonly starsText = starsText;

  protected choose(stars: number): void {
    if (stars !== this.myStars()) this.rated.emit(stars);
  }
}
