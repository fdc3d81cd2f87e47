import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { barSamples } from './profile';

/**
 * ProfileOptions.allocate: the four output arrays come from the caller (the studio's worker writes
 * each edit over the arrays the page handed back, as they are: clearing 2.3 MB an edit was time spent
 * for nothing). The engine writes every element, so the bar must be the same bit for bit whatever the
 * arrays held: here each comes full of NaN, on the tiled path and the whole bar's, with the bar's end
 * off the sampling grid, and for each companion.
 */
describe('the profile written into arrays the caller gives', () => {
  /** Hands out arrays cut from buffers already used (NaN in every element, and room to spare as the worker's pool keeps), and keeps them. */
  function recycling() {
    const given: Float64Array[] = [];
    const allocate = (length: number) => {
      const array = new Float64Array(new Float64Array(length + 7).fill(NaN).buffer, 0, length);
      given.push(array);
      return array;
    };
    return { allocate, given };
  }
  const offCentre: Design = { ...structuredClone(EXAMPLE_DESIGN), cutter: { ...EXAMPLE_DESIGN.cutter, offset: 0.4 } } as Design;

  // A bar whose end falls between two samples: the last point is the end itself, written apart.
  const offGrid: Design = { ...structuredClone(EXAMPLE_DESIGN), bar: { ...EXAMPLE_DESIGN.bar, length: EXAMPLE_DESIGN.bar.length + 0.0037 } } as Design;

  for (const [name, design, tile, companion] of [
    ['tiled (the example)', EXAMPLE_DESIGN, true, undefined],
    ['whole bar (the example, untiled)', EXAMPLE_DESIGN, false, undefined],
    ['whole bar (a cutter off the centre line, which is never tiled)', offCentre, true, undefined],
    ['tiled, the end off the grid', offGrid, true, undefined],
    ['whole bar, the end off the grid', offGrid, false, undefined],
    ['tiled, the inverted companion', EXAMPLE_DESIGN, true, 'inverted'],
    ['tiled, the opposite blank', offGrid, true, 'opposite'],
    ['whole bar, the counter-phase companion', offGrid, false, 'counter-phase'],
  ] as const) {
    it(`gives the same bar and uses the arrays given: ${name}`, () => {
      const { allocate, given } = recycling();
      const own = barSamples(design, { step: 0.01, companion }, tile);
      const into = barSamples(design, { step: 0.01, companion, allocate }, tile);
      for (const key of ['x', 'cutter', 'bar', 'follower'] as const) {
        expect(into[key]).toEqual(own[key]);
        expect(given).toContain(into[key]);
      }
      expect(given).toHaveLength(4);
      expect(into.warnings).toEqual(own.warnings);
    });
  }
});
