import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { setUpFacts } from './design-facts';

describe('setUpFacts', () => {
  it('lists the set-up in the trade’s words, units beside every length', () => {
    const facts = Object.fromEntries(setUpFacts(EXAMPLE_DESIGN).map((f) => [f.label, f.value]));
    expect(facts['Rosette']).toBe('24 lobes, Sine, 1.5 mm peak to valley');
    expect(facts['End mill']).toBe('4.76 mm diameter, 2 flutes');
    expect(facts['Rubber']).toBe('round, 1 mm radius');
    expect(facts['Line study']).toBe('40 lines at 0.45 mm');
    expect(facts['Phase schedule']).toBe('Barleycorn');
    expect(facts['Bar']).toBe('150 mm × 7.94 mm, A2 tool steel');
  });

  it('names every layer of a compound rosette, in inches for an inch file', () => {
    const design = {
      ...EXAMPLE_DESIGN,
      units: 'in' as const,
      rosette: { baseRadius: 2, layers: [EXAMPLE_DESIGN.rosette.layers[0], { lobes: 3, amplitude: 0.02, phase: 0, wave: { shape: 'pointed' as const } }] },
    };
    const rosette = setUpFacts(design)[0];
    expect(rosette.label).toBe('Rosette (2 layers)');
    expect(rosette.value).toBe('24 lobes, Sine, 1.5 in peak to valley + 3 lobes, Pointed, 0.02 in peak to valley');
  });
});
