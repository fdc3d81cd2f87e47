import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { EXIT_OK, EXIT_USAGE, runCli, type CliIo } from './cli';
import { GCODE_STANDARD, GCODE_SUMMARY } from './export/gcode-standard';
import { EXPORT_FORMATS } from './export/index';
import { fromMm } from './units';

/** Runs the CLI in-process against an in-memory file system. */
async function run(argv: string[], files: Record<string, string> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const written: Record<string, string | Uint8Array> = {};
  const io: CliIo = {
    stdout: (t) => out.push(t),
    stderr: (t) => err.push(t),
    readText: async (path) => {
      if (!(path in files)) throw Object.assign(new Error('ENOENT'), { code: 'ENOENT' });
      return files[path];
    },
    writeFile: async (path, content) => {
      written[path] = content;
    },
  };
  const code = await runCli(argv, io);
  return { code, stdout: out.join(''), stderr: err.join(''), written };
}

function withChange(change: (d: any) => void): string {
  const d = structuredClone(EXAMPLE_DESIGN) as any;
  change(d);
  return JSON.stringify(d);
}

describe('CLI errors name the field and exit with code 2', () => {
  const cases: Array<[string, string, string]> = [
    ['an unknown field', withChange((d) => (d.rosette.colour = 'red')), 'rosette.colour: is not a known field'],
    ['a wrong type', withChange((d) => (d.bar.length = '150')), 'bar.length: must be a number'],
    ['non-integer lobes', withChange((d) => (d.rosette.layers[0].lobes = 24.5)), 'rosette.layers[0].lobes: must be a whole number'],
    ['a negative radius', withChange((d) => (d.follower.radius = -1)), 'follower.radius: must not be negative'],
    ['a rubber larger than the base radius', withChange((d) => (d.rubber.radius = 60)), 'rubber.radius: must not be larger than the rosette\'s base radius'],
    ['an unknown material', withChange((d) => (d.bar.material = 'oak')), 'bar.material: must be one of'],
    ['a JSON array', '[]', '(the file):'],
  ];
  for (const [what, text, message] of cases) {
    it(`for ${what}`, async () => {
      const result = await run(['plan', 'd.json'], { 'd.json': text });
      expect(result.code).toBe(EXIT_USAGE);
      expect(result.stderr).toContain('d.json is not a valid design file');
      expect(result.stderr).toContain(message);
      expect(result.stdout).toBe('');
    });
  }

  it('for bad arguments', async () => {
    const files = { 'd.json': JSON.stringify(EXAMPLE_DESIGN) };
    const expectations: Array<[string[], RegExp]> = [
      [[], /Usage: barwright <command>/],
      [['carve', 'd.json'], /no command "carve"/],
      [['plan'], /plan needs exactly one FILE/],
      [['plan', 'missing.json'], /cannot read missing\.json: no such file/],
      [['plan', 'd.json', '--fast'], /Unknown option '--fast'/],
      [['profile', 'd.json', '--step', 'fine'], /--step: must be a number between 0\.001 and 150 mm \(got "fine"\)/],
      [['profile', 'd.json', '--step', '0'], /--step: must be a number/],
      [['export', 'd.json'], /export needs --format/],
      [['export', 'd.json', '--format', 'stl'], new RegExp(`--format: must be one of ${EXPORT_FORMATS.join(', ')} \\(got "stl"\\)`)],
    ];
    for (const [argv, message] of expectations) {
      const result = await run(argv, files);
      expect(result.code, argv.join(' ')).toBe(EXIT_USAGE);
      expect(result.stderr).toMatch(message);
    }
  });
});

describe('CLI commands in-process', () => {
  const files = { 'd.json': JSON.stringify(EXAMPLE_DESIGN) };

  it('prints the line study as JSON, or writes its SVG', async () => {
    const json = await run(['study', 'd.json'], files);
    expect(json.code).toBe(EXIT_OK);
    const study = JSON.parse(json.stdout);
    expect(study.units).toBe('mm');
    expect(study.lines).toHaveLength(EXAMPLE_DESIGN.study.lines);
    const svg = await run(['study', 'd.json', '--svg', 'study.svg'], files);
    expect(svg.code).toBe(EXIT_OK);
    expect(String(svg.written['study.svg'])).toContain('<svg');
  });

  it('titles the study drawing in the file\'s units', async () => {
    const inch = fromMm({ ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.4572 } }, 'in');
    const svg = await run(['study', 'd.json', '--svg', 'study.svg'], { 'd.json': JSON.stringify(inch) });
    expect(svg.code, svg.stderr).toBe(EXIT_OK);
    expect(String(svg.written['study.svg'])).toMatch(/<title>Line study: 40 lines at 0\.018 in, groove [0-9.]+ in wide<\/title>/);
  });

  it('exports every format, defaulting the file name', async () => {
    for (const format of ['svg', 'dxf', 'gcode', 'csv', 'pdf']) {
      const result = await run(['export', 'd.json', '--format', format], files);
      expect(result.code, format).toBe(EXIT_OK);
      expect(Object.keys(result.written)).toEqual([`bar.${format === 'gcode' ? 'nc' : format}`]);
    }
  });

  it('writes every format to --out OUT', async () => {
    const signatures: Record<string, RegExp> = { svg: /<svg /, dxf: /AC1009/, gcode: /G21/, csv: /^x_mm,/, pdf: /^%PDF-/ };
    for (const [format, signature] of Object.entries(signatures)) {
      const out = `out/my-bar-${format}.${format}`;
      const result = await run(['export', 'd.json', '--format', format, '--out', out], files);
      expect(result.code, format).toBe(EXIT_OK);
      expect(Object.keys(result.written)).toEqual([out]);
      const content = result.written[out];
      expect(typeof content === 'string' ? content : Buffer.from(content).subarray(0, 5).toString('latin1')).toMatch(signature);
      expect(result.stdout).toContain(`wrote ${out}`);
    }
  });

  it('reads the design from standard input with -', async () => {
    const result = await run(['plan', '-'], { '-': JSON.stringify(EXAMPLE_DESIGN) });
    expect(result.code).toBe(EXIT_OK);
    expect(JSON.parse(result.stdout).passes).toBeGreaterThan(0);
  });

  it('answers help for every command', async () => {
    for (const name of ['profile', 'study', 'plan', 'export']) {
      const viaFlag = await run([name, '--help']);
      const viaHelp = await run(['help', name]);
      expect(viaFlag.code).toBe(EXIT_OK);
      expect(viaFlag.stdout).toContain(`Usage: barwright ${name} FILE`);
      expect(viaHelp.stdout).toBe(viaFlag.stdout);
    }
  });

  it('answers help about help itself, however it is asked', async () => {
    const asked = await Promise.all([run(['help', 'help']), run(['help', '--help']), run(['help', '-h']), run(['help', 'help', '--help'])]);
    for (const result of asked) {
      expect(result.code).toBe(EXIT_OK);
      expect(result.stdout).toContain('Usage: barwright help [COMMAND]');
      expect(result.stdout).toBe(asked[0].stdout);
    }
    expect((await run(['--help'])).stdout).toMatch(/^ {2}help {5}this help, or the help of one command$/m);
    const unknown = await run(['help', 'toString']);
    expect(unknown.code).toBe(EXIT_USAGE);
    expect(unknown.stderr).toContain('no command "toString"');
    expect((await run(['help', 'plan', 'study'])).code).toBe(EXIT_USAGE);
  });

  it('names the G-code format the way the web does, from one place', async () => {
    const help = (await run(['help', 'export'])).stdout;
    expect(help).toContain(`gcode      ${GCODE_SUMMARY}`);
    for (const format of EXPORT_FORMATS) expect(help).toMatch(new RegExp(`^ {17}${format} +\\S`, 'm')); // every format explained
    expect(GCODE_SUMMARY).toContain(GCODE_STANDARD);
    expect(help).not.toMatch(/RS274NGC/);
  });
});
