import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { parseDesign, type Design } from '@barwright/contracts';
import { catchError, map, of, switchMap } from 'rxjs';
import { DesignSketch } from '../../../shared/design-sketch/design-sketch';

/** A board design's small line study: its current file fetched once per change (the updated time is the key). */
@Component({
  selector: 'bw-design-row-sketch',
  imports: [DesignSketch],
  template: `<bw-design-sketch [design]="design()" />`,
  styles: `
    :host {
      display: block;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignRowSketch {
  private readonly http = inject(HttpClient);
  readonly designId = input.required<string>();
  /** When the design last changed: a new value fetches the file again. */
  readonly updatedAt = input.required<string>();

  private readonly key = computed(() => ({ id: this.designId(), at: this.updatedAt() }));
  protected readonly design = toSignal(
    toObservable(this.key).pipe(
      switchMap(({ id }) =>
        this.http.get<unknown>(`/api/designs/${encodeURIComponent(id)}`).pipe(
          map((body) => {
            const parsed = parseDesign(body);
            return parsed.ok ? parsed.design : null;
          }),
          // A file being edited into shape or a refused read leaves the paper blank; the row still works.
          catchError(() => of(null as Design | null)),
        ),
      ),
    ),
    { initialValue: null },
  );
}
