import { ChangeDetectionStrategy, Component, input } from '@angular/core';

@Component({
  selector: 'bw-design-editor-page',
  template: `<section class="bw-page"><h1>Studio</h1><p>{{ designId() }}</p></section>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignEditorPage {
  readonly designId = input.required<string>();
}
