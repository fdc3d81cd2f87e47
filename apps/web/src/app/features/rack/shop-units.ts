import { MM_PER_INCH, type RackShop, type Units } from '@barwright/contracts';

/** A length of the shop in `units` as millimetres (inch = 25.4 mm exactly). */
export const shopMm = (value: number, units: Units): number => (units === 'in' ? value * MM_PER_INCH : value);

/**
 * The shop with its lengths in `to` (pure): rubber radii and widths, travel per revolution, end mill
 * diameters, follower radii. Inches are divided by 25.4, which gives the correctly rounded value.
 */
export function shopInUnits(shop: RackShop, to: Units): RackShop {
  if (shop.units === to) return shop;
  const f = (v: number) => (to === 'in' ? v / MM_PER_INCH : v * MM_PER_INCH);
  return {
    units: to,
    rubbers: shop.rubbers.map((r) => (r.shape === 'round' ? { ...r, radius: f(r.radius) } : { ...r, width: f(r.width) })),
    travels: shop.travels.map((t) => ({ ...t, travelPerRev: f(t.travelPerRev) })),
    cutters: shop.cutters.map((c) => ({ ...c, diameter: f(c.diameter) })),
    followers: shop.followers.map((x) => ({ ...x, radius: f(x.radius) })),
    vCutters: shop.vCutters.map((v) => ({ ...v })),
  };
}
