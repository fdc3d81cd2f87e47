import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { CollabSession } from '../collab/collab-session';
import { ChoiceField, choicesOf } from '../fields/choice-field/choice-field';
import { valueAt } from '../fields/design-values';
import { MEASURED_SCALE_LABELS } from '../fields/field-catalogue';
import { cleanNumber } from '../units/field-units';

/**
 * Whether a measured layer keeps its readings as read (the dial indicator's own rise) or stretches
 * them to the layer's amplitude, and a sentence saying which, with both figures.
 */
@Component({
  selector: 'bw-measured-scale',
  imports: [ChoiceField],
  template: `
    <bw-choice-field [path]="path()" [options]="choices" fallback="to-amplitude" (choose)="choose($event)" />
    <p class="bw-muted note" data-testid="measured-scale-note">{{ note() }}</p>
  `,
  styles: `
    .note {
      margin: 0 0 0.5rem;
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MeasuredScale {
  private readonly session = inject(CollabSession);
  readonly layer = input.required<number>();

  protected readonly choices = choicesOf(MEASURED_SCALE_LABELS);
  protected readonly path = computed(() => `rosette.layers[${this.layer()}].wave.scale`);
  protected readonly note = computed(() => {
    const design = this.session.design();
    const units = valueAt(design, 'units') === 'in' ? 'in' : 'mm';
    const scale = valueAt(design, this.path());
    const points = valueAt(design, `rosette.layers[${this.layer()}].wave.points`);
    const radii = Array.isArray(points) ? points.map((p) => (Array.isArray(p) ? Number(p[1]) : NaN)).filter(Number.isFinite) : [];
    const rise = radii.length > 0 ? `${cleanNumber(Math.max(...radii) - Math.min(...radii))} ${units}` : '—';
    const amplitude = valueAt(design, `rosette.layers[${this.layer()}].amplitude`);
    const stated = typeof amplitude === 'number' ? `${amplitude} ${units}` : '—';
    if (scale === 'as-read') return `Kept as read: the radius rises and falls by the readings’ own ${rise}; the layer’s amplitude is not used.`;
    const origin = scale === undefined ? ' (what a design made before this choice means)' : '';
    return `Scaled: the readings’ shape is stretched to the layer’s amplitude, ${stated}, whatever their own rise (${rise})${origin}.`;
  });

  protected choose(scale: string): void {
    this.session.setField(['rosette', 'layers', this.layer(), 'wave', 'scale'], scale);
  }
}
