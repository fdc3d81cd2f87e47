import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { REPORT_REASON_LABELS, type ModerationCase } from '@barwright/contracts';
import type { Decision } from '../moderation-api';
import { caseTimeline, itemName, reportsSummary } from './case-timeline';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

const KIND_ICONS = { entry: 'view_week', comment: 'chat_bubble_outline', photo: 'photo_camera' } as const;

/** One item at the desk: shown in its context, its open reports and who filed them, its history, and the decisions the viewer may take. */
@Component({
  selector: 'bw-case-card',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './case-card.html',
  styleUrl: './case-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CaseCard {
  readonly case = input.required<ModerationCase>();
  /** A decision on this item is on its way. */
  readonly busy = input(false);
  readonly decide = output<Decision>();

  protected readonly reasons = REPORT_REASON_LABELS;
  protected readonly icon = computed(() => KIND_ICONS[this.case().item.target.kind]);
  protected readonly name = computed(() => itemName(this.case()));
  protected readonly summary = computed(() => reportsSummary(this.case()));
  protected readonly timeline = computed(() => caseTimeline(this.case()));
  protected readonly item = computed(() => this.case().item);
  protected readonly can = computed(() => this.case().canAct);
  /** The item's page, and the place on it (`#comments`). */
  protected readonly linkPath = computed(() => this.item().link.split('#')[0]);
  protected readonly linkFragment = computed(() => this.item().link.split('#')[1] as string | undefined);
}
