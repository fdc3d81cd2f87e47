import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { Units } from '@barwright/contracts';
import { SAFETY_CAUTIONS, type CutPlan as Plan } from '@barwright/engine';
import { MATERIAL_NAMES } from '../../entry-facts/entry-facts';
import { KeepMotion } from '../../motion/keep-motion';
import { planFigures } from '../plan-figures';

/** A cut plan: figures, warnings, set-up reminders, heat treatment and, always (even before a plan), the cautions. */
@Component({
  selector: 'bw-cut-plan',
  imports: [KeepMotion, MatIconModule, MatProgressBarModule],
  templateUrl: './cut-plan.html',
  styleUrl: './cut-plan.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CutPlan {
  readonly plan = input.required<Plan | null>();
  readonly units = input.required<Units>();
  readonly working = input(false);
  /** What shows while there is no plan (the studio: fields not yet valid). */
  readonly emptyNote = input('');
  readonly idPrefix = input('');

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
