import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { DesignStudio } from './design-studio';

/**
 * The routed page `/studio/:designId`. Opening another design through the same route makes a new
 * studio (and so a new live session) rather than reusing the old one.
 */
@Component({
  selector: 'bw-design-editor-page',
  imports: [DesignStudio],
  template: `
    @for (id of ids(); track id) {
      <bw-design-studio [designId]="id" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignEditorPage {
  readonly designId = input.required<string>();
  protected readonly ids = computed(() => [this.designId()]);
}
