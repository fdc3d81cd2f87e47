import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import type { WaveShape } from '@barwright/contracts';
import { CollabSession } from '../collab/collab-session';
import { ChoiceField, choicesOf } from '../fields/choice-field/choice-field';
import { valueAt } from '../fields/design-values';
import { WAVE_LABELS } from '../fields/field-catalogue';
import { NumberField } from '../fields/number-field/number-field';
import { FourierTerms } from './fourier-terms';
import { MeasuredReadings } from './measured-readings';
import { MeasuredScale } from './measured-scale';
import { newLayer, waveFor } from './shape-defaults';

/** The rosette: base radius and its layers (a compound rosette is the sum of them). */
@Component({
  selector: 'bw-rosette-panel',
  imports: [MatButtonModule, MatIconModule, ChoiceField, NumberField, FourierTerms, MeasuredReadings, MeasuredScale],
  templateUrl: './rosette-panel.html',
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RosettePanel {
  protected readonly session = inject(CollabSession);
  protected readonly waveChoices = choicesOf(WAVE_LABELS);

  /** The layers' wave shapes, one per layer: enough to lay out the fields. */
  protected readonly layers = computed(() => {
    const layers = valueAt(this.session.design(), 'rosette.layers');
    return Array.isArray(layers) ? layers.map((l) => String((l as { wave?: { shape?: unknown } })?.wave?.shape ?? '')) : [];
  });
  /** Per layer: a measured table kept as read, so the amplitude field is not used. */
  protected readonly asRead = computed(() => {
    const layers = valueAt(this.session.design(), 'rosette.layers');
    return Array.isArray(layers) ? layers.map((l) => (l as { wave?: { scale?: unknown } })?.wave?.scale === 'as-read') : [];
  });
  protected readonly layersError = computed(() => this.session.fieldErrors().get('rosette.layers') ?? '');

  protected setShape(index: number, shape: string): void {
    const design = this.session.design();
    const layer = (valueAt(design, `rosette.layers[${index}]`) ?? {}) as { amplitude?: unknown };
    this.session.setField(['rosette', 'layers', index, 'wave'], waveFor(shape as WaveShape, layer, valueAt(design, 'rosette.baseRadius')));
    if (shape === 'eccentric') this.session.setField(['rosette', 'layers', index, 'lobes'], 1);
  }

  protected addLayer(): void {
    this.session.addItem(['rosette', 'layers'], newLayer(valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm'));
  }

  protected removeLayer(index: number): void {
    this.session.removeItem(['rosette', 'layers'], index);
  }
}
