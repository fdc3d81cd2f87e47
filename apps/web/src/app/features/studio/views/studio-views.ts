import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import type { Companion } from '@barwright/engine';
import { BarProfile } from '../../../shared/views/bar-profile/bar-profile';
import { CutPlan } from '../../../shared/views/cut-plan/cut-plan';
import { LineStudy } from '../../../shared/views/line-study/line-study';
import { CollabSession } from '../collab/collab-session';
import { DesignCompute } from '../compute/design-compute';
import { PointerArea } from './pointer-area/pointer-area';

/**
 * The studio's drawings: the shared views fed by the live design's compute worker, each under a
 * pointer area so co-editors see where the others point.
 */
@Component({
  selector: 'bw-studio-views',
  imports: [BarProfile, CutPlan, LineStudy, PointerArea],
  template: `
    <bw-pointer-area view="profile">
      <bw-bar-profile [profile]="views()?.profile ?? null" [units]="units()" [warnings]="full()?.profile?.warnings ?? []"
                      [crest]="full()?.profile?.crest" [depth]="full()?.plan?.depth ?? null" [other]="views()?.companion ?? null"
                      [nominal]="views()?.placement?.nominal ?? null" [placement]="views()?.placement?.text ?? ''"
                      [companion]="companion()" [drawn]="views()?.drawings ?? null" (companionChange)="chooseCompanion($event)"
                      (modeChange)="compute.setProfileMode($event)" />
    </bw-pointer-area>
    <bw-pointer-area view="study">
      <bw-line-study [study]="study()?.study ?? null" [units]="units()" [direction]="session.lastValid()?.study?.direction"
                     [period]="study()?.period ?? null" [draft]="compute.studyIsDraft()"
                     (platesInView)="compute.setStudyInView($event)" />
    </bw-pointer-area>
    <bw-cut-plan [plan]="full()?.plan ?? null" [units]="units()" [working]="compute.working()"
                 emptyNote="The cut plan appears when the design’s fields are all valid." />
  `,
  styles: `
    :host {
      display: grid;
      gap: 1.25rem;
    }
    /*
     * Each view lays itself out and paints alone: a redrawn profile does not make the browser lay out the
     * study or the plan again. A view off the screen is not laid out or painted at all until it nears it
     * (its last size is kept for the scroll bar): at 1280 × 900 only the bar view is on screen, and every
     * frame of an edit painted and handed the compositor the whole page's drawing, plates and plan too.
     * On the views themselves, not their pointer areas: content-visibility clips to the box, and a
     * co-editor's pointer and name may stand past a view's edge.
     */
    :host > * {
      contain: layout style;
    }
    bw-bar-profile, bw-line-study, bw-cut-plan {
      content-visibility: auto;
      contain-intrinsic-size: auto 480px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudioViews {
  protected readonly compute = inject(DesignCompute);
  protected readonly session = inject(CollabSession);
  protected readonly views = this.compute.views;
  protected readonly study = this.compute.study;
  protected readonly full = this.compute.full;
  protected readonly units = computed(() => this.session.lastValid()?.units ?? 'mm');
  protected readonly companion = computed(() => this.compute.companion() ?? 'none');

  protected chooseCompanion(kind: Companion | 'none'): void {
    this.compute.setCompanion(kind === 'none' ? null : kind);
  }
}
