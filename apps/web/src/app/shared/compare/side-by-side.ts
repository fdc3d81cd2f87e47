import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatSliderModule } from '@angular/material/slider';
import type { Units } from '@barwright/contracts';
import { formatLength } from '@barwright/engine';
import type { StudyWindow } from '../views/study-drawing';
import { CompareColumn, type ColumnFigure } from './compare-column';
import type { CompareLight, CompareSide } from './compare-side';
import { fieldRows, figureRows, type CompareRow } from './compare-table';

/** The windows about the middle, mm, as the line study offers them (½ in = 12.7 mm exactly). */
const WINDOWS_MM: Readonly<Record<Units, readonly [number, number]>> = { mm: [15, 40], in: [12.7, 38.1] };
const TINTS: readonly { value: CompareLight['tint']; label: string }[] = [
  { value: 'silver', label: 'Silver' },
  { value: 'gold', label: 'Gold' },
  { value: 'brass', label: 'Brass' },
];

/**
 * Two to four designs side by side: each one's line study flat and lit over the same window at the
 * same true scale under one light, then one table of their fields and figures with what differs
 * from the first column marked.
 */
@Component({
  selector: 'bw-side-by-side',
  imports: [MatButtonToggleModule, MatSliderModule, CompareColumn],
  templateUrl: './side-by-side.html',
  styleUrl: './side-by-side.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SideBySide {
  readonly sides = input.required<readonly CompareSide[]>();
  /** Units of the table and the windows; default the first design's. */
  readonly units = input<Units | null>(null);

  protected readonly shownUnits = computed<Units>(() => this.units() ?? ((this.sides()[0]?.design as { units?: Units } | undefined)?.units === 'in' ? 'in' : 'mm'));
  protected readonly choice = signal<'narrow' | 'wide' | 'whole'>('narrow');
  protected readonly window = computed<StudyWindow>(() => {
    const choice = this.choice();
    return choice === 'whole' ? 'whole' : WINDOWS_MM[this.shownUnits()][choice === 'narrow' ? 0 : 1];
  });
  protected readonly windows = computed(() => {
    const [narrow, wide] = WINDOWS_MM[this.shownUnits()];
    const len = (mm: number) => formatLength(mm, this.shownUnits());
    return [
      { value: 'narrow', label: len(narrow) },
      { value: 'wide', label: len(wide) },
      { value: 'whole', label: 'Whole bar' },
    ];
  });
  protected readonly tints = TINTS;
  protected readonly light = signal<CompareLight>({ azimuth: 60, elevation: 35, tint: 'silver' });
  private readonly figures = signal<ReadonlyMap<number, ColumnFigure[]>>(new Map());

  protected readonly rows = computed<CompareRow[]>(() => {
    const sides = this.sides();
    const figures = this.figures();
    const rows = [...fieldRows(sides.map((s) => s.design), this.shownUnits()), ...figureRows(sides.map((_, i) => figures.get(i) ?? null))];
    if (sides.some((s) => s.notes !== undefined)) {
      const notes = sides.map((s) => s.notes ?? '');
      const changed = notes.map((n, i) => i > 0 && n !== notes[0]);
      rows.push({ key: 'notes', label: 'Notes', values: notes.map((n, i) => (i === 0 ? (n ? 'kept' : 'none') : changed[i] ? 'changed' : 'the same')), changed, field: true });
    }
    return rows;
  });
  /** Only what differs, or every row. */
  protected readonly everything = signal(false);
  protected readonly shownRows = computed(() => (this.everything() ? this.rows() : this.rows().filter((r) => r.changed.some(Boolean))));
  protected readonly changedCount = computed(() => this.rows().filter((r) => r.field && r.changed.some(Boolean)).length);
  protected readonly columns = computed(() => `repeat(${this.sides().length}, minmax(0, 1fr))`);

  protected differs(row: CompareRow): boolean {
    return row.changed.some(Boolean);
  }

  protected keepFigures(index: number, figures: ColumnFigure[]): void {
    this.figures.update((all) => new Map(all).set(index, figures));
  }

  protected setLight(change: Partial<CompareLight>): void {
    this.light.update((light) => ({ ...light, ...change }));
  }

  protected sliderValue(event: Event): number {
    return Number((event.target as HTMLInputElement).value);
  }
}
