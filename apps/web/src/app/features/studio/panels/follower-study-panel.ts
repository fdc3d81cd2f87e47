import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import type { ScheduleKind } from '@barwright/contracts';
import { CollabSession } from '../collab/collab-session';
import { ChoiceField, choicesOf } from '../fields/choice-field/choice-field';
import { valueAt } from '../fields/design-values';
import { SCHEDULE_LABELS, STUDY_DIRECTION_LABELS } from '../fields/field-catalogue';
import { NumberField } from '../fields/number-field/number-field';
import { PhaseList } from './phase-list';
import { scheduleFor } from './shape-defaults';

/** The follower on the straight-line machine and the engraving it drives: the line study. */
@Component({
  selector: 'bw-follower-study-panel',
  imports: [ChoiceField, NumberField, PhaseList],
  template: `
    <div class="fields">
      <bw-number-field path="follower.radius" hint="Equal to the cutter’s radius, valleys come back exactly" />
      <fieldset class="group">
        <legend class="group-title">Line study</legend>
        <bw-number-field path="study.lineSpacing" />
        <bw-number-field path="study.lines" />
        <bw-choice-field path="study.schedule.kind" [options]="scheduleChoices" (choose)="setKind($event)" />
        @switch (kind()) {
          @case ('ramp') { <bw-number-field path="study.schedule.steps" hint="Lines from one end of the ramp to the other" /> }
          @case ('sine') {
            <bw-number-field path="study.schedule.period" />
            <bw-number-field path="study.schedule.depth" hint="Swing of the phase, as a fraction of one period" />
          }
          @case ('twist') { <bw-number-field path="study.schedule.step" /> }
          @case ('list') { <bw-phase-list /> }
        }
        <bw-number-field path="study.vAngle" />
        <bw-number-field path="study.depth" hint="Depth of the V-groove; its width follows from the angle" />
        <bw-choice-field path="study.direction" [options]="directionChoices" fallback="mirrored" (choose)="setDirection($event)"
                         hint="The engraved line is the bar's mirror when the work moves against the bar; flip it if your machine runs the other way" />
      </fieldset>
    </div>
  `,
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FollowerStudyPanel {
  private readonly session = inject(CollabSession);
  protected readonly scheduleChoices = choicesOf(SCHEDULE_LABELS);
  protected readonly kind = computed(() => valueAt(this.session.design(), 'study.schedule.kind'));

  protected readonly directionChoices = choicesOf(STUDY_DIRECTION_LABELS);

  protected setDirection(direction: string): void {
    this.session.setField(['study', 'direction'], direction);
  }

  protected setKind(kind: string): void {
    this.session.setField(['study', 'schedule'], scheduleFor(kind as ScheduleKind));
  }
}
