import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { formatLength } from '@barwright/engine';
import { warningName, worstWarning } from '../../../shared/compare/warning-names';
import { formatMinutes } from '../../../shared/views/plan-figures';
import { studyDrawing } from '../../../shared/views/study-drawing';
import { CollabSession } from '../collab/collab-session';
import { ConnectionChip } from '../collab/connection-chip';
import { DesignCompute } from '../compute/design-compute';

/** Middle of the study the small live drawing shows, mm. */
const LIVE_WINDOW_MM = 15;

/**
 * What stays in sight while editing: the cut plan in one line (depth, passes, time, the worst
 * warning) and, on a phone, a small live line study and the connection status above the fields.
 */
@Component({
  selector: 'bw-live-summary',
  imports: [MatIconModule, ConnectionChip],
  template: `
    @if (withStudy()) {
      @if (drawing(); as d) {
        <svg class="study" [attr.viewBox]="'0 0 ' + d.width + ' ' + d.height" preserveAspectRatio="xMidYMid slice" role="img"
             aria-label="The line study, live: the middle of the bar at true scale" data-testid="live-study">
          <rect class="ground" x="0" y="0" [attr.width]="d.width" [attr.height]="d.height" />
          <g class="lines" [attr.stroke-width]="d.stroke">
            @for (line of d.lines; track $index) { <polyline [attr.points]="line" /> }
          </g>
        </svg>
      }
    }
    <div class="line">
      @if (withChip()) { <bw-connection-chip /> }
      <button type="button" class="plan" (click)="planWanted.emit()" data-testid="plan-summary"
              [attr.aria-label]="'Cut plan: ' + text() + '. Show the full cut plan'">
        <mat-icon aria-hidden="true">content_cut</mat-icon>
        <span class="figures">@for (part of parts(); track $index) {@if ($index > 0) { · }<span class="part">{{ part }}</span>}</span>
        @if (worst(); as w) {
          <span class="warning" data-testid="plan-summary-warning"><mat-icon aria-hidden="true">warning</mat-icon>{{ w }}</span>
        }
      </button>
    </div>
  `,
  styleUrl: './live-summary.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LiveSummary {
  private readonly compute = inject(DesignCompute);
  private readonly session = inject(CollabSession);
  /** Show the small live study (a phone, while the fields are shown). */
  readonly withStudy = input(false);
  /** Show the connection status here, not in the header (a phone, where the header scrolls away). */
  readonly withChip = input(false);
  /** The full cut plan is asked for. */
  readonly planWanted = output<void>();

  protected readonly drawing = computed(() => {
    const study = this.compute.views()?.study;
    return study ? studyDrawing(study, LIVE_WINDOW_MM) : null;
  });
  /** The figures one by one: a narrow strip breaks the line between them, not inside "35 min". */
  protected readonly parts = computed(() => {
    const plan = this.compute.full()?.plan;
    if (!plan) return [this.session.parsed().ok ? 'working out the cut plan…' : 'no cut plan while a field is invalid'];
    const len = (mm: number) => formatLength(mm, this.session.lastValid()?.units ?? 'mm');
    return [`${len(plan.depth)} deep`, `${plan.passes} ${plan.passes === 1 ? 'pass' : 'passes'}`, formatMinutes(plan.totalMinutes)];
  });
  protected readonly text = computed(() => this.parts().join(' · '));
  protected readonly worst = computed(() => {
    const full = this.compute.full();
    if (!full) return '';
    const warnings = [...(full.plan?.warnings ?? []), ...full.profile.warnings];
    const worst = worstWarning(warnings);
    if (!worst) return '';
    return warnings.length > 1 ? `${warningName(worst)} (+${warnings.length - 1})` : warningName(worst);
  });
}
