import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import type { Units } from '@barwright/contracts';
import type { ProfileData } from '../../studio/compute/design-views';
import { crestCaption } from '../../studio/views/crest-caption';
import { profileDrawing, type ProfileMode } from '../../studio/views/profile-drawing';
import { lengthText } from './length-text';

/** The bar profile of the published design: cutter centre, bar edge, follower centre, and where detail is lost. */
@Component({
  selector: 'bw-entry-profile',
  imports: [MatButtonToggleModule, MatIconModule],
  templateUrl: './entry-profile.html',
  styleUrl: './entry-profile.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryProfile {
  readonly profile = input.required<ProfileData | null>();
  readonly units = input.required<Units>();
  protected readonly mode = signal<ProfileMode>('detail');
  protected readonly drawing = computed(() => {
    const p = this.profile();
    return p ? profileDrawing(p, this.mode()) : null;
  });
  protected readonly warnings = computed(() => this.profile()?.warnings ?? []);
  protected readonly period = computed(() => {
    const p = this.profile();
    return p ? this.length(p.period) : '';
  });
  protected readonly crestRadius = computed(() => crestCaption(this.profile()?.crest, (mm) => this.length(mm)));

  protected setMode(mode: ProfileMode): void {
    this.mode.set(mode);
  }

  protected length(mm: number): string {
    return lengthText(mm, this.units());
  }
}
