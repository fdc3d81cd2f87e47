import type { Design } from '@barwright/contracts';
import { computeProfile, cutterPlacement, placementText, profileSamples, toMm, type Profile } from '@barwright/engine';

/** The cutter's placement shown as a before and after: the nominal cutter path and the figures. */
export interface PlacementViews {
  /** Cutter heights (mm) with the cutter on the centre line and linear motion, on the profile's x. */
  nominal: Float64Array;
  /** "0.5 mm off the centre line, rocking 150 mm from its axis: amplitude +0.33 %, …" in the design's units. */
  text: string;
}

/** Null for a cutter on the centre line with linear motion (nothing to compare). */
export function placementViews(design: Design, profile: Profile): PlacementViews | null {
  const mm = toMm(design);
  if (!cutterPlacement(mm)) return null;
  const { offset: _offset, ...cutter } = design.cutter;
  const { pivot: _pivot, ...motion } = design.motion;
  const before = computeProfile({ ...design, cutter, motion }, { step: profile.step });
  // The typed arrays where the engine kept them (no Point array built), the Point arrays otherwise.
  const after = profileSamples(profile)?.cutter ?? Float64Array.from(profile.cutterPath, (p) => p[1]);
  const was = profileSamples(before)?.cutter ?? Float64Array.from(before.cutterPath, (p) => p[1]);
  const nominal = new Float64Array(after.length);
  for (let i = 0; i < nominal.length; i++) nominal[i] = was[Math.min(i, was.length - 1)];
  let lo = Infinity;
  let hi = -Infinity;
  for (const y of after) [lo, hi] = [Math.min(lo, y), Math.max(hi, y)];
  return { nominal, text: placementText(mm, hi - lo, design.units) ?? '' };
}
