import type * as z from 'zod';
import type { Design, RosetteLayer } from './design';

/**
 * Bounds on the work a design asks of the engine, as products of its factors (each factor alone has
 * its own field limit). Chosen from measurement: the demo bars and presets reach at most 48 lobes,
 * 72 crests along the bar and 5 760 line-crests; a bar at all three bounds profiles, exports and
 * draws its study in about 2 s; the unbounded 8 × 360-lobe, 32-term, 1 000-line file needed minutes.
 */
export const COMPLEXITY_LIMITS = {
  /** Σ over the moving layers of lobes × highest harmonic: the finest detail of one revolution. */
  rosetteDetail: 4096,
  /** Crests of that finest detail along the bar: bar length ÷ travel per revolution × the largest lobes × harmonic. */
  barCrests: 20_000,
  /** Engraved lines × crests along the bar: what the line study draws. */
  studyCrests: 250_000,
} as const;

/** The highest harmonic of a layer's wave: a Fourier series' largest k, half a measured table's readings, else 1. */
function harmonic(layer: RosetteLayer): number {
  const wave = layer.wave;
  if (wave.shape === 'fourier') return wave.terms.reduce((k, t) => Math.max(k, t.k), 1);
  if (wave.shape === 'measured') return Math.ceil(wave.points.length / 2);
  return 1;
}

export interface DesignComplexity {
  rosetteDetail: number;
  barCrests: number;
  studyCrests: number;
}

/** The three products of a design (unit-free: lengths enter only as the ratio bar length ÷ travel). */
export function designComplexity(d: Pick<Design, 'rosette' | 'motion' | 'bar' | 'study'>): DesignComplexity {
  const moving = d.rosette.layers.filter((l) => l.amplitude > 0 || (l.wave.shape === 'measured' && l.wave.scale === 'as-read'));
  const details = moving.map((l) => l.lobes * harmonic(l));
  const rosetteDetail = details.reduce((s, n) => s + n, 0);
  const finest = details.reduce((m, n) => Math.max(m, n), 0);
  const barCrests = Math.ceil((d.bar.length / d.motion.travelPerRev) * finest);
  return { rosetteDetail, barCrests, studyCrests: d.study.lines * barCrests };
}

/** Adds a field-named issue for each product over its bound, saying how to narrow it. */
export function checkDesignComplexity(d: Design, ctx: z.RefinementCtx): void {
  const c = designComplexity(d);
  const n = (v: number) => v.toLocaleString('en-US');
  const { rosetteDetail, barCrests, studyCrests } = COMPLEXITY_LIMITS;
  if (c.rosetteDetail > rosetteDetail) {
    ctx.addIssue({
      code: 'custom',
      path: ['rosette', 'layers'],
      message: `is too detailed to compute: lobes × highest harmonic, summed over the layers, is ${n(c.rosetteDetail)} (at most ${n(rosetteDetail)}); use fewer layers, lobes or Fourier harmonics`,
    });
    return; // the other two follow from this one; one message says what to change
  }
  if (c.barCrests > barCrests) {
    ctx.addIssue({
      code: 'custom',
      path: ['bar', 'length'],
      message: `holds ${n(c.barCrests)} of the rosette's finest crests (bar length ÷ travel per revolution × lobes × harmonic; at most ${n(barCrests)}); shorten the bar, lengthen motion.travelPerRev or use fewer lobes or harmonics`,
    });
    return;
  }
  if (c.studyCrests > studyCrests) {
    ctx.addIssue({
      code: 'custom',
      path: ['study', 'lines'],
      message: `× the ${n(c.barCrests)} crests along the bar is ${n(c.studyCrests)} (at most ${n(studyCrests)}); use at most ${n(Math.floor(studyCrests / c.barCrests))} lines, or a shorter bar`,
    });
  }
}
