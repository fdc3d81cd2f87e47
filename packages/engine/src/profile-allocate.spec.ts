import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { barSamples } from './profile';

/**
 * ProfileOptions.allocate: the four output arrays come from the caller (the studio's worker writes
 * each edit over the arrays the page handed back). The bar must be the same bit for bit whatever the
 * arrays held before they were cleared, on the tiled path and on the whole bar's.
 */
describe('the profile written into arrays the caller gives', () => {
  /** Hands out arrays cut from buffers already used (non-zero bytes under a zero-filled view's length), and keeps them. */
  function recycling() {
    const given: Float64Array[] = [];
    const allocate = (length: number) => {
      const buffer = new Float64Array(length + 7).fill(123.456).buffer; // room to spare, as the worker's pool keeps
      const array = new Float64Array(buffer, 0, length).fill(0);
      given.push(array);
      return array;
    };
    return { allocate, given };
  }
  const offCentre: Design = { ...structuredClone(EXAMPLE_DESIGN), cutter: { ...EXAMPLE_DESIGN.cutter, offset: 0.4 } } as Design;

  for (const [name, design, tile] of [
    ['tiled (the example)', EXAMPLE_DESIGN, true],
    ['whole bar (the example, untiled)', EXAMPLE_DESIGN, false],
    ['whole bar (a cutter off the centre line, which is never tiled)', offCentre, true],
  ] as const) {
    it(`gives the same bar and uses the arrays given: ${name}`, () => {
      const { allocate, given } = recycling();
      const own = barSamples(design, { step: 0.01 }, tile);
      const into = barSamples(design, { step: 0.01, allocate }, tile);
      for (const key of ['x', 'cutter', 'bar', 'follower'] as const) {
        expect(into[key]).toEqual(own[key]);
        expect(given).toContain(into[key]);
      }
      expect(given).toHaveLength(4);
      expect(into.warnings).toEqual(own.warnings);
    });
  }
});
