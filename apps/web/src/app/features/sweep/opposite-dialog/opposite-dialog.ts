import { ChangeDetectionStrategy, Component, computed, DestroyRef, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { candidateDesign, type SweepCandidate } from '@barwright/contracts';
import { pairPasses } from '@barwright/engine';
import { BarProfile } from '../../../shared/views/bar-profile/bar-profile';
import { CutPlan } from '../../../shared/views/cut-plan/cut-plan';
import { LineStudy } from '../../../shared/views/line-study/line-study';
import type { StudyData } from '../../../shared/views/view-data';
import { DesignCompute } from '../../studio/compute/design-compute';

export interface OppositeDialogData {
  title: string;
  candidate: SweepCandidate;
}

/**
 * "Shown and opposite" for one candidate: its design file computed as the design page computes one
 * (the studio's compute worker, with the opposite blank as the companion), the bar profile in its
 * opposite mode, what each blank engraves, whether both come out in the same passes, and the keeper's
 * cut plan with its cautions.
 */
@Component({
  selector: 'bw-opposite-dialog',
  imports: [MatButtonModule, MatDialogModule, BarProfile, CutPlan, LineStudy],
  providers: [DesignCompute],
  templateUrl: './opposite-dialog.html',
  styleUrl: './opposite-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OppositeDialog {
  protected readonly data = inject<OppositeDialogData>(MAT_DIALOG_DATA);
  protected readonly compute = inject(DesignCompute);
  protected readonly design = candidateDesign(this.data.candidate);
  protected readonly views = this.compute.views;
  protected readonly full = this.compute.full;
  protected readonly oppositeStudy = signal<StudyData | null>(null);
  protected readonly oppositeProblem = signal<string | null>(null);
  protected readonly pair = computed(() => {
    const v = this.full();
    const other = v?.companion;
    if (!v?.plan || !other) return null;
    const perUnit = this.design.units === 'in' ? 25.4 : 1;
    return pairPasses({ shownEdge: v.profile.bar, oppositeEdge: other.profile.bar, cleanup: this.design.plan.cleanup * perUnit, stepOver: v.plan.stepOver, units: this.design.units });
  });

  constructor() {
    this.compute.setCompanion('opposite');
    this.compute.request(this.design);
    const worker = typeof Worker === 'undefined' ? null : new Worker(new URL('./opposite-engraving.worker', import.meta.url), { type: 'module', name: 'opposite-engraving' });
    worker?.addEventListener('message', (event: MessageEvent<{ study: StudyData } | { error: string }>) => {
      if ('study' in event.data) this.oppositeStudy.set(event.data.study);
      else this.oppositeProblem.set(event.data.error);
    });
    worker?.postMessage(this.design);
    inject(DestroyRef).onDestroy(() => worker?.terminate());
  }
}
