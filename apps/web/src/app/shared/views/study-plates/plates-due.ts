/**
 * Which plate needs a new picture. A plate off the screen is not drawn: each plate costs tens of
 * milliseconds of a core per study, and in the studio at 1280 × 900 both sit below the bar view, so
 * every edit drew two pictures nobody saw while the visible bar view waited for the same two cores.
 * A plate coming into view is drawn then, from the newest study.
 */

/** What a plate was last asked to draw: the objects it came from (each study and frame is a new object). */
export interface PlateInputs {
  study: object;
  frame: object;
  /** Bumped when the page's colours change (the flat plate's ink and ground). */
  theme: number;
}

export interface PlateState {
  /** On the screen, or near enough to be scrolled to soon. */
  visible: boolean;
  /** What it was last sent; null before its first picture. */
  sent: PlateInputs | null;
}

/**
 * Whether each plate is due a picture of `now` (pure). The lit plate skips a draft study (a preview
 * with the final one to follow): its surface is the costly part and would be replaced at once.
 */
export function platesDue(now: PlateInputs, draft: boolean, flat: PlateState, lit: PlateState): { flat: boolean; lit: boolean } {
  return {
    flat: flat.visible && !same(flat.sent, now),
    lit: lit.visible && !draft && !same(lit.sent, now),
  };
}

function same(a: PlateInputs | null, b: PlateInputs): boolean {
  return !!a && a.study === b.study && a.frame === b.frame && a.theme === b.theme;
}
