import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { RosetteObject } from '@barwright/contracts';
import { rosetteOutline } from './rosette-outline';

/** A rosette seen face on: its edge as a smooth closed curve, a measured table's readings as dots on it. */
@Component({
  selector: 'bw-rosette-drawing',
  template: `
    @if (outline(); as o) {
      <svg viewBox="0 0 100 100" role="img" [attr.aria-label]="label()" [attr.width]="size()" [attr.height]="size()">
        <circle class="hub" cx="50" cy="50" r="3" />
        <path class="edge" [attr.d]="o.path" />
        @if (showReadings()) {
          @for (p of o.readings; track $index) {
            <circle class="reading" [attr.cx]="p.x" [attr.cy]="p.y" r="0.9" />
          }
        }
      </svg>
    } @else {
      <span class="none" [style.width.px]="size()" [style.height.px]="size()">No drawing</span>
    }
  `,
  styles: `
    :host { display: inline-block; line-height: 0; }
    svg { display: block; max-width: 100%; height: auto; }
    .edge { fill: color-mix(in srgb, var(--mat-sys-primary) 12%, transparent); stroke: var(--mat-sys-primary); stroke-width: 0.8; stroke-linejoin: round; }
    .hub { fill: var(--mat-sys-outline); }
    .reading { fill: var(--mat-sys-tertiary); }
    .none { display: inline-grid; place-items: center; font-size: 0.75rem; color: var(--mat-sys-on-surface-variant); line-height: 1.2; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RosetteDrawing {
  readonly rosette = input.required<RosetteObject | null>();
  readonly size = input(72);
  readonly showReadings = input(false);
  readonly name = input('');

  protected readonly outline = computed(() => {
    const rosette = this.rosette();
    if (!rosette) return null;
    try {
      const outline = rosetteOutline(rosette);
      return Number.isFinite(outline.min) && Number.isFinite(outline.max) && outline.min > 0 ? outline : null;
    } catch {
      // A rosette still being typed (an empty table, a zero lobe count) has no edge yet.
      return null;
    }
  });
  protected readonly label = computed(() => {
    const o = this.outline();
    const rise = o && o.exaggeration > 1 ? `, rise drawn ${Math.round(o.exaggeration)}× larger than true` : '';
    return `Rosette${this.name() ? ` ${this.name()}` : ''} seen face on${rise}`;
  });
}
