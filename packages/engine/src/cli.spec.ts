import { EXAMPLE_DESIGN, MM_PER_INCH } from '@barwright/contracts';
import { spawn } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { toMm } from './units';
import { EXPORT_FORMATS } from './export/index';

const ENGINE = fileURLToPath(new URL('..', import.meta.url));
const ROOT = join(ENGINE, '../..');
const BIN = join(ENGINE, 'bin/barwright.mjs');
const EXAMPLE_MM = join(ENGINE, 'examples/demo-bar-a2.json');
const EXAMPLE_IN = join(ENGINE, 'examples/demo-bar-a2-inch.json');

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

/** Spawns the CLI as a user would: `node bin/barwright.mjs …` from the repository root. */
function barwright(args: string[], options: { command?: string[]; input?: string } = {}): Promise<Run> {
  const [file, ...pre] = options.command ?? [process.execPath, BIN];
  return new Promise((resolve, reject) => {
    const child = spawn(file, [...pre, ...args], { cwd: ROOT, stdio: 'pipe' });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    child.stderr.on('data', (d) => (stderr += d));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(options.input ?? '');
  });
}

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'barwright-cli-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function designFile(name: string, value: unknown): Promise<string> {
  const path = join(dir, name);
  await writeFile(path, typeof value === 'string' ? value : JSON.stringify(value));
  return path;
}

/** Every length a message states in `unit`, in order: `1–2 in` gives 1 and 2. */
function lengthsIn(message: string, unit: 'mm' | 'in'): number[] {
  const pattern = new RegExp(`(-?\\d+(?:\\.\\d+)?(?:e-?\\d+)?)(?:–(-?\\d+(?:\\.\\d+)?(?:e-?\\d+)?))? ${unit}\\b`, 'g');
  return [...message.matchAll(pattern)].flatMap((m) => (m[2] === undefined ? [Number(m[1])] : [Number(m[1]), Number(m[2])]));
}

describe('barwright CLI (spawned with node)', () => {
  it('runs as `npx barwright --help` from the repository root', async () => {
    const run = await barwright(['--help'], { command: ['npx', '--no-install', 'barwright'] });
    expect(run.code).toBe(0);
    for (const command of ['profile', 'study', 'plan', 'export']) expect(run.stdout).toContain(`  ${command}`);
  });

  it('prints help for each command', async () => {
    const run = await barwright(['export', '--help']);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain(`Usage: barwright export FILE --format ${EXPORT_FORMATS.join('|')}`);
  });

  it('plans the demo bar: 30–40 minutes in A2 (common practice), lengths in mm', async () => {
    const run = await barwright(['plan', EXAMPLE_MM]);
    expect(run.code).toBe(0);
    const plan = JSON.parse(run.stdout);
    expect(plan).toMatchObject({ units: 'mm', material: 'a2', stepOver: 0.0762 });
    expect(plan.totalMinutes).toBeGreaterThanOrEqual(30);
    expect(plan.totalMinutes).toBeLessThanOrEqual(40);
    expect(plan.cautions.join(' ')).toMatch(/eye protection/i);
    expect(run.stdout).not.toMatch(/NaN/);
  });

  it('prints every length in inches for an inch file (inch = 25.4 mm, NIST)', async () => {
    const [mm, inch] = await Promise.all([barwright(['plan', EXAMPLE_MM]), barwright(['plan', EXAMPLE_IN])]);
    const a = JSON.parse(mm.stdout);
    const b = JSON.parse(inch.stdout);
    expect(b.units).toBe('in');
    expect(b.stepOver).toBeCloseTo(0.003, 6);
    expect(b.depth).toBeCloseTo(a.depth / MM_PER_INCH, 5);
    expect(b.feedPerMinute).toBeCloseTo(a.feedPerMinute / MM_PER_INCH, 4);
    expect(b.passes).toBe(a.passes);
    expect(b.rpm).toBe(a.rpm);
  });

  it('prints the profile as JSON with paths of [x, y] in the file\'s units', async () => {
    const run = await barwright(['profile', EXAMPLE_IN, '--step', '0.002']);
    expect(run.code).toBe(0);
    const profile = JSON.parse(run.stdout);
    expect(Object.keys(profile)).toEqual(['units', 'period', 'cutterPath', 'barEdge', 'followerPath', 'minRadiusOfCurvature', 'crest', 'warnings']);
    expect(profile.period).toBeCloseTo(100 / 24 / MM_PER_INCH, 6);
    expect(profile.cutterPath.at(-1)[0]).toBeCloseTo(150 / MM_PER_INCH, 6);
    expect(Math.max(...profile.cutterPath.map((p: number[]) => p[1]))).toBeCloseTo(1.5 / MM_PER_INCH, 3);
  });

  it('says in the file\'s units when --step is coarser than the design needs, and the step that is fine enough', async () => {
    const run = await barwright(['profile', EXAMPLE_IN, '--step', '0.002']);
    const [coarse] = JSON.parse(run.stdout).warnings.filter((w: { code: string }) => w.code === 'other');
    // the 24-lobe example's finest feature is its period, 100/24 mm; 1/2000 of it is 0.000082 in
    expect(coarse.message).toMatch(/step of 0\.002 in is coarser than this design needs.*a step of 0\.000082 in keeps it within 0\.1 %/);
  });

  it('writes warning messages in inches for an inch design, agreeing with the mm design (inch = 25.4 mm, NIST)', async () => {
    // Scalloped lobes meet in cusps that a 0.1 in rubber cannot reach, and the crests are narrower than the cutter.
    const inch = {
      ...structuredClone(EXAMPLE_DESIGN),
      units: 'in',
      rosette: { baseRadius: 2, layers: [{ lobes: 24, amplitude: 0.06, phase: 0, wave: { shape: 'scallop' } }] },
      rubber: { shape: 'round', radius: 0.1 },
      motion: { travelPerRev: 4, leverRatio: 1 },
      cutter: { diameter: 0.1875, flutes: 2 },
      bar: { length: 6, thickness: 0.3125, material: 'a2' },
      follower: { radius: 0.09375 },
      study: { lineSpacing: 0.018, lines: 40, schedule: { kind: 'alternate' }, vAngle: 120, depth: 0.004 },
      plan: { stepOver: 0.003, cleanup: 0.01, travelSpeed: 4 },
    } as const;
    const [a, b] = await Promise.all([
      barwright(['profile', await designFile('scallop-in.json', inch)]),
      barwright(['profile', await designFile('scallop-mm.json', toMm(inch as any))]),
    ]);
    expect(a.code, a.stderr).toBe(0);
    const inWarnings = JSON.parse(a.stdout).warnings;
    const mmWarnings = JSON.parse(b.stdout).warnings;
    expect(inWarnings.map((w: any) => w.code)).toEqual(['valley-bridged', 'detail-lost-follower']);
    expect(mmWarnings.map((w: any) => w.code)).toEqual(inWarnings.map((w: any) => w.code));
    inWarnings.forEach((w: any, i: number) => {
      expect(w.message).not.toMatch(/\bmm\b/);
      const inches = lengthsIn(w.message, 'in');
      const mms = lengthsIn(mmWarnings[i].message, 'mm');
      expect(inches.length).toBeGreaterThanOrEqual(3);
      expect(inches).toHaveLength(mms.length);
      // The messages read 0.001 in (0.0001 in below 0.04 in) and 0.01 mm (0.001 mm below 1 mm).
      inches.forEach((v, k) => expect(Math.abs(v * MM_PER_INCH - mms[k])).toBeLessThan(0.0254 / 2 + 0.005 + 1e-9));
      expect(inches[0]).toBeCloseTo(w.at.xFrom, 3); // the message reads 0.001 in
      expect(inches[1]).toBeCloseTo(w.at.xTo, 3);
      expect(inches.some((v) => Math.abs(v - w.amount) < 0.00006)).toBe(true); // 0.0001 in below 0.04 in
      // The places of one kind are in the file's units too.
      expect(w.first.xFrom * MM_PER_INCH).toBeCloseTo(mmWarnings[i].first.xFrom, 3);
      w.zones.forEach((z: any, k: number) => expect(z.xTo * MM_PER_INCH).toBeCloseTo(mmWarnings[i].zones[k].xTo, 3));
    });
  });

  it('exits with code 2 and names the field for a bad design file', async () => {
    const bad = structuredClone(EXAMPLE_DESIGN) as any;
    bad.rosette.layers[0].lobes = 2.5;
    const run = await barwright(['plan', await designFile('bad-lobes.json', bad)]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('rosette.layers[0].lobes: must be a whole number');
    expect(run.stderr).not.toMatch(/\n\s+at /);
    expect(run.stdout).toBe('');
  });

  it('exits with code 2 for a file that is not JSON', async () => {
    const run = await barwright(['profile', await designFile('broken.json', '{ "format": ')]);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/broken\.json is not valid JSON/);
  });

  it('writes each export to --out', async () => {
    const out = join(dir, 'bar.pdf');
    const run = await barwright(['export', EXAMPLE_MM, '--format', 'pdf', '--out', out]);
    expect(run.code).toBe(0);
    expect((await readFile(out)).subarray(0, 5).toString()).toBe('%PDF-');
  });
});
