import { eq } from 'drizzle-orm';
import type { RackShop, RosetteObject, Units } from '@barwright/contracts';
import { rackRosettes, rackShops, users } from '../db/schema';
import type { Db } from '../apps/server/src/database/database';

/**
 * The demo guild's racks: every member owns a few rosettes and a shop; Maren owns about thirty of
 * varied waves, a few of them measured with a dial indicator, so a sweep has something to show on
 * first start. Names and readings are invented.
 */
export interface DemoRackRosette {
  name: string;
  rosette: RosetteObject;
  tags: string[];
  notes?: string;
}
export interface DemoRack {
  email: string;
  units: Units;
  rosettes: DemoRackRosette[];
  shop: RackShop;
}

type Layer = RosetteObject['layers'][number];
const sine = (lobes: number, amplitude: number, phase = 0): Layer => ({ lobes, amplitude, phase, wave: { shape: 'sine' } });
const wave = (shape: 'pointed' | 'scallop' | 'eccentric', lobes: number, amplitude: number): Layer => ({ lobes, amplitude, phase: 0, wave: { shape } });
const flat = (lobes: number, amplitude: number, clip: number): Layer => ({ lobes, amplitude, phase: 0, wave: { shape: 'flat', clip } });

/** Readings every `stepDeg` of a worn `lobes`-lobe rosette: its wave plus a small, repeatable wobble (a fixed pseudo-random sequence). */
function readings(baseRadius: number, lobes: number, halfRise: number, stepDeg: number, seed: number): [number, number][] {
  let s = seed;
  const next = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648 - 0.5) * 0.04;
  const points: [number, number][] = [];
  for (let deg = 0; deg < 360; deg += stepDeg) points.push([deg, +(baseRadius + halfRise * Math.cos((lobes * deg * Math.PI) / 180) + next()).toFixed(3)]);
  return points;
}
const measured = (name: string, baseRadius: number, lobes: number, amplitude: number, stepDeg: number, seed: number, notes: string): DemoRackRosette => ({
  name,
  rosette: { baseRadius, layers: [{ lobes: 1, amplitude, phase: 0, wave: { shape: 'measured', scale: 'to-amplitude', points: readings(baseRadius, lobes, amplitude / 2, stepDeg, seed) } }] },
  tags: ['measured', lobes >= 24 ? 'fine' : 'bold'],
  notes,
});

/** Maren's rack: about thirty rosettes, from plain sines to two-layer weaves, and three she measured. */
function marensRosettes(): DemoRackRosette[] {
  const out: DemoRackRosette[] = [];
  for (const lobes of [8, 12, 16, 18, 24, 30, 36, 48, 60]) out.push({ name: `Plain sine ${lobes}`, rosette: { baseRadius: 50, layers: [sine(lobes, lobes >= 30 ? 1 : 1.5)] }, tags: ['sine', lobes >= 24 ? 'fine' : 'bold'] });
  for (const lobes of [12, 18, 24, 36]) out.push({ name: `Pointed ${lobes}`, rosette: { baseRadius: 50, layers: [wave('pointed', lobes, 1.2)] }, tags: ['pointed', lobes >= 24 ? 'fine' : 'bold'] });
  for (const lobes of [12, 20, 30]) out.push({ name: `Scallop ${lobes}`, rosette: { baseRadius: 45, layers: [wave('scallop', lobes, 1.2)] }, tags: ['scallop', lobes >= 24 ? 'fine' : 'bold'] });
  for (const [lobes, clip] of [[16, 0.6], [24, 0.4], [32, 0.75]] as const) out.push({ name: `Flat-topped ${lobes}`, rosette: { baseRadius: 50, layers: [flat(lobes, 1.4, clip)] }, tags: ['flat', lobes >= 24 ? 'fine' : 'bold'] });
  out.push({ name: 'Barleycorn 24', rosette: { baseRadius: 50, layers: [sine(24, 1.2), sine(48, 0.3, 0.25)] }, tags: ['weave', 'fine'] });
  out.push({ name: 'Basket weave 18', rosette: { baseRadius: 50, layers: [sine(18, 1.2), sine(54, 0.35)] }, tags: ['weave', 'bold'], notes: 'Her favourite; cut on the keeper in A2 twice.' });
  out.push({ name: 'Two-layer 12 over 36', rosette: { baseRadius: 55, layers: [sine(12, 1.6), wave('pointed', 36, 0.4)] }, tags: ['weave', 'bold'] });
  out.push({ name: 'Wheat ear 36', rosette: { baseRadius: 50, layers: [sine(36, 0.9), wave('pointed', 72, 0.3)] }, tags: ['weave', 'fine'] });
  out.push({ name: 'Ripple 30 over 6', rosette: { baseRadius: 50, layers: [sine(30, 0.8), sine(6, 1.2, 0.5)] }, tags: ['weave', 'fine'] });
  out.push({ name: 'Eccentric', rosette: { baseRadius: 40, layers: [wave('eccentric', 1, 2)] }, tags: ['eccentric'] });
  out.push({ name: 'Eccentric with 24', rosette: { baseRadius: 40, layers: [wave('eccentric', 1, 1.5), sine(24, 0.6)] }, tags: ['eccentric', 'weave'] });
  out.push({ name: 'Lopsided 12', rosette: { baseRadius: 50, layers: [{ lobes: 12, amplitude: 1.4, phase: 0, wave: { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 2, a: 0, b: 0.35 }] } }] }, tags: ['fourier', 'bold'], notes: 'Rises slowly and falls quickly: its opposite blank differs.' });
  out.push({ name: 'Squared 16', rosette: { baseRadius: 50, layers: [{ lobes: 16, amplitude: 1.2, phase: 0, wave: { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 3, a: 0.33, b: 0 }, { k: 5, a: 0.2, b: 0 }] } }] }, tags: ['fourier', 'bold'] });
  out.push({ name: 'Sawtooth 20', rosette: { baseRadius: 50, layers: [{ lobes: 20, amplitude: 1, phase: 0, wave: { shape: 'fourier', terms: [{ k: 1, a: 0, b: 1 }, { k: 2, a: 0, b: 0.5 }, { k: 3, a: 0, b: 0.33 }] } }] }, tags: ['fourier', 'bold'] });
  out.push(measured('Old brass 12 (read)', 48, 12, 1.3, 5, 7, 'Read with a 0.01 mm dial indicator, every 5°; a little worn near 200°.'));
  out.push(measured('Club rosette 24 (read)', 50, 24, 0.9, 2.5, 11, 'The club lathe’s own; read every 2.5°.'));
  out.push(measured('Flea-market 9 (read)', 42, 9, 1.6, 10, 23, 'Maker unknown; read every 10°.'));
  return out;
}

const SHOP_MM: RackShop = {
  units: 'mm',
  rubbers: [{ name: 'Round 1', shape: 'round', radius: 1 }, { name: 'Round 2.5', shape: 'round', radius: 2.5 }, { name: 'Flat 3', shape: 'flat', width: 3 }],
  travels: [{ name: 'Short', travelPerRev: 60, leverRatio: 1 }, { name: 'Standard', travelPerRev: 100, leverRatio: 1 }, { name: 'Long, lever 1.5', travelPerRev: 150, leverRatio: 1.5 }],
  cutters: [{ name: '3/16 in two-flute', diameter: 4.7625, flutes: 2 }, { name: '3 mm two-flute', diameter: 3, flutes: 2 }],
  followers: [{ name: 'Matched 3/16 in', radius: 2.38125 }, { name: 'Small', radius: 1.5 }],
  vCutters: [{ name: '120°', vAngle: 120 }, { name: '90°', vAngle: 90 }],
};

const SHOP_IN: RackShop = {
  units: 'in',
  rubbers: [{ name: 'Round 0.040', shape: 'round', radius: 0.04 }, { name: 'Flat 1/8', shape: 'flat', width: 0.125 }],
  travels: [{ name: 'Four inches', travelPerRev: 4, leverRatio: 1 }, { name: 'Six inches', travelPerRev: 6, leverRatio: 1 }],
  cutters: [{ name: '3/16 two-flute', diameter: 0.1875, flutes: 2 }, { name: '1/8 two-flute', diameter: 0.125, flutes: 2 }],
  followers: [{ name: 'Matched 3/16', radius: 0.09375 }],
  vCutters: [{ name: '120°', vAngle: 120 }],
};

/** Inch rosettes of the inch members (base radius about 2 in). */
const inchRosettes = (names: [string, number, Layer['wave']['shape']][]): DemoRackRosette[] =>
  names.map(([name, lobes, shape]) => ({
    name,
    rosette: { baseRadius: 2, layers: [shape === 'sine' ? sine(lobes, 0.06) : wave(shape as 'pointed' | 'scallop', lobes, 0.05)] },
    tags: [shape, lobes >= 24 ? 'fine' : 'bold'],
  }));

export const DEMO_RACKS: DemoRack[] = [
  { email: 'maren@example.test', units: 'mm', rosettes: marensRosettes(), shop: SHOP_MM },
  {
    email: 'odile@example.test',
    units: 'mm',
    rosettes: [
      { name: 'Guild sine 24', rosette: { baseRadius: 50, layers: [sine(24, 1.5)] }, tags: ['sine', 'fine'] },
      { name: 'Guild barleycorn', rosette: { baseRadius: 50, layers: [sine(24, 1.2), sine(48, 0.3, 0.25)] }, tags: ['weave', 'fine'] },
      measured('Guild lathe 18 (read)', 50, 18, 1.1, 5, 31, 'Read at the spring open day, every 5°.'),
    ],
    shop: { ...SHOP_MM, travels: SHOP_MM.travels.slice(0, 2) },
  },
  { email: 'tobias@example.test', units: 'in', rosettes: inchRosettes([['Keeper sine 18', 18, 'sine'], ['Keeper pointed 24', 24, 'pointed'], ['Scallop 12', 12, 'scallop'], ['Fine sine 36', 36, 'sine']]), shop: SHOP_IN },
  { email: 'ibrahim@example.test', units: 'in', rosettes: inchRosettes([['First sine 12', 12, 'sine'], ['Borrowed scallop 18', 18, 'scallop'], ['Pointed 30', 30, 'pointed']]), shop: SHOP_IN },
  {
    email: 'saskia@example.test',
    units: 'mm',
    rosettes: [
      { name: 'Dial sine 48', rosette: { baseRadius: 45, layers: [sine(48, 0.6)] }, tags: ['sine', 'fine'] },
      { name: 'Dial moiré 60', rosette: { baseRadius: 45, layers: [sine(60, 0.5), sine(61, 0.2)] }, tags: ['moiré', 'fine'] },
      { name: 'Dial pointed 36', rosette: { baseRadius: 45, layers: [wave('pointed', 36, 0.7)] }, tags: ['pointed', 'fine'] },
      { name: 'Dial scallop 40', rosette: { baseRadius: 45, layers: [wave('scallop', 40, 0.6)] }, tags: ['scallop', 'fine'] },
    ],
    shop: { ...SHOP_MM, cutters: [{ name: '1.5 mm two-flute', diameter: 1.5, flutes: 2 }, ...SHOP_MM.cutters] },
  },
];

/** Stores each demo member's rack (members missing from the database are skipped). */
export async function seedDemoRacks(db: Db, racks: readonly DemoRack[] = DEMO_RACKS): Promise<void> {
  for (const rack of racks) {
    const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, rack.email));
    if (!user) continue;
    const start = Date.now();
    await db.insert(rackRosettes).values(rack.rosettes.map((r, i) => ({ ownerId: user.id, name: r.name, units: rack.units, rosette: r.rosette, tags: r.tags, notes: r.notes ?? '', createdAt: new Date(start + i), updatedAt: new Date(start + i) })));
    await db.insert(rackShops).values({ ownerId: user.id, shop: rack.shop });
  }
}
