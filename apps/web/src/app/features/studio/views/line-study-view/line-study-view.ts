import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { CollabSession } from '../../collab/collab-session';
import { DesignCompute } from '../../compute/design-compute';
import { displayNumber } from '../../units/field-units';
import { LitStudy } from '../lit-study/lit-study';
import { PointerArea } from '../pointer-area/pointer-area';
import { studyDirectionNote } from '../study-direction-note';
import { studyDrawing, type StudyWindow } from '../study-drawing';

/** The line study: what the bar engraves on the straight-line machine, drawn flat and lit. */
@Component({
  selector: 'bw-line-study-view',
  imports: [MatButtonToggleModule, LitStudy, PointerArea],
  templateUrl: './line-study-view.html',
  styleUrl: './line-study-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineStudyView {
  private readonly compute = inject(DesignCompute);
  private readonly session = inject(CollabSession);
  protected readonly window = signal<StudyWindow>(40);

  protected readonly study = computed(() => this.compute.views()?.study ?? null);
  protected readonly drawing = computed(() => {
    const study = this.study();
    return study ? studyDrawing(study, this.window()) : null;
  });
  /** The period on the bar, as a stable fingerprint of what is drawn (for tests and screen readers). */
  protected readonly period = computed(() => this.compute.views()?.profile.period ?? null);
  protected readonly summary = computed(() => {
    const study = this.study();
    if (!study) return '';
    const units = this.session.lastValid()?.units ?? 'mm';
    const len = (mm: number) => `${displayNumber('length', units === 'in' ? mm / 25.4 : mm, units)} ${units}`;
    return `${study.lines.length} lines ${len(study.spacing)} apart, grooves ${len(study.width)} wide (a ${study.vAngle}° V-cutter ${len(study.depth)} deep)`;
  });

  protected readonly direction = computed(() => studyDirectionNote(this.session.lastValid()?.study.direction));

  protected setWindow(value: string): void {
    this.window.set(value === 'whole' ? 'whole' : (Number(value) as StudyWindow));
  }
}
