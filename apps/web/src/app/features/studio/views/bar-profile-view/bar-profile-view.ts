import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import type { Companion } from '@barwright/engine';
import { CollabSession } from '../../collab/collab-session';
import { DesignCompute } from '../../compute/design-compute';
import { displayNumber } from '../../units/field-units';
import { crestCaption } from '../crest-caption';
import { PointerArea } from '../pointer-area/pointer-area';
import { profileDrawing, type ProfileMode } from '../profile-drawing';

/** The bar profile: the cutter centre's path, the bar edge it leaves, the follower's path, and lost detail. */
@Component({
  selector: 'bw-bar-profile-view',
  imports: [MatButtonToggleModule, MatIconModule, MatSelectModule, PointerArea],
  templateUrl: './bar-profile-view.html',
  styleUrl: './bar-profile-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BarProfileView {
  private readonly compute = inject(DesignCompute);
  private readonly session = inject(CollabSession);
  protected readonly mode = signal<ProfileMode>('detail');

  protected readonly companionChoices = COMPANION_CHOICES;
  protected readonly companion = computed(() => this.compute.companion() ?? 'none');
  /** The companion's views once computed for the companion chosen (null meanwhile, or for none). */
  private readonly other = computed(() => {
    const other = this.compute.views()?.companion;
    return other && other.kind === this.compute.companion() ? other : null;
  });
  protected readonly drawing = computed(() => {
    const views = this.compute.views();
    if (!views) return null;
    const other = this.other();
    if (other?.kind === 'opposite') return profileDrawing(views.profile, this.mode(), this.warnings(), { upper: other.profile.bar });
    if (other) return profileDrawing(other.profile, this.mode(), other.profile.warnings);
    return profileDrawing(views.profile, this.mode(), this.warnings(), { nominal: views.placement?.nominal });
  });
  /** Before and after of a cutter off the centre line or on a rocking arc, in figures (the design's own bar only). */
  protected readonly placement = computed(() => (this.other() ? '' : (this.compute.views()?.placement?.text ?? '')));
  protected readonly companionNote = computed(() => COMPANION_NOTES[this.companion()]);
  protected readonly warnings = computed(() => this.compute.full()?.profile.warnings ?? []);
  protected readonly units = computed(() => this.session.lastValid()?.units ?? 'mm');
  protected readonly period = computed(() => {
    const p = this.compute.views()?.profile.period;
    return p === undefined ? '' : this.length(p);
  });
  protected readonly crestRadius = computed(() => crestCaption(this.compute.full()?.profile.crest, (mm) => this.length(mm)));

  protected chooseCompanion(kind: string): void {
    this.compute.setCompanion(kind === 'none' ? null : (kind as Companion));
  }

  protected setMode(mode: ProfileMode): void {
    this.mode.set(mode);
  }

  /** A length in mm, in the design's units for the captions. */
  protected length(mm: number): string {
    const units = this.units();
    return `${displayNumber('length', units === 'in' ? mm / 25.4 : mm, units)} ${units}`;
  }
}

const COMPANION_CHOICES: readonly { value: Companion | 'none'; label: string }[] = [
  { value: 'none', label: 'This bar' },
  { value: 'counter-phase', label: 'Counter-phase companion' },
  { value: 'inverted', label: 'Inverted companion' },
  { value: 'opposite', label: 'Shown and opposite' },
];

const COMPANION_NOTES: Readonly<Record<Companion | 'none', string>> = {
  none: '',
  'counter-phase': 'The counter-phase companion: the same bar shifted half a period.',
  inverted: 'The inverted companion: the cutter path mirrored top to bottom and cut afresh (crests become valleys).',
  opposite:
    'The two blanks of one cut: below the cutter the lower envelope (this bar), above it the upper envelope (the opposite blank, shaded above). Turned over, the opposite blank is the inverted companion.',
};
