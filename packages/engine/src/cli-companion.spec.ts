import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { EXIT_OK, EXIT_USAGE, runCli, type CliIo } from './cli';
import { fileUnits, profileInFileUnits } from './cli/file-units';
import { computeProfile } from './profile';

/** Runs the CLI in-process on one design held in memory as `bar.json`. */
async function run(argv: string[], design: Design = EXAMPLE_DESIGN) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIo = {
    stdout: (t) => out.push(t),
    stderr: (t) => err.push(t),
    readText: async () => JSON.stringify(design),
    writeFile: async () => undefined,
  };
  const code = await runCli(argv, io);
  return { code, stdout: out.join(''), stderr: err.join('') };
}

const short: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 10 } };

describe('barwright profile --companion', () => {
  for (const companion of ['counter-phase', 'inverted', 'opposite'] as const) {
    it(`prints the ${companion} companion, as the library computes it`, async () => {
      const { code, stdout } = await run(['profile', 'bar.json', '--companion', companion], short);
      expect(code).toBe(EXIT_OK);
      const expected = profileInFileUnits(computeProfile(short, { companion }), fileUnits('mm'));
      expect(JSON.parse(stdout).barEdge).toEqual(expected.barEdge);
    });
  }

  it('refuses an unknown companion, naming the choices', async () => {
    const { code, stderr } = await run(['profile', 'bar.json', '--companion', 'mirrored'], short);
    expect(code).toBe(EXIT_USAGE);
    expect(stderr).toContain('--companion: must be one of counter-phase, inverted, opposite (got "mirrored")');
  });

  it('says so in the help', async () => {
    const { stdout } = await run(['profile', '--help']);
    expect(stdout).toContain('[--companion counter-phase|inverted|opposite]');
    expect(stdout).toContain('upper envelope');
  });
});
