import type { MaterialPreset } from './materials';

/**
 * The cautions shown wherever the product speaks about cutting, heat treating or running
 * machines. Always all of them, in this order.
 */
export const SAFETY_CAUTIONS: readonly string[] = [
  'Wear eye protection whenever the spindle or the cutter turns.',
  'No gloves, loose clothing, jewellery or loose hair near rotating work or cutters.',
  'Chips are sharp and can be hot: clear them with a brush once the spindle has stopped, never by hand.',
  'Hot work: a hardened bar, its foil, the furnace and the tongs stay hot long after they stop glowing; wear heat-resistant gloves for hot work only, never at the machine.',
  'These figures are starting points: defer to the cutter maker\'s and the material supplier\'s data and to local rules.',
];

/** The one-line caution carried into G-code comments and other tight places. */
export const SHORT_CAUTION =
  'Eye protection; no gloves or loose clothing near rotating work; mind sharp, hot chips; follow the supplier data and local rules.';

/** Set-up reminders for one cut, in the order the work is done. Lengths already formatted. */
export function setUpReminders(args: {
  preset: MaterialPreset;
  stepOver: string;
  thickness: string;
  topOfEdge: string;
  /** The cutter's modelled placement off the centre line or on a rocking arc (`placementText`), if any. */
  placement?: string;
}): string[] {
  const rule =
    'Feed each pass with the upper slide, never the cross slide: a cutter off the spindle centre line (the line through the rubber\'s contact and the rosette axis) distorts the pattern.';
  const reminders = [
    args.placement
      ? `The profile models the cutter ${args.placement}; set it exactly so. ${rule}`
      : `Set the end mill's centre on the spindle centre line; the profile assumes it. ${rule}`,
    'Check the rubber is set to the profile\'s rubber and bears on the rosette with enough spring pressure to follow every valley.',
    `Clamp the bar with the edge standing proud; the cutter's flutes must reach through its ${args.thickness} thickness.`,
    `Touch off on the blank's edge: the finished crests sit ${args.topOfEdge} below it; step in ${args.stepOver} per pass.`,
    'Run every pass in the same direction, cutter withdrawn on the return, so backlash stays taken up.',
    args.preset.cutting,
  ];
  if (args.preset.id !== 'acrylic') reminders.push('Take a trial cut in acrylic first and check it on the straight-line machine.');
  return reminders;
}
