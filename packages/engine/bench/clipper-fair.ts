/**
 * The engine's disc envelopes beside clipper-lib's polygon offsetting, measured fairly:
 * - the same work on both sides: the bar edge (the region below the cutter path eroded by the cutter)
 *   and the follower path (that edge dilated by the follower), from the same cutter path samples;
 * - CPU time (process.cpuUsage), warm runs on both sides;
 * - accuracy measured on both sides against one reference: the erosion taken by brute force over the
 *   same path sampled 16 times finer, read at points on and between the engine's samples (an edge is
 *   drawn and exported as a polyline through its samples);
 * - two phases of the rosette: one that puts the bar's ridges (where the cutter's arcs meet over a
 *   narrow valley) between samples (0.37 of a step off), where sampling costs the engine accuracy, and one
 *   that puts them on samples (the example as it is), where its sampling is exact;
 * - at equal accuracy: the engine's step is made finer until its error is no larger than clipper's.
 * Clipper's time grows faster than the number of points (4 800 points take seconds), so the bar is
 * 10 mm long here (2.4 periods).
 */
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { computeBarSamples, lowerDiscEnvelope, upperDiscEnvelope } from '../src/index';
import { clipperEnvelopes, topHeights } from '../src/testing/clipper-envelope';
import { cpuMedian, cpuMs, ms } from './bench-timing';

const LENGTH = 10;
const TOLERANCE = 1e-4; // clipper's arc tolerance (mm), its most accurate setting used in the specs
const rc = EXAMPLE_DESIGN.cutter.diameter / 2;
const rf = EXAMPLE_DESIGN.follower.radius;

interface Side {
  error: number;
  cpu: number;
}

interface EngineSide extends Side {
  /** The whole computation at that step (rosette, rubber, envelopes, warnings): a finer step needs the path sampled finer too. */
  whole: number;
}

export function clipperFair(): void {
  const base: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: LENGTH } };
  const h = computeBarSamples(base).grid.step;
  const period = base.motion.travelPerRev / base.rosette.layers[0].lobes;
  // 0.37 of a step: off the nodes of this grid and of every finer one tried (½, ¼, ⅛ of the step).
  const between: Design = { ...base, rosette: { ...base.rosette, layers: [{ ...base.rosette.layers[0], phase: (0.37 * h) / period }] } };
  console.log(`engine envelopes against clipper-lib offsetting (bar edge + follower of a ${LENGTH} mm bar, cutter Ø ${2 * rc}, follower r ${rf}; CPU time):`);
  warmClipper(base, h);
  for (const [name, design] of [['ridges between samples', between], ['ridges on samples', base]] as const) {
    const evalX = evaluationPoints(h);
    const reference = referenceEdge(design, h / 16, evalX);
    const clipper = clipperSide(design, h, evalX, reference);
    const steps = [1, 2, 4, 8].map((k) => ({ k, ...engineSide(design, h / k, evalX, reference) }));
    const atStep = steps[0];
    const matched = steps.find((s) => s.error <= clipper.error * (1 + 1e-9)) ?? steps[steps.length - 1];
    const um = (v: number) => `${(1000 * v).toFixed(3)} µm`;
    console.log(`  ${name}: clipper-lib at step ${h.toPrecision(3)} mm, arc tolerance ${TOLERANCE} mm: ${ms(clipper.cpu)}, worst error ${um(clipper.error)}`);
    console.log(`    engine, same step: envelopes ${ms(atStep.cpu)} (whole profile ${ms(atStep.whole)}), worst error ${um(atStep.error)}`);
    for (const s of steps.slice(1)) console.log(`    engine at step/${s.k}: envelopes ${ms(s.cpu)} (whole profile ${ms(s.whole)}), worst error ${um(s.error)}`);
    const equal = matched.error <= clipper.error * (1 + 1e-9);
    console.log(
      equal
        ? `    at equal accuracy (engine at step/${matched.k}): about ${roundRatio(clipper.cpu / matched.cpu)}× faster on the envelopes alone, about ${roundRatio(clipper.cpu / matched.whole)}× counting the whole profile at that step`
        : `    the engine does not reach clipper's accuracy by step/8 (${um(matched.error)}); at step/8 it is ${roundRatio(clipper.cpu / matched.cpu)}× faster`,
    );
  }
}

/** x (mm) on and between the engine's samples, clear of the bar's ends by more than a cutter radius (Clipper's polygon stops there). */
function evaluationPoints(h: number): Float64Array {
  const from = rc + 0.2;
  const to = LENGTH - rc - 0.2;
  const count = Math.floor((to - from) / (h / 4));
  return Float64Array.from({ length: count }, (_, i) => from + (i * h) / 4);
}

/** The eroded edge by brute force over the path sampled at `fine`: min over the path points in reach of y − √(rc² − dx²). */
function referenceEdge(design: Design, fine: number, xs: Float64Array): Float64Array {
  const path = computeBarSamples(design, { step: fine });
  const out = new Float64Array(xs.length);
  for (let i = 0; i < xs.length; i++) {
    let best = Infinity;
    const j0 = Math.max(0, Math.ceil((xs[i] - rc) / fine));
    const j1 = Math.min(path.x.length - 1, Math.floor((xs[i] + rc) / fine));
    for (let j = j0; j <= j1; j++) {
      const dx = xs[i] - path.x[j];
      const v = path.cutter[j] - Math.sqrt(Math.max(0, rc * rc - dx * dx));
      if (v < best) best = v;
    }
    out[i] = best;
  }
  return out;
}

function engineSide(design: Design, step: number, xs: Float64Array, reference: Float64Array): EngineSide {
  const path = computeBarSamples(design, { step });
  const h = path.grid.step;
  const work = () => upperDiscEnvelope(lowerDiscEnvelope(path.cutter, h, rc), h, rf);
  const edge = lowerDiscEnvelope(path.cutter, h, rc);
  let error = 0;
  for (let i = 0; i < xs.length; i++) {
    const k = Math.min(edge.length - 2, Math.floor(xs[i] / h));
    const w = xs[i] / h - k;
    error = Math.max(error, Math.abs(edge[k] + w * (edge[k + 1] - edge[k]) - reference[i]));
  }
  return { error, cpu: cpuMedian(200, work).median, whole: cpuMedian(50, () => computeBarSamples(design, { step })).median };
}

function clipperSide(design: Design, step: number, xs: Float64Array, reference: Float64Array): Side {
  const path = computeBarSamples(design, { step });
  const run = () => clipperEnvelopes(path.x, path.cutter, rc, rf, { arcTolerance: TOLERANCE });
  const times = [cpuMs(run), cpuMs(run)];
  const { bar, scale } = run();
  const edge = topHeights(bar, scale, xs);
  let error = 0;
  for (let i = 0; i < xs.length; i++) error = Math.max(error, Math.abs(edge[i] - reference[i]));
  return { error, cpu: (times[0] + times[1]) / 2 };
}

/** One run on a short bar first, so that clipper's measured runs are not its first (its code warmed up). */
function warmClipper(design: Design, h: number): void {
  const path = computeBarSamples({ ...design, bar: { ...design.bar, length: 2 } }, { step: h });
  for (let i = 0; i < 3; i++) clipperEnvelopes(path.x, path.cutter, rc, rf, { arcTolerance: TOLERANCE });
}

function roundRatio(v: number): string {
  const digits = 10 ** Math.max(0, Math.floor(Math.log10(v)) - 1);
  return (Math.round(v / digits) * digits).toLocaleString('en-GB');
}
