import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import type { Lineage, LineageNode } from '@barwright/contracts';
import { lineageRows } from './lineage-rows';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** The remix tree: the chain from the root to this bar, its remixes and theirs, and its siblings, each with a thumbnail. */
@Component({
  selector: 'bw-lineage-view',
  imports: [DateTextPipe, RouterLink],
  templateUrl: './lineage-view.html',
  styleUrl: './lineage-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineageView {
  readonly lineage = input.required<Lineage>();
  protected readonly rows = computed(() => lineageRows(this.lineage()));
  protected readonly siblings = computed(() => this.lineage().siblings);
  protected readonly alone = computed(() => this.rows().length === 1 && this.siblings().length === 0);

  protected title(node: LineageNode): string {
    return node.available ? node.title : 'An entry no longer shown';
  }
}
