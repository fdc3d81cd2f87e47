import type { Design } from '@barwright/contracts';
import { computeProfile, cutterPlacement, peakToValley, placementText, toMm, type Profile } from '@barwright/engine';

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
  const nominal = new Float64Array(profile.cutterPath.length);
  for (let i = 0; i < nominal.length; i++) nominal[i] = before.cutterPath[Math.min(i, before.cutterPath.length - 1)][1];
  return { nominal, text: placementText(mm, peakToValley(profile.cutterPath), design.units) ?? '' };
}
