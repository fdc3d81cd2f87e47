import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';

/**
 * The Guild's bar designs for the demo: invented rosettes from the members' racks, each a valid
 * design file. Numbers are demo data, chosen to look like a workable set-up, not recommendations.
 *
 * They are chosen the way a turner chooses a cut: the cutter path's crests must be no narrower than
 * the end mill (radius of curvature of a sine crest = period² / (2π² · peak-to-valley) ≥ cutter
 * radius), so small end mills (1/8 in, 3/32 in), periods of 3–7 mm and amplitudes under a
 * millimetre, a follower of the cutter's radius, and a bar no thicker than three cutter diameters.
 * Every bar here is clean (no engine warning) except the scalloped one, on purpose: its rosette's
 * lobes meet in cusps, which any round rubber bridges, and the demo keeps one bar whose warning a
 * newcomer can read (seed-demo.spec.ts holds exactly that).
 */
const base = (patch: Partial<Design>): Design => ({ ...structuredClone(EXAMPLE_DESIGN), ...patch });

/** 1/8 in and 3/32 in end mills, mm: the small cutters pattern bars are cut with. */
const EIGHTH_INCH = { diameter: 3.175, flutes: 2 };
const THREE_32ND_INCH = { diameter: 2.38125, flutes: 2 };

export interface DemoBar {
  owner: string; // e-mail of the demo account
  board: string;
  title: string;
  description: string;
  tags: string[];
  design: Design;
  notes?: string;
}

/** The Guild's reference bar, which the remix below starts from. */
const REFERENCE: Design = base({
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 0.85, phase: 0, wave: { shape: 'sine' } }] },
  motion: { travelPerRev: 150, leverRatio: 1 },
  cutter: EIGHTH_INCH,
  follower: { radius: EIGHTH_INCH.diameter / 2 },
});

export const DEMO_BARS: DemoBar[] = [
  {
    owner: 'maren@example.test',
    board: 'Rack trials, winter',
    title: 'Twenty-four sine, barleycorn',
    description: 'The first bar from the Guild\'s 24-lobe sine rosette, 150 mm of travel a turn and a 1/8 in end mill. A clean barleycorn at 0.45 mm spacing; cut in A2 after one acrylic trial.',
    tags: ['barleycorn', 'sine', 'keeper'],
    design: REFERENCE,
    notes: 'Trial in acrylic looked right first time. Keeper cut in A2, 15 passes.',
  },
  {
    owner: 'maren@example.test',
    board: 'Rack trials, winter',
    title: 'Eighteen-lobe basket weave',
    description: 'A ramped phase over six lines gives the woven look. Wants a sharp V-cutter.',
    tags: ['basket-weave', 'sine'],
    design: base({
      rosette: { baseRadius: 50, layers: [{ lobes: 18, amplitude: 1.0, phase: 0, wave: { shape: 'sine' } }] },
      motion: { travelPerRev: 120, leverRatio: 1 },
      cutter: EIGHTH_INCH,
      follower: { radius: EIGHTH_INCH.diameter / 2 },
      study: { ...EXAMPLE_DESIGN.study, lines: 48, schedule: { kind: 'ramp', steps: 6 } },
    }),
  },
  {
    owner: 'saskia@example.test',
    board: 'Dial work',
    title: 'Dial moiré, thirty-six lobes',
    description: 'Fine spacing and a slow sinusoidal phase drift for a watch dial; the moiré shows at arm\'s length. A 3/32 in end mill on a 1/4 in bar.',
    tags: ['moire', 'dial', 'fine'],
    design: base({
      rosette: { baseRadius: 45, layers: [{ lobes: 36, amplitude: 0.4, phase: 0, wave: { shape: 'sine' } }] },
      motion: { travelPerRev: 120, leverRatio: 1 },
      cutter: THREE_32ND_INCH,
      follower: { radius: THREE_32ND_INCH.diameter / 2 },
      bar: { length: 150, thickness: 6.35, material: 'a2' },
      study: { lineSpacing: 0.3, lines: 80, schedule: { kind: 'sine', period: 32, depth: 0.5 }, vAngle: 120, depth: 0.06 },
    }),
  },
  {
    owner: 'saskia@example.test',
    board: 'Dial work',
    title: 'Scalloped forty-eight',
    description: 'Circular-arc lobes meeting in cusps; the rubber bridges the cusps a little, which softens the line. Cut in brass.',
    tags: ['scallop', 'dial'],
    // The one demo bar that shows a warning, on purpose: the rubber bridges the cusps between the
    // scallops ("valley-bridged", a few hundredths of a millimetre), which is what gives this bar its
    // softened line. Every other demo bar is clean.
    design: base({
      rosette: { baseRadius: 50, layers: [{ lobes: 48, amplitude: 0.5, phase: 0, wave: { shape: 'scallop' } }] },
      rubber: { shape: 'round', radius: 0.8 },
      motion: { travelPerRev: 144, leverRatio: 1 },
      cutter: THREE_32ND_INCH,
      follower: { radius: THREE_32ND_INCH.diameter / 2 },
      bar: { length: 150, thickness: 6.35, material: 'brass' },
      study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.35, lines: 60, schedule: { kind: 'alternate' } },
      plan: { stepOver: 0.254, cleanup: 0.25, travelSpeed: 300 },
    }),
  },
  {
    owner: 'tobias@example.test',
    board: 'Keepers in A2',
    title: 'Flat-topped twelve, straight lines',
    description: 'A sine clipped near its tops gives short flats between the waves; a 1/8 in rubber and cutter keep the corners clean. Drawn in inches; plain schedule, every line in phase.',
    tags: ['flat', 'keeper', 'plain-waves'],
    design: {
      format: 'barwright.design/1',
      units: 'in',
      rosette: { baseRadius: 2, layers: [{ lobes: 12, amplitude: 0.02, phase: 0, wave: { shape: 'flat', clip: 0.9 } }] },
      rubber: { shape: 'round', radius: 0.125 },
      motion: { travelPerRev: 6, leverRatio: 1 },
      cutter: { diameter: 0.125, flutes: 2 },
      bar: { length: 6, thickness: 0.3125, material: 'a2' },
      follower: { radius: 0.0625 },
      study: { lineSpacing: 0.018, lines: 40, schedule: { kind: 'none' }, vAngle: 120, depth: 0.004 },
      plan: { stepOver: 0.003, cleanup: 0.01, travelSpeed: 4 },
    },
  },
];

/** A remix in the demo: Ibrahim's acrylic trial of Maren's first bar with the 4 mm end mill he has. */
export const DEMO_REMIX = {
  of: 'Twenty-four sine, barleycorn',
  by: 'ibrahim@example.test',
  board: 'First trials',
  title: 'Twenty-four sine, acrylic trial with a 4 mm cutter',
  description: 'Maren\'s bar recut in cast acrylic with the 4 mm end mill and follower I have; the crests are still wider than the cutter, so they come back whole.',
  tags: ['barleycorn', 'trial', 'acrylic'],
  change: (d: Design): Design => ({
    ...d,
    cutter: { diameter: 4, flutes: 2 },
    follower: { radius: 2 },
    bar: { ...d.bar, material: 'acrylic' },
    plan: { stepOver: 1, cleanup: 0.25, travelSpeed: 500 },
  }),
};

/** Who rated what (stars), and what was said. */
export const DEMO_RATINGS: { by: string; title: string; stars: number }[] = [
  { by: 'tobias@example.test', title: 'Twenty-four sine, barleycorn', stars: 5 },
  { by: 'saskia@example.test', title: 'Twenty-four sine, barleycorn', stars: 4 },
  { by: 'ibrahim@example.test', title: 'Twenty-four sine, barleycorn', stars: 5 },
  { by: 'maren@example.test', title: 'Dial moiré, thirty-six lobes', stars: 5 },
  { by: 'tobias@example.test', title: 'Dial moiré, thirty-six lobes', stars: 4 },
  { by: 'maren@example.test', title: 'Flat-topped twelve, straight lines', stars: 3 },
  { by: 'saskia@example.test', title: 'Eighteen-lobe basket weave', stars: 4 },
];

/** The curator's picks for the showcase, in order (Tobias is the demo moderator). */
export const DEMO_SHOWCASE: { title: string; note: string }[] = [
  { title: 'Twenty-four sine, barleycorn', note: 'The Guild\'s reference barleycorn: proven in acrylic and in A2. Start here.' },
  { title: 'Flat-topped twelve, straight lines', note: 'Plain waves with flats, drawn in inches; a good first keeper.' },
];

export const DEMO_COMMENTS: { by: string; title: string; body: string }[] = [
  { by: 'tobias@example.test', title: 'Twenty-four sine, barleycorn', body: 'Cut this one last Saturday on the club engine. Fifteen passes in A2 as planned, no chatter.' },
  { by: 'ibrahim@example.test', title: 'Twenty-four sine, barleycorn', body: 'Trying it in acrylic first with my 4 mm cutter; will post the trial.' },
  { by: 'maren@example.test', title: 'Dial moiré, thirty-six lobes', body: 'The drift period of 32 lines is lovely. Did you try 24?' },
];
