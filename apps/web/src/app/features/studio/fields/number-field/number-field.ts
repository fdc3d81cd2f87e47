import { ChangeDetectionStrategy, Component, computed, effect, inject, input, OnInit, untracked } from '@angular/core';
import { AbstractControl, FormControl, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import type { ErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSliderModule } from '@angular/material/slider';
import { fieldMessage } from '../../../../shared/forms/field-message';
import { CollabSession } from '../../collab/collab-session';
import { formatValue, rangeInUnits, roundFor, sliderStep, unitSuffix } from '../../units/field-units';
import { valueAt } from '../design-values';
import { catalogueKey, FIELDS, pathParts } from '../field-catalogue';
import { FieldPresence } from '../field-presence/field-presence';

/**
 * One number of the design, bound to the live document: numeric entry with its unit, and a slider
 * for the main numbers. Every accepted keystroke or slider step is an edit of the document; the
 * schema's message for the field shows under it, whoever made the value.
 */
@Component({
  selector: 'bw-number-field',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSliderModule, FieldPresence],
  templateUrl: './number-field.html',
  styleUrl: './number-field.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NumberField implements OnInit {
  private readonly session = inject(CollabSession);

  /** Dotted path in the design file, e.g. `rosette.layers[0].lobes`. */
  readonly path = input.required<string>();
  /** Overrides the catalogue's label. */
  readonly label = input<string>();
  readonly hint = input<string>();
  /** Empty means "not set" (the field is removed), for optional figures. */
  readonly optional = input(false);
  readonly slider = input(true);

  private readonly info = computed(() => FIELDS[catalogueKey(this.path())] ?? { label: this.path(), kind: 'ratio' as const });
  protected readonly shownLabel = computed(() => this.label() ?? this.info().label);
  protected readonly units = computed(() => (valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm'));
  protected readonly suffix = computed(() => unitSuffix(this.info().kind, this.units()));
  protected readonly integer = computed(() => this.info().kind === 'count');
  protected readonly docValue = computed(() => valueAt(this.session.design(), this.path()));
  protected readonly error = computed(() => this.session.fieldErrors().get(this.path()) ?? '');
  protected readonly range = computed(() => {
    const range = this.info().slider;
    return range ? rangeInUnits(this.info().kind, range, this.units()) : null;
  });
  protected readonly step = computed(() => {
    const range = this.range();
    return range ? sliderStep(range[0], range[1], this.integer()) : 1;
  });
  protected readonly sliderValue = computed(() => {
    const value = this.docValue();
    const range = this.range();
    if (typeof value !== 'number' || !range) return range?.[0] ?? 0;
    return Math.min(range[1], Math.max(range[0], value));
  });
  protected readonly testId = computed(() => `field-${this.path()}`);

  /** Its validators read the inputs, so they are attached once the inputs are set (ngOnInit). */
  protected readonly control = new FormControl<number | null>(null);
  /** The schema's message shows at once, also for a value someone else typed. */
  protected readonly matcher: ErrorStateMatcher = {
    isErrorState: (c) => !!c && c.invalid && (c.touched || c.dirty || this.error() !== ''),
  };

  constructor() {
    effect(() => {
      const value = this.docValue();
      untracked(() => {
        // The box shows the stored value rounded (50 mm in inches reads 1.9685, and stays 1.96850… in the
        // document until someone types); a value just typed here is left as typed.
        if (typeof value === 'number' && value === this.control.value) return;
        const shown = this.shownDocValue();
        if (this.control.value !== shown) this.control.setValue(shown, { emitEvent: false });
      });
    });
    effect(() => {
      this.error();
      untracked(() => this.control.updateValueAndValidity({ emitEvent: false }));
    });
    effect(() => {
      const readOnly = this.session.readOnly();
      untracked(() => (readOnly ? this.control.disable({ emitEvent: false }) : this.control.enable({ emitEvent: false })));
    });
  }

  ngOnInit(): void {
    this.control.setValidators([(c: AbstractControl) => (this.optional() ? null : Validators.required(c)), () => this.contractError()]);
    this.control.updateValueAndValidity({ emitEvent: false });
  }

  protected message(): string {
    const kept = this.docValue();
    // An emptied box is this page's own: the document cannot hold "no number", so it keeps its value.
    if (this.control.hasError('required') && typeof kept === 'number') {
      return `${this.shownLabel()} needs a number; the design keeps ${formatValue(this.info().kind, kept, this.units())}`;
    }
    return fieldMessage(this.shownLabel(), this.control.errors);
  }

  /** Leaving a required box empty (or with letters, which a number box drops) puts the design's value back in it. */
  protected left(): void {
    if (this.control.value !== null || this.optional()) return;
    const kept = this.shownDocValue();
    if (kept === null) return;
    this.control.setValue(kept, { emitEvent: false });
    this.control.markAsPristine();
  }

  /** The document's value as the box shows it, or null when it holds none. */
  private shownDocValue(): number | null {
    const value = this.docValue();
    return typeof value === 'number' ? roundFor(this.info().kind, value, this.units(), true) : null;
  }

  /** A keystroke in the entry box: a number is an edit; an empty box removes an optional figure. */
  protected typed(): void {
    const value = this.control.value;
    if (typeof value === 'number' && Number.isFinite(value)) this.session.setField(pathParts(this.path()), value);
    else if (value === null && this.optional()) this.session.clearField(pathParts(this.path()));
  }

  protected slid(event: Event): void {
    const value = Number((event.target as HTMLInputElement).value);
    if (!Number.isFinite(value)) return;
    this.control.setValue(value, { emitEvent: false });
    this.session.setField(pathParts(this.path()), value);
  }

  private contractError(): ValidationErrors | null {
    const message = this.error();
    if (message) return { contract: message };
    const raw = this.docValue();
    // The document may hold a value of the wrong type (from an old client): the entry box is then empty.
    return raw !== undefined && typeof raw !== 'number' ? { contract: 'must be a number' } : null;
  }
}
