import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Design } from '@barwright/contracts';
import { designSketchDrawing } from './design-sketch-drawing';

/** A design's small line study in ink on paper, for lists and choices (boards, the new-design presets). */
@Component({
  selector: 'bw-design-sketch',
  template: `
    @if (drawing(); as d) {
      <svg [attr.viewBox]="'0 0 ' + d.width + ' ' + d.height" preserveAspectRatio="xMidYMid slice" aria-hidden="true" focusable="false">
        <g [attr.stroke-width]="d.stroke">
          @for (line of d.lines; track $index) { <polyline [attr.points]="line" /> }
        </g>
      </svg>
    }
  `,
  styles: `
    :host {
      display: block;
      aspect-ratio: 4 / 3;
      overflow: hidden;
      // The drawing sits on its own paper, whatever the page ground (as the published thumbnails do).
      background: #f8f5ee;
      border: 1px solid var(--bw-rule);
      border-radius: var(--mat-sys-corner-small);
    }
    svg {
      display: block;
      width: 100%;
      height: 100%;
    }
    polyline {
      fill: none;
      stroke: #1f2a33;
      stroke-linejoin: round;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignSketch {
  /** Null while the design loads. */
  readonly design = input.required<Design | null>();
  protected readonly drawing = computed(() => {
    const design = this.design();
    return design ? designSketchDrawing(design) : null;
  });
}
