import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import type { StudyDirection, Units } from '@barwright/contracts';
import { formatLength } from '@barwright/engine';
import { studyDirectionNote } from '../study-direction-note';
import { StudyPlates } from '../study-plates/study-plates';
import { windowRange, type StudyWindow } from '../study-drawing';
import type { StudyData } from '../view-data';

/** The windows about the middle, mm: round figures in each unit (½ in = 12.7 mm exactly). */
const WINDOWS_MM: Readonly<Record<Units, readonly [number, number]>> = { mm: [15, 40], in: [12.7, 38.1] };

/** The line study: what the bar engraves on the straight-line machine, drawn flat (ink at true scale) and lit (metal), with its figures. */
@Component({
  selector: 'bw-line-study',
  imports: [MatButtonToggleModule, StudyPlates],
  templateUrl: './line-study.html',
  styleUrl: './line-study.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineStudy {
  readonly study = input.required<StudyData | null>();
  readonly units = input.required<Units>();
  readonly direction = input<StudyDirection | undefined>(undefined);
  /** The period on the bar (mm), written on the flat drawing as a fingerprint of what is drawn. */
  readonly period = input<number | null>(null);
  /** Test ids start with this (the design page's are `entry-…`). */
  readonly idPrefix = input('');
  /** The study is a quick preview with the final one following: the lit plate waits for that (see StudyPlates). */
  readonly draft = input(false);
  /** Whether a plate is on the screen, told on the plates' first sight of it and whenever it changes (StudyPlates.inView). */
  readonly platesInView = output<boolean>();

  /** Which part: a narrow or a wide window about the middle (15 and 40 mm, or ½ and 1½ in), or the whole bar. */
  protected readonly choice = signal<'narrow' | 'wide' | 'whole'>('wide');
  protected readonly window = computed<StudyWindow>(() => {
    const choice = this.choice();
    return choice === 'whole' ? 'whole' : WINDOWS_MM[this.units()][choice === 'narrow' ? 0 : 1];
  });
  protected readonly summary = computed(() => {
    const study = this.study();
    if (!study) return '';
    const len = (mm: number) => formatLength(mm, this.units());
    return `${study.lines.length} lines ${len(study.spacing)} apart, grooves ${len(study.width)} wide (a ${study.vAngle}° V-cutter ${len(study.depth)} deep)`;
  });
  protected readonly span = computed(() => {
    const study = this.study();
    if (!study) return '';
    const [from, to] = windowRange(study, this.window());
    return `from ${formatLength(from, this.units())} to ${formatLength(to, this.units())}`;
  });
  protected readonly windows = computed(() => {
    const units = this.units();
    const [narrow, wide] = WINDOWS_MM[units];
    return [
      { value: 'narrow', label: `Middle ${formatLength(narrow, units)}` },
      { value: 'wide', label: `Middle ${formatLength(wide, units)}` },
    ];
  });
  protected readonly directionNote = computed(() => studyDirectionNote(this.direction()));

  protected setWindow(value: 'narrow' | 'wide' | 'whole'): void {
    this.choice.set(value);
  }
}
