import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { SAFETY_CAUTIONS } from '@barwright/engine';
import { CollabSession } from '../../collab/collab-session';
import { DesignCompute } from '../../compute/design-compute';
import { MATERIAL_LABELS } from '../../fields/field-catalogue';
import { planFigures } from '../plan-figures';

/** The cut plan of the newest full computation: figures, warnings, set-up reminders, heat treatment and, always, the cautions. */
@Component({
  selector: 'bw-cut-plan-view',
  imports: [MatIconModule, MatProgressBarModule],
  templateUrl: './cut-plan-view.html',
  styleUrl: './cut-plan-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CutPlanView {
  protected readonly compute = inject(DesignCompute);
  private readonly session = inject(CollabSession);

  protected readonly plan = computed(() => this.compute.full()?.plan ?? null);
  protected readonly figures = computed(() => {
    const plan = this.plan();
    return plan ? planFigures(plan, this.session.lastValid()?.units ?? 'mm') : [];
  });
  protected readonly material = computed(() => {
    const plan = this.plan();
    return plan ? MATERIAL_LABELS[plan.material] : '';
  });
  /** The cautions are shown even before the first plan arrives. */
  protected readonly cautions = computed(() => this.plan()?.cautions ?? SAFETY_CAUTIONS);
}
