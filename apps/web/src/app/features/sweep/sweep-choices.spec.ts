import { describe, expect, it } from 'vitest';
import { sweepCandidates, type Rack, type RackRosette } from '@barwright/contracts';
import { defaultChoices, entryMm, keysOfStars, optionsOf, starOf, starsOfKeys, toggled } from './sweep-choices';

const rosette = (id: string, name: string): RackRosette => ({
  id,
  name,
  units: 'mm',
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] },
  tags: ['sine'],
  notes: '',
  createdAt: '',
  updatedAt: '',
});
const rack: Rack = {
  units: 'mm',
  rosettes: [rosette('00000000-0000-4000-8000-000000000001', 'A'), rosette('00000000-0000-4000-8000-000000000002', 'B')],
  shop: {
    units: 'mm',
    rubbers: [{ shape: 'round', radius: 1 }, { shape: 'round', radius: 2.5 }, { shape: 'flat', width: 3 }],
    travels: [{ travelPerRev: 60, leverRatio: 1 }, { travelPerRev: 100, leverRatio: 1 }],
    cutters: [{ diameter: 3, flutes: 2 }],
    followers: [{ radius: 1.5 }],
    vCutters: [],
  },
};

describe('sweep choices', () => {
  it('starts from every rosette and the first of each list', () => {
    const c = defaultChoices(rack);
    expect(c.rosettes).toEqual({ by: 'all' });
    expect([c.rubbers.length, c.travels.length, c.cutters.length]).toEqual([1, 1, 1]);
    expect(c.barLength).toBe(150);
  });

  it('keeps the options in shop order when toggling, and a chosen item the shop lost', () => {
    const lost = { shape: 'round' as const, radius: 9 };
    const options = optionsOf(rack.shop.rubbers, [lost]);
    expect(options).toHaveLength(4);
    expect(toggled(options, [lost, rack.shop.rubbers[2]], rack.shop.rubbers[0], true)).toEqual([rack.shop.rubbers[0], rack.shop.rubbers[2], lost]);
    expect(toggled(options, [lost], lost, false)).toEqual([]);
  });

  it('finds starred candidates again after the lists are reordered', () => {
    const choices = { ...defaultChoices(rack), rubbers: rack.shop.rubbers.slice(0, 2), travels: rack.shop.travels };
    const entries = sweepCandidates(choices, rack.rosettes);
    const stars = new Set([starOf(entries[3].key.rosetteId, entries[3].candidate), starOf(entries[5].key.rosetteId, entries[5].candidate)]);
    const keys = keysOfStars(stars, entries);
    expect(keys).toEqual([entries[3].key, entries[5].key]);
    expect(new Set(starsOfKeys(keys, choices))).toEqual(stars);
    const reordered = { ...choices, rubbers: [...choices.rubbers].reverse() };
    expect(keysOfStars(stars, sweepCandidates(reordered, rack.rosettes))).toHaveLength(2);
  });

  it('reads typed lengths in the units', () => {
    expect(entryMm('0.25', 'in')).toBe(6.35);
    expect(entryMm(' ', 'mm')).toBeNull();
  });
});
