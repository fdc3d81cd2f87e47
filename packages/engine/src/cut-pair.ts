import type { Design } from '@barwright/contracts';
import { computeProfile, type ProfileOptions } from './profile';
import type { Profile } from './types';

/**
 * The two blanks of one cut ("shown and opposite"): the cutter runs between them, so the blank below
 * it keeps the lower envelope of the cutter disc (the shown bar) and the blank above it the upper
 * envelope (the opposite blank, with its follower riding under it). Both come from the same cutter
 * path on the same x grid. The opposite is not the shown edge mirrored: a narrow valley of the path
 * is a crest the cutter rounds on one blank and a valley it cannot reach into on the other, and for
 * a wave whose crests and valleys differ in shape the two edges differ.
 */
export interface CutPair {
  shown: Profile;
  opposite: Profile;
}

export function shownAndOpposite(design: Design, options: Omit<ProfileOptions, 'companion'> = {}): CutPair {
  return { shown: computeProfile(design, options), opposite: computeProfile(design, { ...options, companion: 'opposite' }) };
}
