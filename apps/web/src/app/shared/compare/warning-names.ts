import type { EngineWarning } from '@barwright/engine';

/** Short names of the warnings, for a table cell or a summary line (the full messages are in the views). */
const NAMES: Readonly<Record<EngineWarning['code'], string>> = {
  'valley-bridged': 'rubber bridges valleys',
  'cusp-rounded': 'rubber rounds cusps',
  'detail-lost-cutter': 'cutter cannot reach valleys',
  'detail-lost-follower': 'follower rounds crests',
  'follower-radius': 'follower unlike the cutter',
  'pass-too-deep': 'pass too deep',
  rubbing: 'rubbing (chip too thin)',
  'cutter-off-centre': 'cutter off the centre line',
  other: 'see the notes',
};

export function warningName(warning: EngineWarning): string {
  return NAMES[warning.code] ?? warning.code;
}

/**
 * The warning to name first: a cutting problem (a pass too deep, rubbing) before a drawing one, then
 * the largest amount of detail lost.
 */
export function worstWarning(warnings: readonly EngineWarning[]): EngineWarning | null {
  const cutting = warnings.find((w) => w.code === 'pass-too-deep' || w.code === 'rubbing');
  if (cutting) return cutting;
  return warnings.reduce<EngineWarning | null>((worst, w) => (!worst || (w.amount ?? 0) > (worst.amount ?? 0) ? w : worst), null);
}
