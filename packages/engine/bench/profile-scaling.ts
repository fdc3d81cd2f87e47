/**
 * How computeProfile grows with the bar's length: the example design at 75, 150, 300 and 600 mm,
 * all at the step the 150 mm bar gets by default (1/2000 of a lobe), so the samples grow with the
 * length; CPU medians of warm runs. Takes the engine as an argument so that another build of it can
 * be measured the same way.
 */
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import type * as Engine from '../src/index';
import { cpuMedian, ms } from './bench-timing';

type ProfileEngine = Pick<typeof Engine, 'computeProfile' | 'computeBarSamples' | 'defaultStep'>;

export function profileScaling(engine: ProfileEngine, label = 'engine'): void {
  const step = engine.defaultStep(EXAMPLE_DESIGN);
  console.log(`${label}: computeProfile of the example design (24-lobe sine) by bar length, at ${step.toPrecision(3)} mm (CPU, median of warm runs):`);
  let first = 0;
  for (const length of [75, 150, 300, 600]) {
    const design: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length } };
    const n = engine.computeBarSamples(design, { step }).x.length;
    const runs = Math.max(9, Math.round(4_000_000 / n));
    const profile = cpuMedian(runs, () => engine.computeProfile(design, { step }));
    // The Point arrays as a reader that walks them gets them (built on first read since they became lazy).
    const read = cpuMedian(Math.max(5, runs >> 2), () => {
      const p = engine.computeProfile(design, { step });
      return p.barEdge.length + p.cutterPath.length + p.followerPath.length;
    });
    const typed = cpuMedian(runs, () => engine.computeBarSamples(design, { step }));
    first ||= profile.median / length;
    const growth = profile.median / length / first;
    console.log(
      `  ${String(length).padStart(3)} mm, ${String(n).padStart(6)} samples: computeProfile ${ms(profile.median)} (${((1e6 * profile.median) / n).toFixed(0)} ns a sample, ${growth.toFixed(2)}× the 75 mm bar's time per mm)` +
        `; with the Point arrays read ${ms(read.median)}; typed arrays only ${ms(typed.median)}`,
    );
  }
  const coarse = cpuMedian(200, () => engine.computeProfile(EXAMPLE_DESIGN, { step: 0.01 }));
  console.log(`  150 mm at 0.01 mm (15 013 samples): computeProfile ${ms(coarse.median)}   (target < 5 ms)`);
}
