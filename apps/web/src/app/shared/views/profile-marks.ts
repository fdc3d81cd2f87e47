import type { Units } from '@barwright/contracts';
import { formatLength, formatLengthRange, type EngineWarning } from '@barwright/engine';

/**
 * How much a loss of detail matters, by the loss against the cutter path's peak-to-valley height:
 * - trifle, under 10 %: the engraved wave keeps its shape; the eye does not tell it from the rosette's
 *   on a finished plate (a tenth is about where a turner starts to see a crest flatten; from memory);
 * - notable, 10 % to 50 %: the crests or valleys visibly change shape;
 * - severe, over 50 %: more than half the wave is gone there, so the pattern reads as another one.
 */
export type Severity = 'trifle' | 'notable' | 'severe';
export const NOTABLE_SHARE = 0.1;
export const SEVERE_SHARE = 0.5;

export function severityOf(amount: number | undefined, amplitude: number): Severity {
  if (amount === undefined || !(amplitude > 0)) return 'notable';
  const share = amount / amplitude;
  return share > SEVERE_SHARE ? 'severe' : share >= NOTABLE_SHARE ? 'notable' : 'trifle';
}

const RANK: Readonly<Record<Severity, number>> = { trifle: 0, notable: 1, severe: 2 };

/** Warnings that name places where the engraved line loses detail (drawn on the profile). */
export function isDetailLoss(w: EngineWarning): boolean {
  return !!w.at && (w.code.startsWith('detail-lost') || w.code === 'follower-radius');
}

/** One stretch of the window (mm) where detail is lost, with the worst severity of what falls there. */
export interface LossStretch {
  from: number;
  to: number;
  severity: Severity;
  titles: string[];
}

/**
 * The places of every detail-loss warning inside [from, to] (mm), repeated each period (the bar
 * repeats bit for bit), merged where they overlap or touch, so each place is drawn once.
 */
export function lossStretches(warnings: readonly EngineWarning[], from: number, to: number, period: number, amplitude: number): LossStretch[] {
  const raw: LossStretch[] = [];
  for (const w of warnings) {
    if (!isDetailLoss(w)) continue;
    const severity = severityOf(w.amount, amplitude);
    for (const zone of w.zones ?? [w.at!]) {
      const first = period > 0 ? Math.ceil((from - zone.xTo) / period) : 0;
      for (let k = first; zone.xFrom + k * period <= to && raw.length < 2000; k++) {
        const a = Math.max(from, zone.xFrom + k * period);
        const b = Math.min(to, zone.xTo + k * period);
        if (b >= a) raw.push({ from: a, to: b, severity, titles: [w.message] });
        if (!(period > 0)) break;
      }
    }
  }
  raw.sort((p, q) => p.from - q.from);
  const merged: LossStretch[] = [];
  for (const s of raw) {
    const last = merged[merged.length - 1];
    if (last && s.from <= last.to) {
      last.to = Math.max(last.to, s.to);
      if (RANK[s.severity] > RANK[last.severity]) last.severity = s.severity;
      if (!last.titles.includes(s.titles[0])) last.titles.push(s.titles[0]);
    } else merged.push({ ...s, titles: [...s.titles] });
  }
  return merged;
}

/** A warning as the profile view lists it: severity, and positions moved into the window shown. */
export interface ShownWarning {
  severity: Severity | null;
  message: string;
}

/** Matches the places an engine message names: `at x 6.65–10.02 mm`, `at x 3.5 in`. */
const PLACE = /at x (-?\d+(?:\.\d+)?(?:e-?\d+)?)(?:–(-?\d+(?:\.\d+)?(?:e-?\d+)?))? (mm|in)/g;

/**
 * The warnings in the window's own coordinates: a place the engine gives in the first period is
 * moved by whole periods to the first repeat inside [from, to] (the bar repeats each period), and a
 * repeating place says "and every P along the bar". Detail losses carry their severity.
 */
export function shownWarnings(warnings: readonly EngineWarning[], window: { from: number; to: number }, period: number, amplitude: number, units: Units): ShownWarning[] {
  return warnings.map((w) => {
    if (!isDetailLoss(w)) return { severity: null, message: w.message };
    let every = period > 0 && !/every .* along the bar/.test(w.message);
    const message = w.message.replace(PLACE, (_all, a: string, b: string | undefined, unit: string) => {
      // The place in the unit the message writes it in (the design's), shown in the view's.
      const mmPer = unit === 'in' ? 25.4 : 1;
      const xa = Number(a) * mmPer;
      const xb = (b === undefined ? Number(a) : Number(b)) * mmPer;
      const k = period > 0 ? Math.ceil((window.from - xa) / period) : 0;
      const [sa, sb] = [xa + k * period, xb + k * period];
      const place = `at x ${b === undefined ? formatLength(sa, units) : formatLengthRange(sa, sb, units)}`;
      if (!every) return place;
      every = false; // said once, after the first place
      return `${place}, and every ${formatLength(period, units)} along the bar`;
    });
    const share = w.amount !== undefined && amplitude > 0 ? ` (${Math.round((100 * w.amount) / amplitude)} % of the ${formatLength(amplitude, units)} wave)` : '';
    return { severity: severityOf(w.amount, amplitude), message: `${message}${share}` };
  });
}
