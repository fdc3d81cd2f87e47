import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Units } from '@barwright/contracts';
import { SAFETY_CAUTIONS, type CutPlan } from '@barwright/engine';
import { MATERIAL_NAMES } from '../../../shared/entry-facts/entry-facts';
import { planFigures } from '../../studio/views/plan-figures';

/** The cut plan of the published design. The safety cautions show always, even before the plan is worked out. */
@Component({
  selector: 'bw-entry-cut-plan',
  imports: [MatIconModule, MatProgressBarModule],
  templateUrl: './entry-cut-plan.html',
  styleUrl: './entry-cut-plan.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryCutPlan {
  readonly plan = input.required<CutPlan | null>();
  readonly units = input.required<Units>();
  readonly working = input(false);
  protected readonly figures = computed(() => {
    const plan = this.plan();
    return plan ? planFigures(plan, this.units()) : [];
  });
  protected readonly material = computed(() => {
    const plan = this.plan();
    return plan ? MATERIAL_NAMES[plan.material] : '';
  });
  protected readonly cautions = computed(() => this.plan()?.cautions ?? SAFETY_CAUTIONS);
}
