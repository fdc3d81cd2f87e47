import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { CollabSession } from '../collab/collab-session';
import { NumberField } from '../fields/number-field/number-field';

/** The end mill that cuts the bar, and the bar blank. */
@Component({
  selector: 'bw-cutter-bar-panel',
  imports: [NumberField],
  template: `
    <div class="fields">
      <bw-number-field path="cutter.diameter" hint="The bar edge is the envelope of this cutter, not a copy of the rosette" />
      <bw-number-field path="cutter.flutes" />
      <bw-number-field path="cutter.offset" [optional]="true"
                       hint="Keep 0: feed with the upper slide, never the cross slide. Set it to see what an offset along the bar does" />
      <fieldset class="group">
        <legend class="group-title">Bar blank</legend>
        <bw-number-field path="bar.length" />
        <bw-number-field path="bar.thickness" />
      </fieldset>
    </div>
  `,
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CutterBarPanel {
  protected readonly session = inject(CollabSession);
}
