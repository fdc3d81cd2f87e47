import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import type { MaterialId } from '@barwright/contracts';
import { formatLength, MATERIAL_PRESETS } from '@barwright/engine';
import { CollabSession } from '../collab/collab-session';
import { ChoiceField, choicesOf } from '../fields/choice-field/choice-field';
import { valueAt } from '../fields/design-values';
import { MATERIAL_LABELS } from '../fields/field-catalogue';
import { NumberField } from '../fields/number-field/number-field';

/** The material and the figures of the cut: step-over, clean-up, travel, and overrides of the material's speeds. */
@Component({
  selector: 'bw-cut-plan-panel',
  imports: [ChoiceField, NumberField],
  template: `
    <div class="fields">
      <bw-choice-field path="bar.material" [options]="materialChoices" (choose)="setMaterial($event)" [hint]="materialHint()" />
      <bw-number-field path="plan.stepOver" [hint]="stepOverHint()" />
      <bw-number-field path="plan.cleanup" hint="Extra depth below the profile’s lowest point" />
      <bw-number-field path="plan.travelSpeed" hint="Feed of the slide along the bar" />
      <fieldset class="group">
        <legend class="group-title">Overrides</legend>
        <bw-number-field path="plan.surfaceSpeed" [optional]="true" [slider]="false" [hint]="surfaceHint()" />
        <bw-number-field path="plan.chipLoad" [optional]="true" [slider]="false" [hint]="chipHint()" />
      </fieldset>
    </div>
  `,
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CutPlanPanel {
  private readonly session = inject(CollabSession);
  protected readonly materialChoices = choicesOf(MATERIAL_LABELS);
  private readonly preset = computed(() => MATERIAL_PRESETS[valueAt(this.session.design(), 'bar.material') as MaterialId] ?? null);
  private readonly inch = computed(() => valueAt(this.session.design(), 'units') === 'in');

  protected readonly materialHint = computed(() => (this.preset() ? `Hardness ${this.preset()!.hardness}` : ''));
  protected readonly stepOverHint = computed(() => {
    const max = this.preset()?.maxStepOver;
    return max ? `At most ${this.length(max)} a pass in this material` : 'Depth taken in one pass';
  });
  protected readonly surfaceHint = computed(() => {
    const p = this.preset();
    return p && p.id !== 'custom' ? `Empty: the material’s ${p.surfaceSpeed} m/min` : 'Needed for a custom material';
  });
  protected readonly chipHint = computed(() => {
    const p = this.preset();
    return p && p.id !== 'custom' ? `Empty: the material’s ${this.length(p.chipLoad)} (for a 3/16 in end mill)` : 'Needed for a custom material';
  });

  protected setMaterial(material: string): void {
    this.session.setField(['bar', 'material'], material);
  }

  private length(mm: number): string {
    return formatLength(mm, this.inch() ? 'in' : 'mm');
  }
}
