import { ChangeDetectionStrategy, Component, computed, input, model, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { SCHEDULE_NAMES, type PhaseSchedule, type Units } from '@barwright/contracts';
import { entryMm } from '../sweep-choices';
import { SORT_LABELS, SWEEP_SORTS, type MmRange, type SweepFilter, type SweepSort } from '../sweep-filters';

/** Above the grid: what is shown of how many, the filters, the sort, grouping by rosette, the schedule the thumbnails draw, and Compare. */
@Component({
  selector: 'bw-sweep-results-bar',
  imports: [MatButtonModule, MatChipsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatSlideToggleModule],
  templateUrl: './sweep-results-bar.html',
  styleUrl: './sweep-results-bar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepResultsBar {
  readonly filter = model.required<SweepFilter>();
  readonly sort = model.required<SweepSort>();
  readonly grouped = model.required<boolean>();
  readonly scheduleIndex = model.required<number>();
  readonly schedules = input.required<readonly PhaseSchedule[]>();
  readonly tags = input.required<readonly string[]>();
  readonly units = input.required<Units>();
  readonly shownCount = input.required<number>();
  readonly total = input.required<number>();
  readonly pickedCount = input.required<number>();
  readonly compare = output<void>();

  protected readonly sorts = SWEEP_SORTS.map((value) => ({ value, label: SORT_LABELS[value] }));
  protected readonly hideLoss = computed(() => this.filter().maxLossMm !== null);
  protected readonly scheduleNames = computed(() => this.schedules().map((s) => SCHEDULE_NAMES[s.kind]));

  protected setHideLoss(on: boolean): void {
    this.filter.update((f) => ({ ...f, maxLossMm: on ? 0 : null }));
  }

  protected setLossLimit(text: string): void {
    const mm = entryMm(text, this.units());
    this.filter.update((f) => ({ ...f, maxLossMm: mm === null ? 0 : Math.max(0, mm) }));
  }

  protected setRange(which: 'period' | 'height', end: keyof MmRange, text: string): void {
    const mm = entryMm(text, this.units());
    this.filter.update((f) => ({ ...f, [which]: { ...f[which], [end]: mm } }));
  }

  protected setTags(tags: string[]): void {
    this.filter.update((f) => ({ ...f, tags }));
  }

  /** A limit in mm shown in the units for its entry box ('' when open). */
  protected shown(mm: number | null): string {
    if (mm === null) return '';
    return String(+(this.units() === 'in' ? mm / 25.4 : mm).toFixed(4));
  }
}
