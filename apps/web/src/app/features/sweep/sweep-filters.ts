import type { CandidateFigures } from '@barwright/engine';

/*
 * The grid's filters, sorts and grouping, pure. Each candidate is read through its index into the
 * page's lists (its rosette and its figures), so nothing per card is built beyond the index.
 */

/** A range in mm; either end open (null). */
export interface MmRange {
  min: number | null;
  max: number | null;
}

export interface SweepFilter {
  /** Hide candidates losing more detail than this (mm); 0 hides every loss; null shows all. */
  maxLossMm: number | null;
  period: MmRange;
  height: MmRange;
  /** Only rosettes with any of these tags (any case); empty: all. */
  tags: readonly string[];
}

export const NO_FILTER: SweepFilter = { maxLossMm: null, period: { min: null, max: null }, height: { min: null, max: null }, tags: [] };

export const SWEEP_SORTS = ['order', 'loss', 'period', 'height', 'crest', 'time'] as const;
export type SweepSort = (typeof SWEEP_SORTS)[number];
export const SORT_LABELS: Readonly<Record<SweepSort, string>> = {
  order: 'As chosen',
  loss: 'Least detail lost',
  period: 'Shortest period',
  height: 'Tallest bar',
  crest: 'Roundest crest',
  time: 'Quickest keeper',
};

/** What the filters read of candidate `i`: its rosette's tags and its figures (undefined: not computed yet; null: refused). */
export interface SweepLookup {
  count: number;
  tags(i: number): readonly string[];
  figures(i: number): CandidateFigures | null | undefined;
}

/** True when the filter says anything about the figures (then uncomputed and refused candidates are hidden). */
export function filtersFigures(f: SweepFilter): boolean {
  return f.maxLossMm !== null || [f.period.min, f.period.max, f.height.min, f.height.max].some((v) => v !== null);
}

const within = (v: number, r: MmRange) => (r.min === null || v >= r.min) && (r.max === null || v <= r.max);

/** Whether candidate `i` passes the filter. */
export function passes(look: SweepLookup, i: number, f: SweepFilter): boolean {
  if (f.tags.length) {
    const wanted = new Set(f.tags.map((t) => t.toLowerCase()));
    if (!look.tags(i).some((t) => wanted.has(t.toLowerCase()))) return false;
  }
  if (!filtersFigures(f)) return true;
  const fig = look.figures(i);
  if (!fig) return false;
  if (f.maxLossMm !== null && fig.detailLoss && fig.detailLost > f.maxLossMm) return false;
  if (f.maxLossMm === 0 && fig.detailLoss) return false;
  return within(fig.period, f.period) && within(fig.barHeight, f.height);
}

/** The sort key of computed figures: smaller first. */
function sortKey(fig: CandidateFigures, sort: SweepSort): number {
  switch (sort) {
    case 'loss':
      return fig.detailLoss ? fig.detailLost : 0;
    case 'period':
      return fig.period;
    case 'height':
      return -fig.barHeight;
    case 'crest':
      return Number.isFinite(fig.crestRadius) ? -fig.crestRadius : -Number.MAX_VALUE;
    case 'time':
      return fig.keeperMinutes;
    default:
      return 0;
  }
}

/** The indices shown, in the sort's order; ties and uncomputed candidates keep the chosen order (uncomputed last). */
export function shownIndices(look: SweepLookup, f: SweepFilter, sort: SweepSort): number[] {
  const out: number[] = [];
  for (let i = 0; i < look.count; i++) if (passes(look, i, f)) out.push(i);
  if (sort === 'order') return out;
  const keys = new Float64Array(look.count);
  for (const i of out) {
    const fig = look.figures(i);
    keys[i] = fig ? sortKey(fig, sort) : Infinity;
  }
  return out.sort((a, b) => keys[a] - keys[b] || a - b);
}

/** One row of the virtual scroll: a group's heading or up to `columns` cards. */
export type GridRow = { kind: 'group'; label: string; count: number } | { kind: 'cards'; indices: number[] };

/**
 * The rows of the grid: `columns` cards a row; with `groupOf`, the candidates gathered under their
 * group (in the order each group first appears), each group opened by a heading row.
 */
export function gridRows(indices: readonly number[], columns: number, groupOf?: (i: number) => string): GridRow[] {
  const cols = Math.max(1, Math.floor(columns));
  const chunk = (list: readonly number[]): GridRow[] => {
    const rows: GridRow[] = [];
    for (let k = 0; k < list.length; k += cols) rows.push({ kind: 'cards', indices: list.slice(k, k + cols) });
    return rows;
  };
  if (!groupOf) return chunk(indices);
  const groups = new Map<string, number[]>();
  for (const i of indices) {
    const g = groupOf(i);
    const list = groups.get(g);
    if (list) list.push(i);
    else groups.set(g, [i]);
  }
  return [...groups].flatMap(([label, list]) => [{ kind: 'group' as const, label, count: list.length }, ...chunk(list)]);
}

/** Cards a row holds in `widthPx`: one column below 480 px (a phone), else as many `minCardPx` cards as fit. */
export function columnsFor(widthPx: number, minCardPx = 240): number {
  if (widthPx < 480) return 1;
  return Math.max(1, Math.floor(widthPx / minCardPx));
}
