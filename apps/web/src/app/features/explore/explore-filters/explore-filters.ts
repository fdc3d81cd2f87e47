import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, output, signal, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { exploreQuery, MATERIALS, SCHEDULE_KINDS, WAVE_SHAPES, type MaterialId, type ScheduleKind, type WaveShape } from '@barwright/contracts';
import { debounceTime } from 'rxjs';
import { MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES } from '../../../shared/entry-facts/entry-facts';
import { fieldMessage } from '../../../shared/forms/field-message';
import { addTags } from '../../../shared/publish-dialog/tag-entry';
import type { ExploreState } from '../explore-state';
import { optionalContract } from './optional-contract';

/** The filters Explore takes; they apply as you type (after a short pause), each checked with the contract's rule. */
@Component({
  selector: 'bw-explore-filters',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './explore-filters.html',
  styleUrl: './explore-filters.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExploreFilters {
  readonly state = input.required<ExploreState>();
  /** The author's name when an author filter is set (from the results). */
  readonly authorName = input<string | null>(null);
  readonly changed = output<Partial<ExploreState>>();

  protected readonly form = new FormGroup({
    lobes: new FormControl<number | null>(null, optionalContract(exploreQuery.shape.lobes)),
    wave: new FormControl<WaveShape | null>(null),
    material: new FormControl<MaterialId | null>(null),
    schedule: new FormControl<ScheduleKind | null>(null),
    cutterMin: new FormControl<number | null>(null, optionalContract(exploreQuery.shape.cutterMin)),
    cutterMax: new FormControl<number | null>(null, optionalContract(exploreQuery.shape.cutterMax)),
    tags: new FormControl('', { nonNullable: true }),
  });
  protected readonly tagProblem = signal<string | null>(null);
  protected readonly waves = WAVE_SHAPES;
  protected readonly waveName = WAVE_NAMES;
  protected readonly materials = MATERIALS;
  protected readonly materialName = MATERIAL_NAMES;
  protected readonly schedules = SCHEDULE_KINDS;
  protected readonly scheduleName = SCHEDULE_NAMES;
  protected readonly fieldMessage = fieldMessage;

  constructor() {
    // The URL is the truth: when it changes (back button, a shared link), the fields follow without re-emitting.
    // A field the member is typing in keeps its text while it means what the URL says ("basket " stays as typed).
    effect(() => {
      const s = this.state();
      untracked(() => {
        const c = this.form.controls;
        const sync = <T>(control: FormControl<T>, value: T, same = control.value === value) => {
          if (!same) control.setValue(value, { emitEvent: false });
        };
        sync(c.lobes, s.lobes, !c.lobes.valid || c.lobes.value === s.lobes);
        sync(c.wave, s.wave);
        sync(c.material, s.material);
        sync(c.schedule, s.schedule);
        sync(c.cutterMin, s.cutterMin, !c.cutterMin.valid || c.cutterMin.value === s.cutterMin);
        sync(c.cutterMax, s.cutterMax, !c.cutterMax.valid || c.cutterMax.value === s.cutterMax);
        sync(c.tags, s.tags.join(', '), addTags([], c.tags.value).tags.join(',') === s.tags.join(','));
      });
    });
    this.form.valueChanges.pipe(debounceTime(400), takeUntilDestroyed(inject(DestroyRef))).subscribe(() => this.apply());
  }

  protected clearAuthor(): void {
    this.changed.emit({ author: null });
  }

  protected clearAll(): void {
    this.tagProblem.set(null);
    this.changed.emit({ lobes: null, wave: null, material: null, schedule: null, cutterMin: null, cutterMax: null, tags: [], author: null });
  }

  private apply(): void {
    const v = this.form.getRawValue();
    const entry = addTags([], v.tags);
    this.tagProblem.set(entry.problem);
    const min = this.form.controls.cutterMin.valid ? v.cutterMin : this.state().cutterMin;
    const max = this.form.controls.cutterMax.valid ? v.cutterMax : this.state().cutterMax;
    if (min !== null && max !== null && min > max) {
      this.form.controls.cutterMax.setErrors({ contract: 'must not be below the smallest cutter' });
      this.form.controls.cutterMax.markAsTouched();
      return;
    }
    this.changed.emit({
      lobes: this.form.controls.lobes.valid ? v.lobes : this.state().lobes,
      wave: v.wave,
      material: v.material,
      schedule: v.schedule,
      cutterMin: min,
      cutterMax: max,
      tags: entry.tags,
    });
  }
}
