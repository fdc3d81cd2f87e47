import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { RACK_LIMITS, type RackRosette, type RosetteObject, type Units, type Wave } from '@barwright/contracts';
import { roundLength } from '@barwright/engine/length-format';
import { map, startWith } from 'rxjs';
import { ApiError } from '../../../core/http/api-error';
import { RackApi } from '../rack-api';
import { RosetteDrawing } from '../rosette-drawing';
import { rackFieldLabel } from '../rack-field-label';
import { parseTags } from '../rack-tags';

export interface RosetteDialogData {
  /** The rosette to edit; none for a new one. */
  rosette?: RackRosette;
  /** The member's units, for a new rosette. */
  units: Units;
}

/** Shapes typed here; a Fourier or measured layer keeps its own terms or table (from a file or the measured import). */
const SIMPLE_SHAPES = [
  { value: 'sine', label: 'Sine' },
  { value: 'pointed', label: 'Pointed' },
  { value: 'scallop', label: 'Scallop' },
  { value: 'flat', label: 'Flat-topped' },
  { value: 'eccentric', label: 'Eccentric' },
] as const;

type LayerForm = FormGroup<{ lobes: FormControl<number>; amplitude: FormControl<number>; phase: FormControl<number>; shape: FormControl<string>; clip: FormControl<number> }>;

const NEW_ROSETTE: RosetteObject = { baseRadius: 50, layers: [{ lobes: 12, amplitude: 1.5, phase: 0, wave: { shape: 'sine' } }] };

/** Create or edit a rack rosette, its drawing following every keystroke. */
@Component({
  selector: 'bw-rosette-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule, RosetteDrawing],
  templateUrl: './rosette-dialog.html',
  styleUrl: './rosette-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RosetteDialog {
  private readonly data = inject<RosetteDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<RosetteDialog, RackRosette>>(MatDialogRef);
  private readonly api = inject(RackApi);

  protected readonly shapes = SIMPLE_SHAPES;
  protected readonly editing = !!this.data.rosette;
  protected readonly units: Units = this.data.rosette?.units ?? this.data.units;
  /** Waves kept as they are (Fourier terms, measured tables), by layer index. */
  private readonly keptWaves = new Map<number, Wave>();
  private readonly start = this.data.rosette?.rosette ?? NEW_ROSETTE;

  protected readonly form = new FormGroup({
    name: new FormControl(this.data.rosette?.name ?? '', { nonNullable: true, validators: [Validators.required, Validators.maxLength(RACK_LIMITS.nameMax)] }),
    tags: new FormControl((this.data.rosette?.tags ?? []).join(', '), { nonNullable: true }),
    notes: new FormControl(this.data.rosette?.notes ?? '', { nonNullable: true, validators: [Validators.maxLength(RACK_LIMITS.notesMax)] }),
    baseRadius: new FormControl(roundLength(this.start.baseRadius, this.units, true), { nonNullable: true, validators: [Validators.required] }),
    layers: new FormArray<LayerForm>(this.start.layers.map((l, i) => this.layerForm(l, i))),
  });

  private readonly value = toSignal(this.form.valueChanges.pipe(startWith(null), map(() => this.form.getRawValue())), { requireSync: true });
  /** The rosette as typed so far; what the drawing shows and what is saved. */
  protected readonly rosette = computed<RosetteObject>(() => {
    const v = this.value();
    return {
      baseRadius: Number(v.baseRadius),
      layers: v.layers.map((l, i) => ({
        lobes: Number(l.lobes),
        amplitude: Number(l.amplitude),
        phase: Number(l.phase),
        wave: this.keptWaves.get(i) ?? (l.shape === 'flat' ? { shape: 'flat', clip: Number(l.clip) } : ({ shape: l.shape } as Wave)),
      })),
    };
  });
  protected readonly saving = signal(false);
  /** The server's refusal, field by field in words. */
  protected readonly problems = signal<string[]>([]);

  protected keptWave(i: number): Wave | undefined {
    return this.keptWaves.get(i);
  }

  protected addLayer(): void {
    this.form.controls.layers.push(this.layerForm({ lobes: 6, amplitude: 0.5, phase: 0, wave: { shape: 'sine' } }, this.form.controls.layers.length));
  }

  protected removeLayer(i: number): void {
    // Kept waves follow their layers down the list.
    const kept = [...this.keptWaves.entries()].filter(([k]) => k !== i).map(([k, w]) => [k > i ? k - 1 : k, w] as const);
    this.keptWaves.clear();
    for (const [k, w] of kept) this.keptWaves.set(k, w);
    this.form.controls.layers.removeAt(i);
  }

  protected async save(): Promise<void> {
    this.problems.set([]);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const body = { name: v.name.trim(), units: this.units, rosette: this.rosette(), tags: parseTags(v.tags), notes: v.notes.trim() };
    this.saving.set(true);
    try {
      const saved = this.data.rosette ? await this.api.changeRosette(this.data.rosette.id, body) : await this.api.addRosette(body);
      this.ref.close(saved);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.problems.set(fields.length ? fields.map(([path, message]) => `${rackFieldLabel(path)} ${message}.`) : [error.message]);
    } finally {
      this.saving.set(false);
    }
  }

  private layerForm(layer: RosetteObject['layers'][number], index: number): LayerForm {
    const simple = SIMPLE_SHAPES.some((s) => s.value === layer.wave.shape);
    if (!simple) this.keptWaves.set(index, layer.wave);
    return new FormGroup({
      lobes: new FormControl(layer.lobes, { nonNullable: true, validators: [Validators.required, Validators.min(1), Validators.max(360)] }),
      amplitude: new FormControl(roundLength(layer.amplitude, this.units, true), { nonNullable: true, validators: [Validators.required, Validators.min(0)] }),
      phase: new FormControl(layer.phase, { nonNullable: true, validators: [Validators.required] }),
      shape: new FormControl<string>(simple ? layer.wave.shape : 'kept', { nonNullable: true }),
      clip: new FormControl(layer.wave.shape === 'flat' ? layer.wave.clip : 0.6, { nonNullable: true }),
    });
  }
}
