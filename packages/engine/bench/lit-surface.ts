/**
 * The lit engraved surface: a 40 mm window of the example design's line study (x 55–95 mm, every
 * line) drawn 1280 px wide. The height field is computed once per design, window and size; moving
 * the light only reshades it. CPU medians of warm runs.
 */
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { computeHeightField, computeLineStudy, computeProfile, shadeHeightField } from '../src/index';
import { cpuMedian, ms } from './bench-timing';

export function litSurface(): void {
  const design = EXAMPLE_DESIGN;
  const study = computeLineStudy(design, computeProfile(design));
  let top = -Infinity;
  for (const line of study.lines) for (const [, y] of line.points) top = Math.max(top, y);
  const window = { x0: 55, x1: 95, y0: -0.5, y1: top + 0.5 };
  const width = 1280;
  const height = Math.round((width * (window.y1 - window.y0)) / (window.x1 - window.x0));
  console.log(`lit surface, 40 mm window of the example's study (${study.lines.length} lines) at ${width} × ${height} px:`);
  for (const supersample of [1, 2, 3]) {
    const input = { lines: study.lines, depth: design.study.depth, vAngle: design.study.vAngle, window, width, height, supersample };
    const field = computeHeightField(input);
    const compute = cpuMedian(9, () => computeHeightField(input), 2);
    // As the lit plate's worker computes it: over the last field's memory.
    let last = field;
    const reusing = cpuMedian(9, () => (last = computeHeightField({ ...input, reuse: last })), 2);
    let azimuth = 0;
    const shade = cpuMedian(31, () => shadeHeightField(field, { azimuthDeg: (azimuth += 7), elevationDeg: 40 }, 'silver'), 5);
    // As the plate's worker reshades: over the last picture.
    let picture = shadeHeightField(field, { azimuthDeg: 0, elevationDeg: 40 }, 'silver');
    const over = cpuMedian(31, () => (picture = shadeHeightField(field, { azimuthDeg: (azimuth += 7), elevationDeg: 40 }, 'silver', picture)), 5);
    const note = supersample === 2 ? '   (targets: field < 50 ms, reshading < 8 ms)' : '';
    console.log(`  ${supersample}×${supersample} samples a pixel: height field ${ms(compute.median)} (over the last one's memory ${ms(reusing.median)}), reshading ${ms(shade.median)} (over the last picture ${ms(over.median)})${note}`);
  }
}
