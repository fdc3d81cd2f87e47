import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { CollabSession } from '../../collab/collab-session';
import { DesignCompute } from '../../compute/design-compute';
import { displayNumber } from '../../units/field-units';
import { crestCaption } from '../crest-caption';
import { PointerArea } from '../pointer-area/pointer-area';
import { profileDrawing, type ProfileMode } from '../profile-drawing';

/** The bar profile: the cutter centre's path, the bar edge it leaves, the follower's path, and lost detail. */
@Component({
  selector: 'bw-bar-profile-view',
  imports: [MatButtonToggleModule, MatIconModule, PointerArea],
  templateUrl: './bar-profile-view.html',
  styleUrl: './bar-profile-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BarProfileView {
  private readonly compute = inject(DesignCompute);
  private readonly session = inject(CollabSession);
  protected readonly mode = signal<ProfileMode>('detail');

  protected readonly drawing = computed(() => {
    const views = this.compute.views();
    if (!views) return null;
    const warnings = this.compute.full()?.profile.warnings ?? [];
    return profileDrawing(views.profile, this.mode(), warnings);
  });
  protected readonly warnings = computed(() => this.compute.full()?.profile.warnings ?? []);
  protected readonly units = computed(() => this.session.lastValid()?.units ?? 'mm');
  protected readonly period = computed(() => {
    const p = this.compute.views()?.profile.period;
    return p === undefined ? '' : this.length(p);
  });
  protected readonly crestRadius = computed(() => crestCaption(this.compute.full()?.profile.crest, (mm) => this.length(mm)));

  protected setMode(mode: ProfileMode): void {
    this.mode.set(mode);
  }

  /** A length in mm, in the design's units for the captions. */
  protected length(mm: number): string {
    const units = this.units();
    return `${displayNumber('length', units === 'in' ? mm / 25.4 : mm, units)} ${units}`;
  }
}
