/**
 * CPU time of the benchmark's own process (process.cpuUsage: user + system), so that other work on a
 * shared machine inflates a figure less than wall-clock time would. Medians of warm runs.
 */
export interface Timing {
  /** Median and best CPU milliseconds of the measured runs. */
  median: number;
  best: number;
}

export function cpuMs(work: () => unknown): number {
  const start = process.cpuUsage();
  work();
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1000;
}

/** `warm` unmeasured runs, then the median and best of `runs` measured ones. */
export function cpuMedian(runs: number, work: () => unknown, warm = Math.min(20, runs)): Timing {
  for (let i = 0; i < warm; i++) work();
  const times = Array.from({ length: runs }, () => cpuMs(work)).sort((a, b) => a - b);
  return { median: times[Math.floor(runs / 2)], best: times[0] };
}

export const ms = (v: number) => `${v < 10 ? v.toFixed(2) : v.toFixed(1)} ms`;
