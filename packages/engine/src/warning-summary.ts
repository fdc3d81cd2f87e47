import type { Units } from '@barwright/contracts';
import { formatLength, formatLengthRange } from './length-format';
import type { EngineWarning } from './types';

export interface WarningSummaryInput {
  /** Peak-to-valley of the cutter path (mm): no amount is reported above it. */
  height: number;
  /** Period on the bar (mm), and whether the warnings' places are given once per period. */
  period: number;
  periodic: boolean;
  /** Bar length (mm), to say how often a place comes along the bar. */
  length: number;
  /** Units the messages are written in. */
  units: Units;
}

/** Places kept in `zones` for drawing them; the count says how many there are. */
export const MAX_ZONES = 100;

/**
 * One warning per code: the worst place's message (its amount bounded by the path's height), then
 * how many such places there are, in each period or along the bar, and the first. `at` and `amount`
 * are the worst place's, `first` the first place's, `zones` every place (up to MAX_ZONES), `count` how many.
 * Warnings without a place (whole-bar notes) are kept once each.
 */
export function summarizeWarnings(warnings: readonly EngineWarning[], input: WarningSummaryInput): EngineWarning[] {
  const byCode = new Map<string, EngineWarning[]>();
  const notes: EngineWarning[] = [];
  for (const w of warnings) {
    if (!w.at) {
      if (!notes.some((n) => n.code === w.code && n.message === w.message)) notes.push(w);
      continue;
    }
    const list = byCode.get(w.code) ?? [];
    list.push(w);
    byCode.set(w.code, list);
  }
  const placed = [...byCode.values()].map((list) => summarize(list, input));
  return [...notes, ...placed].map(finite);
}

function summarize(list: EngineWarning[], input: WarningSummaryInput): EngineWarning {
  const ordered = [...list].sort((a, b) => a.at!.xFrom - b.at!.xFrom);
  const worst = ordered.reduce((w, v) => ((v.amount ?? 0) > (w.amount ?? 0) ? v : w));
  const first = ordered[0].at!;
  const bounded = bound(worst, input);
  const count = ordered.length;
  const zones = ordered.slice(0, MAX_ZONES).map((w) => w.at!);
  if (count === 1) return { count, first, zones, ...bounded }; // a warning that already counts its places keeps its figures
  const len = (mm: number) => formatLength(mm, input.units);
  const periods = Math.max(1, Math.round(input.length / input.period));
  const often = input.periodic
    ? `${count} places in each period of ${len(input.period)} (about ${count * periods} along the bar)`
    : `${count} places along the bar`;
  const message = `${bounded.message} This happens at ${often}, the first at x ${formatLengthRange(first.xFrom, first.xTo, input.units)}; the figure given is the worst.`;
  return { ...bounded, message, count, first, zones };
}

/** The amount capped at the path's height, in the message too. */
function bound(w: EngineWarning, input: WarningSummaryInput): EngineWarning {
  if (w.amount === undefined || !(w.amount > input.height) || !(input.height > 0)) return w;
  const said = formatLength(w.amount, input.units);
  const capped = input.height;
  const message = w.message.includes(said) ? w.message.replace(said, `${formatLength(capped, input.units)} (the whole height of the path)`) : w.message;
  return { ...w, amount: capped, message };
}

/** No Infinity or NaN reaches a reader: such a figure is dropped with the words around it. */
function finite(w: EngineWarning): EngineWarning {
  const message = w.message.replace(/\s*\([^()]*(?:Infinity|NaN)[^()]*\)/g, '').replace(/-?Infinity|NaN/g, 'an unknown amount of');
  const { amount, ...rest } = w;
  return amount === undefined || Number.isFinite(amount) ? { ...w, message } : { ...rest, message };
}
