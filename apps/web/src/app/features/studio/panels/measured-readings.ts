import { ChangeDetectionStrategy, Component, computed, effect, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { parseMeasuredTable, type MeasuredRowError } from '@barwright/contracts';
import { CollabSession } from '../collab/collab-session';
import { valueAt } from '../fields/design-values';
import { FieldPresence } from '../fields/field-presence/field-presence';

/** A measured rosette's readings as a table of "angle radius" rows, checked row by row before it is written. */
@Component({
  selector: 'bw-measured-readings',
  imports: [MatFormFieldModule, MatInputModule, FieldPresence],
  template: `
    <bw-field-presence [field]="path()">
      <mat-form-field class="table">
        <mat-label>Readings: angle (°) and radius ({{ units() }}), one per line</mat-label>
        <textarea #box matInput rows="6" [disabled]="session.readOnly()" (input)="edit(box.value)" spellcheck="false"
                  [attr.data-testid]="'field-' + path()"></textarea>
        <mat-hint>{{ count() }} readings. Angles from 0° to below 360°, increasing; at least 8.</mat-hint>
      </mat-form-field>
    </bw-field-presence>
    @for (problem of problems(); track $index) {
      <p class="problem" role="alert">{{ problem.line ? 'Line ' + problem.line + ': ' : '' }}{{ problem.message }}</p>
    }
    @if (error()) { <p class="problem" role="alert">Measured readings {{ error() }}</p> }
  `,
  styles: `
    .table {
      width: 100%;
    }
    textarea {
      font-family: ui-monospace, 'Roboto Mono', monospace;
    }
    .problem {
      margin: 0.25rem 0 0;
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MeasuredReadings {
  protected readonly session = inject(CollabSession);
  readonly layer = input.required<number>();
  private readonly box = viewChild.required<ElementRef<HTMLTextAreaElement>>('box');

  protected readonly path = computed(() => `rosette.layers[${this.layer()}].wave.points`);
  protected readonly units = computed(() => (valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm'));
  private readonly points = computed(() => {
    const points = valueAt(this.session.design(), this.path());
    return Array.isArray(points) ? (points as unknown[]) : [];
  });
  protected readonly count = computed(() => this.points().length);
  protected readonly error = computed(() => this.session.fieldErrors().get(this.path()) ?? '');
  protected readonly problems = signal<MeasuredRowError[]>([]);

  constructor() {
    // Someone else's change of the table shows unless this box is being typed in.
    effect(() => {
      const text = this.points().map((p) => (Array.isArray(p) ? p.join('\t') : String(p))).join('\n');
      untracked(() => {
        const box = this.box().nativeElement;
        if (box.ownerDocument.activeElement !== box) box.value = text;
      });
    });
  }

  protected edit(text: string): void {
    const table = parseMeasuredTable(text);
    this.problems.set(table.errors);
    if (table.errors.length === 0) this.session.setField(['rosette', 'layers', this.layer(), 'wave', 'points'], table.points);
  }
}
