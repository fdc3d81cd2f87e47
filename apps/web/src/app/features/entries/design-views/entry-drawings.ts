import { ChangeDetectionStrategy, Component, computed, effect, inject, input, untracked } from '@angular/core';
import type { Design } from '@barwright/contracts';
import type { Companion } from '@barwright/engine';
import { BarProfile } from '../../../shared/views/bar-profile/bar-profile';
import { CutPlan } from '../../../shared/views/cut-plan/cut-plan';
import { LineStudy } from '../../../shared/views/line-study/line-study';
import { DesignCompute } from '../../studio/compute/design-compute';

/**
 * The drawings of one published revision, computed in the browser by the engine (in the studio's
 * Web Worker) and drawn by the shared views: line study flat and lit, bar profile, cut plan with its cautions.
 */
@Component({
  selector: 'bw-entry-drawings',
  imports: [BarProfile, CutPlan, LineStudy],
  providers: [DesignCompute],
  template: `
    @if (compute.error(); as error) {
      <p class="bw-form-alert" role="alert">The engine could not draw this design: {{ error }}</p>
    }
    <div class="drawings">
      <bw-line-study class="study" [study]="compute.study()?.study ?? null" [units]="design().units" [direction]="design().study.direction"
                     [period]="compute.study()?.period ?? null" idPrefix="entry-" />
      <bw-bar-profile class="profile" [profile]="views()?.profile ?? null" [units]="design().units" [warnings]="full()?.profile?.warnings ?? []"
                      [crest]="full()?.profile?.crest" [depth]="full()?.plan?.depth ?? null" [other]="views()?.companion ?? null"
                      [nominal]="views()?.placement?.nominal ?? null" [placement]="views()?.placement?.text ?? ''"
                      [companion]="companion()" (companionChange)="chooseCompanion($event)" idPrefix="entry-" />
      <bw-cut-plan class="plan" [plan]="full()?.plan ?? null" [units]="design().units" [working]="compute.working()" idPrefix="entry-" />
    </div>
  `,
  styles: `
    :host {
      display: block;
    }
    .drawings {
      display: grid;
      gap: 1.25rem;
    }
    .bw-form-alert {
      margin-bottom: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryDrawings {
  protected readonly compute = inject(DesignCompute);
  readonly design = input.required<Design>();
  protected readonly views = this.compute.views;
  protected readonly full = this.compute.full;
  protected readonly companion = computed(() => this.compute.companion() ?? 'none');

  constructor() {
    effect(() => {
      const design = this.design();
      untracked(() => this.compute.request(design));
    });
  }

  protected chooseCompanion(kind: Companion | 'none'): void {
    this.compute.setCompanion(kind === 'none' ? null : kind);
  }
}
