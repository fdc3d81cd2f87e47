import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { Downloads } from '../../../shared/views/downloads/downloads';

/** The published revision's files, as the server exports them (plain links: the server names each file). */
@Component({
  selector: 'bw-entry-downloads',
  imports: [Downloads],
  template: `
    <bw-downloads [hrefFor]="hrefFor()" [note]="'Revision ' + revision() + '. The G-code and the PDF carry the safety cautions with them.'"
                  testIdPrefix="entry-download-" />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryDownloads {
  readonly entryId = input.required<string>();
  readonly revision = input.required<number>();
  protected readonly hrefFor = computed(() => {
    const base = `/api/entries/${encodeURIComponent(this.entryId())}/export`;
    const revision = this.revision();
    return (format: string) => `${base}?format=${format}&revision=${revision}`;
  });
}
