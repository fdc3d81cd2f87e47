import type { Units } from '@barwright/contracts';
import { formatLength, type CutPlan } from '@barwright/engine';

/** One figure of the cut plan, with its unit. */
export interface PlanFigure {
  label: string;
  value: string;
}

/** Minutes as the shop says them: "12 min", "1 h 05 min", "40 s". */
export function formatMinutes(minutes: number): string {
  if (!Number.isFinite(minutes)) return '—';
  if (minutes < 1) return `${Math.round(minutes * 60)} s`;
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  return `${Math.floor(whole / 60)} h ${String(whole % 60).padStart(2, '0')} min`;
}

/** The cut plan's figures in the design's units (the plan itself is in mm). */
export function planFigures(plan: CutPlan, units: Units): PlanFigure[] {
  const len = (mm: number) => formatLength(mm, units);
  return [
    { label: 'Depth into the edge', value: len(plan.depth) },
    { label: 'Passes', value: `${plan.passes} at ${len(plan.stepOver)}` },
    { label: 'Time per pass', value: formatMinutes(plan.minutesPerPass) },
    { label: 'Total cutting time', value: formatMinutes(plan.totalMinutes) },
    { label: 'Spindle speed', value: `${Math.round(plan.rpm).toLocaleString('en')} rpm` },
    { label: 'Feed for the chip load', value: feed(plan.feedPerMinute, units) },
    { label: 'Chip load per tooth', value: len(plan.chipLoad) },
    { label: 'Surface speed', value: `${Math.round(plan.surfaceSpeed)} m/min` },
  ];
}

/** A feed per minute to a tenth of a millimetre or a hundredth of an inch: finer than a slide is set. */
function feed(mmPerMinute: number, units: Units): string {
  const value = units === 'in' ? Number((mmPerMinute / 25.4).toFixed(2)) : Number(mmPerMinute.toFixed(1));
  return `${value} ${units}/min`;
}
