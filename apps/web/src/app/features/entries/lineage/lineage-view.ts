import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import type { Lineage, LineageNode } from '@barwright/contracts';
import { lineageRows } from './lineage-rows';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';
import { openCompare } from '../../../shared/compare/compare-dialog';
import { EntriesApi } from '../entries-api';
import { EntryStore } from '../entry-store';

/** The remix tree: the chain from the root to this bar, its remixes and theirs, and its siblings, each with a thumbnail. */
@Component({
  selector: 'bw-lineage-view',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatIconModule, MatTooltipModule],
  templateUrl: './lineage-view.html',
  styleUrl: './lineage-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineageView {
  private readonly api = inject(EntriesApi);
  private readonly store = inject(EntryStore);
  private readonly dialog = inject(MatDialog);
  readonly lineage = input.required<Lineage>();
  /** The bar whose comparison is being fetched. */
  protected readonly opening = signal<string | null>(null);
  protected readonly rows = computed(() => lineageRows(this.lineage()));
  protected readonly siblings = computed(() => this.lineage().siblings);
  protected readonly alone = computed(() => this.rows().length === 1 && this.siblings().length === 0);

  /** This bar beside another of its lineage, each at its latest revision. */
  protected async compareWith(node: LineageNode): Promise<void> {
    const entry = this.store.entry();
    if (!entry) return;
    this.opening.set(node.id);
    let other;
    try {
      other = await this.api.detail(node.id);
    } finally {
      this.opening.set(null);
    }
    await openCompare(this.dialog, {
      title: `“${entry.title}” beside “${other.title}”`,
      sides: [
        { label: entry.title, note: `this bar, revision ${entry.latest.number}`, design: entry.latest.design },
        { label: other.title, note: `by ${other.author.displayName}, revision ${other.latest.number}`, link: ['/entries', other.id], design: other.latest.design },
      ],
    });
  }

  protected title(node: LineageNode): string {
    return node.available ? node.title : 'An entry no longer shown';
  }
}
