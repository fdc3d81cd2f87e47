import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { CollabSession } from '../../collab/collab-session';
import { valueAt } from '../design-values';
import { catalogueKey, FIELDS } from '../field-catalogue';
import { FieldPresence } from '../field-presence/field-presence';

export interface Choice {
  value: string;
  label: string;
}

/**
 * A choice of the design (wave shape, phase schedule, material…) bound to the live document. The
 * parent writes the choice, because a new shape or kind brings its own fields with it.
 */
@Component({
  selector: 'bw-choice-field',
  imports: [MatFormFieldModule, MatSelectModule, FieldPresence],
  template: `
    <bw-field-presence [field]="path()">
      <mat-form-field class="choice">
        <mat-label>{{ shownLabel() }}</mat-label>
        <mat-select [value]="value()" (selectionChange)="choose.emit($event.value)" [disabled]="session.readOnly()"
                    panelClass="bw-choice-panel" [attr.data-testid]="'field-' + path()">
          @for (option of options(); track option.value) {
            <mat-option [value]="option.value" [attr.data-testid]="'option-' + option.value">{{ option.label }}</mat-option>
          }
        </mat-select>
        @if (hint()) { <mat-hint>{{ hint() }}</mat-hint> }
        @if (error()) { <mat-hint class="problem" role="alert">{{ shownLabel() }} {{ error() }}</mat-hint> }
      </mat-form-field>
    </bw-field-presence>
  `,
  styles: `
    .choice {
      width: 100%;
    }
    .problem {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChoiceField {
  protected readonly session = inject(CollabSession);

  readonly path = input.required<string>();
  readonly options = input.required<readonly Choice[]>();
  readonly label = input<string>();
  readonly hint = input<string>();
  /** Shown while the design leaves an optional choice out (its default). */
  readonly fallback = input<string>();
  readonly choose = output<string>();

  protected readonly shownLabel = computed(() => this.label() ?? FIELDS[catalogueKey(this.path())]?.label ?? this.path());
  protected readonly value = computed(() => valueAt(this.session.design(), this.path()) ?? this.fallback());
  protected readonly error = computed(() => this.session.fieldErrors().get(this.path()) ?? '');
}

/** Choices from a label table, in its order. */
export function choicesOf(labels: Readonly<Record<string, string>>): Choice[] {
  return Object.entries(labels).map(([value, label]) => ({ value, label }));
}
