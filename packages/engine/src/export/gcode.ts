import { MM_PER_INCH, type Units } from '@barwright/contracts';
import type { CutPlan } from '../cut-plan';
import { SHORT_CAUTION } from '../cut-plan-notes';
import type { Point } from '../types';
import { fixed } from './number-format';

/** What the program needs; lengths in mm, feeds in mm/min. */
export interface GcodeJob {
  title: string;
  units: Units;
  /** Final cutter-centre path, x from 0 to the bar length, lowest point at y = 0. */
  cutterPath: readonly Point[];
  plan: CutPlan;
  /**
   * The cutter path within one cutter radius beyond each end (x < 0, x > length): the pattern carried
   * on, so the ends are cut as the profile shows them. Without them the lead-in and lead-out are straight.
   */
  leadIn?: readonly Point[];
  leadOut?: readonly Point[];
  cutterDiameter: number;
  flutes: number;
  barLength: number;
  barThickness: number;
}

/** Safe height above the bar's top face for rapids, mm (about 0.2 in). */
export const SAFE_HEIGHT_MM = 5;
/** The end mill's tip goes this far below the bar's bottom face so the flutes cut the full edge, mm. */
export const Z_OVERCUT_MM = 0.5;
/** Lead-in and lead-out clearance beyond the cutter radius at each end of the bar, mm. */
export const GCODE_CLEARANCE_MM = 1;
const DECIMALS: Readonly<Record<Units, number>> = { mm: 4, in: 5 };

/** Offset of pass k (1-based) above the final path, mm: the depth less what k passes have taken. */
export function passOffset(plan: Pick<CutPlan, 'depth' | 'stepOver'>, k: number): number {
  return plan.depth - Math.min(k * plan.stepOver, plan.depth);
}

/**
 * A program in the RS274NGC subset: G20/G21, G90, G17, G94, G0 rapids, G1 feeds with F,
 * M3 with S, M5, M30, comments in parentheses. Tool-centre coordinates (no cutter compensation);
 * work zero: X0 the bar's left end, Y0 the final path's lowest point, Z0 the bar's top face.
 */
export function barGcode(job: GcodeJob): string {
  const scale = job.units === 'in' ? 1 / MM_PER_INCH : 1;
  const n = (mm: number) => fixed(mm * scale, DECIMALS[job.units]);
  const { plan } = job;
  const radius = job.cutterDiameter / 2;
  const startX = -(radius + GCODE_CLEARANCE_MM);
  const endX = job.barLength + radius + GCODE_CLEARANCE_MM;
  const cutZ = -(job.barThickness + Z_OVERCUT_MM);
  // Feed per minute from the cut plan (rpm × flutes × chip load), not the slide's travel setting.
  const feed = plan.feedPerMinute;
  const path = [...(job.leadIn ?? []), ...job.cutterPath, ...(job.leadOut ?? [])];
  const first = path[0];
  const last = path[path.length - 1];
  const ends = job.leadIn && job.leadOut
    ? '(In and out: straight to within one cutter radius of the bar, then along the pattern, so the ends are cut as drawn.)'
    : '(In and out: straight at the height of the path at the ends; within one cutter radius of each end the edge is left higher than drawn.)';
  const lines = [
    '%',
    `(Barwright pattern bar: ${comment(job.title)})`,
    `(CAUTION: ${comment(SHORT_CAUTION)})`,
    '(Work zero: X0 the left end of the bar, Y0 the lowest point of the final cutter-centre path, Z0 the top face of the bar.)',
    `(Cutter: ${n(job.cutterDiameter)} ${job.units} end mill, ${job.flutes} flutes; tool-centre path, no cutter compensation.)`,
    `(The tip goes ${n(Z_OVERCUT_MM)} ${job.units} below the bar: support the bar on a spoil board or parallels clear of the cut.)`,
    `(${plan.passes} passes of ${n(plan.stepOver)} ${job.units}, depth ${n(plan.depth)} ${job.units}, about ${plan.totalMinutes.toFixed(1)} min.)`,
    `(Feed ${n(feed)} ${job.units}/min from the cut plan: ${Math.round(plan.rpm)} rpm x ${job.flutes} flutes x ${n(plan.chipLoad)} ${job.units} a tooth; plunge at half.)`,
    ends,
    job.units === 'in' ? 'G20 (inches)' : 'G21 (millimetres)',
    'G90 G17 G94 (absolute, XY plane, feed per minute)',
    `G0 Z${n(SAFE_HEIGHT_MM)}`,
    `M3 S${Math.round(plan.rpm)}`,
  ];
  for (let k = 1; k <= plan.passes; k++) {
    const offset = passOffset(plan, k);
    lines.push(
      `(pass ${k} of ${plan.passes}, ${n(offset)} ${job.units} above the final path)`,
      `G0 X${n(startX)} Y${n(first[1] + offset)}`,
      `G1 Z${n(cutZ)} F${n(feed / 2)}`,
      `G1 X${n(first[0])} Y${n(first[1] + offset)} F${n(feed)}`,
    );
    // A loop, not a spread: a spread passes every point as an argument and overflows the stack on a long path.
    for (let i = 1; i < path.length; i++) lines.push(`X${n(path[i][0])} Y${n(path[i][1] + offset)}`);
    lines.push(
      `X${n(endX)} Y${n(last[1] + offset)}`,
      `G0 Z${n(SAFE_HEIGHT_MM)}`,
    );
  }
  lines.push('M5', `G0 X${n(startX)}`, 'M30', '%', '');
  return lines.join('\n');
}

/** Parentheses end a comment in RS274NGC, so they cannot appear inside one. */
function comment(text: string): string {
  return text.replace(/[()]/g, '');
}
