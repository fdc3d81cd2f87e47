import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import type { Design } from '@barwright/contracts';
import type { StudyData } from '../../studio/compute/design-views';
import { studyDirectionNote } from '../../studio/views/study-direction-note';
import { studyDrawing, type StudyWindow } from '../../studio/views/study-drawing';
import { lengthText } from './length-text';
import { LitPlate } from './lit-plate';

/** The published design's line study, flat (ink lines at true scale) and lit (shaded grooves under a movable light). */
@Component({
  selector: 'bw-entry-line-study',
  imports: [MatButtonToggleModule, LitPlate],
  template: `
    <section class="view" aria-labelledby="entry-study-title">
      <header class="view-head">
        <h2 id="entry-study-title">Line study</h2>
        <mat-button-toggle-group [value]="'' + window()" (change)="setWindow($event.value)" hideSingleSelectionIndicator aria-label="Part of the study shown">
          <mat-button-toggle value="15">Middle 15 mm</mat-button-toggle>
          <mat-button-toggle value="40">Middle 40 mm</mat-button-toggle>
          <mat-button-toggle value="whole">Whole bar</mat-button-toggle>
        </mat-button-toggle-group>
      </header>
      @if (drawing(); as d) {
        <h3 class="sub">Flat</h3>
        <svg class="drawing flat" [attr.viewBox]="'0 0 ' + d.width + ' ' + d.height" preserveAspectRatio="xMidYMid meet" role="img"
             aria-labelledby="entry-study-caption" data-testid="entry-study-flat" [attr.data-lines]="d.lines.length">
          <g class="lines" [attr.stroke-width]="d.stroke">
            @for (line of d.lines; track $index) { <polyline [attr.points]="line" /> }
          </g>
        </svg>
        <p id="entry-study-caption" class="caption">{{ summary() }}. {{ direction() }}. True scale, from {{ d.from.toFixed(1) }} to {{ d.to.toFixed(1) }} mm along the bar.</p>
        <h3 class="sub">Lit</h3>
        <bw-lit-plate [study]="study()!" [window]="window()" [depthMm]="depthMm()" [vAngle]="design().study.vAngle" />
      } @else {
        <div class="placeholder" role="status">Working out the line study…</div>
      }
    </section>
  `,
  styleUrl: './entry-line-study.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryLineStudy {
  readonly study = input.required<StudyData | null>();
  readonly design = input.required<Design>();
  protected readonly window = signal<StudyWindow>(40);
  protected readonly drawing = computed(() => {
    const study = this.study();
    return study ? studyDrawing(study, this.window()) : null;
  });
  protected readonly depthMm = computed(() => (this.design().units === 'in' ? this.design().study.depth * 25.4 : this.design().study.depth));
  protected readonly summary = computed(() => {
    const study = this.study();
    const design = this.design();
    if (!study) return '';
    const len = (mm: number) => lengthText(mm, design.units);
    return `${study.lines.length} lines ${len(study.spacing)} apart, grooves ${len(study.width)} wide (a ${design.study.vAngle}° V-cutter ${len(this.depthMm())} deep)`;
  });

  protected readonly direction = computed(() => studyDirectionNote(this.design().study.direction));

  protected setWindow(value: string): void {
    this.window.set(value === 'whole' ? 'whole' : (Number(value) as StudyWindow));
  }
}
