import { describe, expect, it } from 'vitest';
import type { RackShop } from '@barwright/contracts';
import { shopInUnits, shopMm } from './shop-units';

const shop: RackShop = {
  units: 'in',
  rubbers: [{ shape: 'round', radius: 0.25 }, { name: 'wide', shape: 'flat', width: 0.5 }],
  travels: [{ travelPerRev: 2, leverRatio: 0.5 }],
  cutters: [{ diameter: 0.125, flutes: 2 }],
  followers: [{ radius: 0.0625 }],
  vCutters: [{ vAngle: 60 }],
};

describe('shopInUnits', () => {
  it('converts every length at 25.4 mm to the inch exactly (the inch is defined as 25.4 mm, 1959) and leaves ratios, flutes and angles', () => {
    const mm = shopInUnits(shop, 'mm');
    expect(mm.rubbers[0]).toEqual({ shape: 'round', radius: 6.35 });
    expect(mm.rubbers[1]).toEqual({ name: 'wide', shape: 'flat', width: 12.7 });
    expect(mm.travels[0]).toEqual({ travelPerRev: 50.8, leverRatio: 0.5 });
    expect(mm.cutters[0]).toEqual({ diameter: 3.175, flutes: 2 });
    expect(mm.followers[0].radius).toBeCloseTo(1.5875, 12);
    expect(mm.vCutters[0].vAngle).toBe(60);
    expect(shopInUnits(mm, 'in').travels[0].travelPerRev).toBe(2);
  });
  it('is the same shop when the units already match', () => {
    expect(shopInUnits(shop, 'in')).toBe(shop);
    expect(shopMm(1, 'in')).toBe(25.4);
    expect(shopMm(3, 'mm')).toBe(3);
  });
});
