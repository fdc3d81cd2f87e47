import { ChangeDetectionStrategy, Component, computed, input, model } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import type { Units } from '@barwright/contracts';
import { formatLength, type Companion, type CrestCurvature, type EngineWarning } from '@barwright/engine';
import { crestCaption } from '../crest-caption';
import { profileDrawing, type ProfileDrawing, type ProfileMode } from '../profile-drawing';
import { shownWarnings, type Severity } from '../profile-marks';
import type { ProfileData } from '../view-data';

/** A companion bar computed beside the design's own. */
export interface CompanionProfile {
  kind: Companion;
  profile: ProfileData;
}

const SEVERITY_WORDS: Readonly<Record<Severity, { label: string; icon: string }>> = {
  trifle: { label: 'Detail lost, a trifle (under 10 % of the wave)', icon: 'info' },
  notable: { label: 'Detail lost, notable (10–50 % of the wave)', icon: 'warning' },
  severe: { label: 'Detail lost, severe (over half the wave)', icon: 'report' },
};

/**
 * The bar profile: the cutter centre's path, the bar edge it leaves, the follower's path, where
 * detail is lost (each place once, by severity), the height, period and depth dimensioned, and on
 * demand a companion bar or the opposite blank of the same cut.
 */
@Component({
  selector: 'bw-bar-profile',
  imports: [MatButtonToggleModule, MatIconModule, MatSelectModule],
  templateUrl: './bar-profile.html',
  styleUrl: './bar-profile.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BarProfile {
  readonly profile = input.required<ProfileData | null>();
  readonly units = input.required<Units>();
  /** The full computation's warnings (a preview's are not worth showing). */
  readonly warnings = input<readonly EngineWarning[]>([]);
  readonly crest = input<CrestCurvature | undefined>(undefined);
  /** Depth into the edge (mm, from the cut plan): the blank's top is drawn and dimensioned. */
  readonly depth = input<number | null>(null);
  /** The companion chosen, once computed for it (null meanwhile or for none). */
  readonly other = input<CompanionProfile | null>(null);
  /** Cutter heights with the cutter on the centre line and linear motion (mm), and the words for it. */
  readonly nominal = input<Float64Array | null>(null);
  readonly placement = input('');
  /** Which companion to show beside the bar; the control shows when `offerCompanions` is set. */
  readonly companion = model<Companion | 'none'>('none');
  readonly offerCompanions = input(true);
  readonly idPrefix = input('');
  /**
   * The drawing already made off the page (the studio's worker), for the companion and mode it shows:
   * used when those are the ones shown, so the page does no thinning or SVG writing of its own.
   */
  readonly drawn = input<{ companion: Companion | null; mode: ProfileMode; drawing: ProfileDrawing } | null>(null);
  /** Three periods at true scale or the whole bar; told to whoever makes the `drawn` drawing. */
  readonly mode = model<ProfileMode>('detail');
  protected readonly companionChoices = COMPANION_CHOICES;
  protected readonly companionNote = computed(() => COMPANION_NOTES[this.companion()]);
  private readonly shownOther = computed(() => {
    const other = this.other();
    return other && other.kind === this.companion() ? other : null;
  });
  protected readonly drawing = computed(() => {
    const p = this.profile();
    if (!p) return null;
    const other = this.shownOther();
    const drawn = this.drawn();
    if (drawn && drawn.companion === (other?.kind ?? null) && drawn.mode === this.mode()) return drawn.drawing;
    if (other?.kind === 'opposite') return profileDrawing(p, this.mode(), this.warnings(), { upper: other.profile.bar });
    if (other) return profileDrawing(other.profile, this.mode(), other.profile.warnings);
    return profileDrawing(p, this.mode(), this.warnings(), { nominal: this.nominal(), depth: this.depth() });
  });
  protected readonly shownPlacement = computed(() => (this.shownOther() ? '' : this.placement()));
  protected readonly list = computed(() => {
    const d = this.drawing();
    const p = this.profile();
    if (!d || !p) return [];
    return shownWarnings(this.warnings(), d, p.period, d.amplitude, this.units()).map((w) => ({
      ...w,
      icon: w.severity ? SEVERITY_WORDS[w.severity].icon : 'report',
    }));
  });
  protected readonly severities = computed(() => {
    const present = new Set((this.drawing()?.marks ?? []).map((m) => m.severity));
    return (['trifle', 'notable', 'severe'] as const).filter((s) => present.has(s)).map((s) => ({ severity: s, label: SEVERITY_WORDS[s].label }));
  });
  protected readonly discWords = computed(() => {
    const p = this.profile();
    if (!p) return { cutter: '', follower: '' };
    return { cutter: `Cutter, ⌀ ${this.length(2 * p.cutterRadius)}`, follower: `Follower, radius ${this.length(p.followerRadius)}` };
  });
  protected readonly period = computed(() => {
    const p = this.profile();
    return p ? this.length(p.period) : '';
  });
  protected readonly crestWords = computed(() => {
    const [d, p] = [this.drawing(), this.profile()];
    return crestCaption(this.crest(), (mm) => this.length(mm), d && p ? { from: d.from, period: p.period } : undefined);
  });

  protected setMode(mode: ProfileMode): void {
    this.mode.set(mode);
  }

  protected chooseCompanion(kind: Companion | 'none'): void {
    this.companion.set(kind);
  }

  protected dimensionWords(dims: readonly { kind: string; mm: number }[]): string {
    return dims.map((d) => `${d.kind} ${this.length(d.mm)}`).join(', ');
  }

  /** A length in mm, in the design's units. */
  protected length(mm: number): string {
    return formatLength(mm, this.units());
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
