import { SCHEDULE_NAMES, type CandidateKey, type PhaseSchedule, type Rack, type SweepCandidate, type SweepChoices, type Units } from '@barwright/contracts';

/*
 * The sweep's choices as the page edits them, pure: the defaults from a member's rack, the options
 * of each list (the shop's items, then any chosen item the shop no longer holds), and stars kept by
 * what a candidate is rather than by its place in the lists, so they survive a change of choices.
 */

/** The phase schedules a sweep offers; a thumbnail is drawn with any one of the chosen. */
export const SWEEP_SCHEDULES: readonly { label: string; schedule: PhaseSchedule }[] = [
  { label: `${SCHEDULE_NAMES.alternate} (alternate half-period)`, schedule: { kind: 'alternate' } },
  { label: `${SCHEDULE_NAMES.none} (every line in phase)`, schedule: { kind: 'none' } },
  { label: `${SCHEDULE_NAMES.ramp} (ramp of 8 lines)`, schedule: { kind: 'ramp', steps: 8 } },
  { label: `${SCHEDULE_NAMES.sine} (over 24 lines)`, schedule: { kind: 'sine', period: 24, depth: 0.5 } },
  { label: `${SCHEDULE_NAMES.twist} (a twentieth a line)`, schedule: { kind: 'twist', step: 0.05 } },
];

export const sameItem = (a: unknown, b: unknown): boolean => JSON.stringify(a) === JSON.stringify(b);

/** What the page starts from: every rosette, the first rubber, travel, cutter and follower, a 150 mm (6 in) bar, a barleycorn study. */
export function defaultChoices(rack: Rack): SweepChoices {
  const { shop, units } = rack;
  const inUnits = (mm: number) => (units === 'in' ? +(mm / 25.4).toFixed(4) : mm);
  const vAngle = shop.vCutters[0]?.vAngle ?? 120;
  return {
    units,
    rosettes: { by: 'all' },
    rubbers: shop.rubbers.slice(0, 1),
    travels: shop.travels.slice(0, 1),
    cutters: shop.cutters.slice(0, 1),
    follower: shop.followers[0] ?? { radius: inUnits(2.38125) },
    barLength: units === 'in' ? 6 : 150,
    study: { lineSpacing: inUnits(0.45), lines: 40, schedules: [{ kind: 'alternate' }], vAngle, depth: inUnits(0.1) },
  };
}

/** The options of one list: the shop's items in its order, then chosen items it no longer holds. */
export function optionsOf<T>(shop: readonly T[], chosen: readonly T[]): T[] {
  return [...shop, ...chosen.filter((c) => !shop.some((s) => sameItem(s, c)))];
}

/** The chosen list with `item` switched on or off, in the options' order. */
export function toggled<T>(options: readonly T[], chosen: readonly T[], item: T, on: boolean): T[] {
  return options.filter((o) => (sameItem(o, item) ? on : chosen.some((c) => sameItem(c, o))));
}

/** A candidate's star by what it is: the rack rosette and the rubber, travel and cutter themselves. */
export function starOf(rosetteId: string, c: Pick<SweepCandidate, 'rubber' | 'travel' | 'cutter'>): string {
  return `${rosetteId.toLowerCase()}|${JSON.stringify(c.rubber)}|${JSON.stringify(c.travel)}|${JSON.stringify(c.cutter)}`;
}

/** The stars of a saved shortlist (keys are places in its own choices' lists); keys past the lists are dropped. */
export function starsOfKeys(keys: readonly CandidateKey[], choices: SweepChoices): string[] {
  return keys.flatMap((k) => {
    const rubber = choices.rubbers[k.rubber];
    const travel = choices.travels[k.travel];
    const cutter = choices.cutters[k.cutter];
    return rubber && travel && cutter ? [starOf(k.rosetteId, { rubber, travel, cutter })] : [];
  });
}

/** The saved shortlist: the starred candidates among `entries`, by their keys, in the grid's order. */
export function keysOfStars(stars: ReadonlySet<string>, entries: readonly { key: CandidateKey; candidate: SweepCandidate }[]): CandidateKey[] {
  return entries.filter((e) => stars.has(starOf(e.key.rosetteId, e.candidate))).map((e) => e.key);
}

/** A number from an entry box, or null when it is empty or not a number. */
export function entryNumber(text: string): number | null {
  const v = text.trim() === '' ? NaN : Number(text);
  return Number.isFinite(v) ? v : null;
}

/** A length typed in `units` as mm (inch = 25.4 mm exactly), or null. */
export function entryMm(text: string, units: Units): number | null {
  const v = entryNumber(text);
  return v === null ? null : units === 'in' ? v * 25.4 : v;
}
