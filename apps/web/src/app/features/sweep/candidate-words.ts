import type { ShopCutter, ShopFollower, ShopRubber, ShopTravel, SweepCandidate, Units } from '@barwright/contracts';
import type { CandidateFigures } from '@barwright/engine';
import { formatLength } from '@barwright/engine/length-format';

/*
 * The words of a sweep card and of the choices, pure. Shop lengths are in the sweep's units; the
 * figures in mm; everything goes through the one length formatter.
 */

const inMm = (v: number, units: Units) => (units === 'in' ? v * 25.4 : v);

export function rubberWords(r: ShopRubber, units: Units): string {
  const size = r.shape === 'round' ? `round, radius ${formatLength(inMm(r.radius, units), units)}` : `flat, ${formatLength(inMm(r.width, units), units)} wide`;
  return r.name ? `${r.name} (${size})` : size;
}

export function travelWords(t: ShopTravel, units: Units): string {
  const size = `${formatLength(inMm(t.travelPerRev, units), units)} a revolution${t.leverRatio === 1 ? '' : `, lever ×${t.leverRatio}`}`;
  return t.name ? `${t.name} (${size})` : size;
}

export function cutterWords(c: ShopCutter, units: Units): string {
  const size = `⌀ ${formatLength(inMm(c.diameter, units), units)}, ${c.flutes} flute${c.flutes === 1 ? '' : 's'}`;
  return c.name ? `${c.name} (${size})` : size;
}

export function followerWords(f: ShopFollower, units: Units): string {
  const size = `radius ${formatLength(inMm(f.radius, units), units)}`;
  return f.name ? `${f.name} (${size})` : size;
}

/** The card's lines: what the candidate is, then its figures (lengths in `units`). */
export interface CardWords {
  rubber: string;
  travel: string;
  cutter: string;
  period: string;
  height: string;
  crest: string;
  /** Crest sharper than the cutter can cut. */
  crestTight: boolean;
  loss: string;
  lossYes: boolean;
  keeper: string;
}

/** Minutes as "42 min" or "1 h 05 min". */
export function minutesText(minutes: number): string {
  const m = Math.round(minutes);
  return m < 60 ? `${m} min` : `${Math.floor(m / 60)} h ${String(m % 60).padStart(2, '0')} min`;
}

export function cardWords(c: SweepCandidate, fig: CandidateFigures): CardWords {
  const len = (mm: number) => formatLength(mm, c.units);
  // 0 is a sharp corner of the bar edge (a crest no cutter rounds), Infinity a straight bar.
  const crestRadius = fig.crestRadius === 0 ? 'sharp corner,' : Number.isFinite(fig.crestRadius) ? len(fig.crestRadius) : 'straight,';
  return {
    rubber: c.rubber.name || rubberWords(c.rubber, c.units),
    travel: c.travel.name || travelWords(c.travel, c.units),
    cutter: c.cutter.name || cutterWords(c.cutter, c.units),
    period: len(fig.period),
    height: len(fig.barHeight),
    crest: `${crestRadius} ${fig.crestBelowCutter ? 'under' : 'against'} the cutter's ${len(fig.cutterRadius)}`,
    crestTight: fig.crestBelowCutter,
    loss: fig.detailLoss ? `yes, ${len(fig.detailLost)}` : 'no',
    lossYes: fig.detailLoss,
    keeper: minutesText(fig.keeperMinutes),
  };
}
