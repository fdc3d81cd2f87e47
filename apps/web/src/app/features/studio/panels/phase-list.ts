import { ChangeDetectionStrategy, Component, computed, effect, ElementRef, inject, signal, untracked, viewChild } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { CollabSession } from '../collab/collab-session';
import { valueAt } from '../fields/design-values';
import { FieldPresence } from '../fields/field-presence/field-presence';

const PATH = 'study.schedule.phases';

/** A phase schedule given as a list: one phase per line (fractions of a period), repeating. */
@Component({
  selector: 'bw-phase-list',
  imports: [MatFormFieldModule, MatInputModule, FieldPresence],
  template: `
    <bw-field-presence [field]="path">
      <mat-form-field class="list">
        <mat-label>Phases, in fractions of a period</mat-label>
        <input #box matInput [disabled]="session.readOnly()" (input)="edit(box.value)" autocomplete="off" data-testid="field-study.schedule.phases" />
        <mat-hint>Separated by commas or spaces: line 1 takes the first, and the list repeats</mat-hint>
      </mat-form-field>
    </bw-field-presence>
    @if (problem() || error()) { <p class="problem" role="alert">Phase list {{ problem() || error() }}</p> }
  `,
  styles: `
    .list {
      width: 100%;
    }
    .problem {
      margin: 0.25rem 0 0;
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhaseList {
  protected readonly session = inject(CollabSession);
  private readonly box = viewChild.required<ElementRef<HTMLInputElement>>('box');
  protected readonly path = PATH;
  private readonly phases = computed(() => {
    const list = valueAt(this.session.design(), PATH);
    return Array.isArray(list) ? list : [];
  });
  protected readonly error = computed(() => this.session.fieldErrors().get(PATH) ?? '');
  protected readonly problem = signal('');

  constructor() {
    effect(() => {
      const text = this.phases().join(', ');
      untracked(() => {
        const box = this.box().nativeElement;
        if (box.ownerDocument.activeElement !== box) box.value = text;
      });
    });
  }

  protected edit(text: string): void {
    const words = text.split(/[\s,;]+/).filter(Boolean);
    const phases = words.map(Number);
    if (words.length === 0) return this.problem.set('needs at least 1 phase');
    if (phases.some((p) => !Number.isFinite(p))) return this.problem.set('takes numbers only, such as 0, 0.5, 0.25');
    this.problem.set('');
    this.session.setField(['study', 'schedule', 'phases'], phases);
  }
}
