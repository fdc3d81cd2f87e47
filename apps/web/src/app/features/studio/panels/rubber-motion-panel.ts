import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { CollabSession } from '../collab/collab-session';
import { ChoiceField, choicesOf } from '../fields/choice-field/choice-field';
import { valueAt } from '../fields/design-values';
import { PIVOT_LABELS, RUBBER_LABELS } from '../fields/field-catalogue';
import { NumberField } from '../fields/number-field/number-field';
import { rubberFor } from './shape-defaults';

/** The rubber riding the rosette, and the motion that carries its movement to the cutter and along the bar. */
@Component({
  selector: 'bw-rubber-motion-panel',
  imports: [ChoiceField, NumberField],
  template: `
    <div class="fields">
      <bw-choice-field path="rubber.shape" [options]="rubberChoices" (choose)="setShape($event)"
                       hint="A round rubber bridges valleys narrower than itself; a flat one sees the convex hull" />
      @if (shape() === 'flat') {
        <bw-number-field path="rubber.width" />
      } @else {
        <bw-number-field path="rubber.radius" hint="0 reads the rosette exactly" />
      }
      <fieldset class="group">
        <legend class="group-title">Motion</legend>
        <bw-number-field path="motion.leverRatio" hint="Cutter movement per rubber movement" />
        <bw-number-field path="motion.travelPerRev" hint="Bar travel for one turn of the rosette; the period on the bar is this over the lobes" />
        <bw-choice-field path="motion.pivot.kind" [options]="pivotChoices" (choose)="setPivot($event)" fallback="linear"
                         hint="A rocking headstock carries the cutter on an arc; a pumping one in a straight line" />
        @if (pivot() === 'rocking') {
          <bw-number-field path="motion.pivot.distance" [slider]="false" hint="From the rocking axis to the spindle centre line" />
        }
      </fieldset>
    </div>
  `,
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RubberMotionPanel {
  private readonly session = inject(CollabSession);
  protected readonly rubberChoices = choicesOf(RUBBER_LABELS);
  protected readonly shape = computed(() => valueAt(this.session.design(), 'rubber.shape'));
  protected readonly pivotChoices = choicesOf(PIVOT_LABELS);
  /** Linear when the design does not say (the field is optional). */
  protected readonly pivot = computed(() => (valueAt(this.session.design(), 'motion.pivot.kind') === 'rocking' ? 'rocking' : 'linear'));

  /** Linear motion removes the field (the default); rocking starts 150 mm from the axis, in the design's units. */
  protected setPivot(kind: string): void {
    if (kind !== 'rocking') {
      this.session.clearField(['motion', 'pivot']);
      return;
    }
    const units = valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm';
    this.session.setField(['motion', 'pivot'], { kind: 'rocking', distance: units === 'in' ? 6 : 150 });
  }

  protected setShape(shape: string): void {
    const units = valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm';
    this.session.setField(['rubber'], rubberFor(shape === 'flat' ? 'flat' : 'round', units));
  }
}
