import { ChangeDetectionStrategy, Component, computed, effect, inject, input, model, output, untracked } from '@angular/core';
import { RouterLink } from '@angular/router';
import { parseDesign, type Units } from '@barwright/contracts';
import { formatLength } from '@barwright/engine';
import { DesignCompute } from '../../features/studio/compute/design-compute';
import { StudyPlates } from '../views/study-plates/study-plates';
import { formatMinutes } from '../views/plan-figures';
import type { StudyWindow } from '../views/study-drawing';
import type { CompareLight, CompareSide } from './compare-side';
import { warningName } from './warning-names';

/** A figure worked out for one design, for the comparison's table. */
export interface ColumnFigure {
  label: string;
  value: string;
}

/**
 * One design of a comparison: its line study flat and lit (the shared plates) over the window every
 * column shows, at the same true scale (equal columns, equal windows) and under the comparison's one light. Computed in its
 * own worker; it hands its figures (period, depth, passes, time, warnings) up to the table.
 */
@Component({
  selector: 'bw-compare-column',
  imports: [RouterLink, StudyPlates],
  providers: [DesignCompute],
  template: `
    <header class="head">
      @if (side().link; as link) {
        <a class="label" [routerLink]="link" data-testid="compare-label">{{ side().label }}</a>
      } @else {
        <span class="label" data-testid="compare-label">{{ side().label }}</span>
      }
      @if (side().note) { <span class="note">{{ side().note }}</span> }
    </header>
    @if (!valid()) {
      <p class="bw-muted invalid">This design file holds a value the engine cannot take, so it is not drawn; its fields are in the table.</p>
    } @else if (compute.views()?.study; as study) {
      <bw-study-plates [study]="study" [window]="window()" [controls]="false" idPrefix="compare-"
                       [azimuth]="light().azimuth" (azimuthChange)="moveLight({ azimuth: $event })"
                       [elevation]="light().elevation" (elevationChange)="moveLight({ elevation: $event })" [tint]="light().tint" />
    } @else {
      <div class="placeholder" role="status">Working out the line study…</div>
    }
  `,
  styleUrl: './compare-column.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CompareColumn {
  protected readonly compute = inject(DesignCompute);
  readonly side = input.required<CompareSide>();
  readonly window = input.required<StudyWindow>();
  /** Units the figures are written in (one for the whole table). */
  readonly units = input.required<Units>();
  readonly light = model.required<CompareLight>();
  readonly figures = output<ColumnFigure[]>();

  private readonly parsed = computed(() => parseDesign(this.side().design));
  protected readonly valid = computed(() => this.parsed().ok);

  /** Dragging across any plate moves the one light of the comparison. */
  protected moveLight(change: Partial<CompareLight>): void {
    this.light.update((light) => ({ ...light, ...change }));
  }

  constructor() {
    effect(() => {
      const parsed = this.parsed();
      if (parsed.ok) untracked(() => this.compute.request(parsed.design));
    });
    effect(() => {
      const full = this.compute.full();
      const units = this.units();
      if (!full) return;
      const len = (mm: number) => formatLength(mm, units);
      const warnings = [...full.profile.warnings, ...(full.plan?.warnings ?? [])];
      const figures: ColumnFigure[] = [
        { label: 'Period on the bar', value: len(full.profile.period) },
        ...(full.plan
          ? [
              { label: 'Depth into the edge', value: len(full.plan.depth) },
              { label: 'Passes', value: `${full.plan.passes} at ${len(full.plan.stepOver)}` },
              { label: 'Total cutting time', value: formatMinutes(full.plan.totalMinutes) },
            ]
          : []),
        { label: 'Warnings', value: warnings.length === 0 ? 'none' : warnings.map(warningName).join('; ') },
      ];
      untracked(() => this.figures.emit(figures));
    });
    effect(() => {
      if (!this.valid()) untracked(() => this.figures.emit([]));
    });
  }
}
