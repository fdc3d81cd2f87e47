import { ChangeDetectionStrategy, Component, computed, effect, inject, input, untracked } from '@angular/core';
import type { Design } from '@barwright/contracts';
import { DesignCompute } from '../../studio/compute/design-compute';
import { EntryCutPlan } from './entry-cut-plan';
import { EntryLineStudy } from './entry-line-study';
import { EntryProfile } from './entry-profile';

/**
 * The drawings of one published revision, computed in the browser by the engine (in the studio's
 * Web Worker): line study flat and lit, bar profile, cut plan with its cautions.
 */
@Component({
  selector: 'bw-entry-drawings',
  imports: [EntryCutPlan, EntryLineStudy, EntryProfile],
  providers: [DesignCompute],
  template: `
    @if (compute.error(); as error) {
      <p class="bw-form-alert" role="alert">The engine could not draw this design: {{ error }}</p>
    }
    <div class="drawings">
      <bw-entry-line-study class="study" [study]="views()?.study ?? null" [design]="design()" />
      <bw-entry-profile class="profile" [profile]="full()?.profile ?? null" [units]="design().units" />
      <bw-entry-cut-plan class="plan" [plan]="full()?.plan ?? null" [units]="design().units" [working]="compute.working()" />
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
  protected readonly views = computed(() => this.compute.views());
  protected readonly full = computed(() => this.compute.full());

  constructor() {
    effect(() => {
      const design = this.design();
      untracked(() => this.compute.request(design));
    });
  }
}
