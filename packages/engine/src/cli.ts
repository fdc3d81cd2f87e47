import { readFile, writeFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { COMMANDS, type Command, type CommandIo } from './cli/commands';
import { UsageError, designFromText } from './cli/design-file';

/** Everything the CLI touches, so tests can run it in-process. */
export interface CliIo extends CommandIo {
  stderr(text: string): void;
  readText(path: string): Promise<string>;
}

/** Exit codes: 0 done, 1 an internal error, 2 bad arguments or a bad design file. */
export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_USAGE = 2;

/** What `help` tells of itself: it is a topic like the commands, though it reads no FILE. */
const HELP_TOPIC: HelpTopic = {
  summary: 'this help, or the help of one command',
  usage: 'barwright help [COMMAND]',
  details: [`Prints the list of commands, or with COMMAND (${[...Object.keys(COMMANDS), 'help'].join(', ')}) that command's usage and options.`, '`barwright COMMAND --help` prints the same.'].join('\n'),
};

type HelpTopic = Pick<Command, 'summary' | 'usage' | 'details'>;

/** Every name `help` answers for, help itself included. */
const TOPICS: Readonly<Record<string, HelpTopic>> = { ...COMMANDS, help: HELP_TOPIC };

const GENERAL_HELP = [
  'barwright: predict, plan and export pattern bars for a rose engine\'s straight-line machine',
  '',
  'Usage: barwright <command> FILE [options]',
  '',
  'Commands:',
  ...Object.entries(TOPICS).map(([name, c]) => `  ${name.padEnd(8)} ${c.summary}`),
  '',
  'FILE is a design file (format barwright.design/1); `-` reads it from standard input.',
  'Every length printed is in the file\'s units (mm or in; inch = 25.4 mm exactly).',
  'Exit codes: 0 done, 2 bad arguments or a bad design file (the message names the field), 1 an internal error.',
].join('\n');

function commandHelp(name: string, command: HelpTopic): string {
  return [`Usage: ${command.usage}`, '', `${name}: ${command.summary}.`, command.details, '  --help     this help'].join('\n');
}

/** Runs the command line `argv` (without node and the script) and returns the exit code. */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    return await dispatch(argv, io);
  } catch (error) {
    if (error instanceof UsageError) {
      io.stderr(`barwright: ${error.message}\n`);
      return EXIT_USAGE;
    }
    io.stderr(`barwright: internal error: ${(error as Error)?.message ?? String(error)}\n`);
    return EXIT_INTERNAL;
  }
}

async function dispatch(argv: readonly string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined) {
    io.stderr(GENERAL_HELP + '\n');
    return EXIT_USAGE;
  }
  if (name === '--help' || name === '-h') {
    io.stdout(GENERAL_HELP + '\n');
    return EXIT_OK;
  }
  if (name === 'help') {
    // `help --help` and `help -h` ask about help itself, like `help help`.
    const asked = rest[0] === '--help' || rest[0] === '-h' ? 'help' : rest[0];
    if (rest.length > 1 && !(rest.length === 2 && (rest[1] === '--help' || rest[1] === '-h'))) {
      throw new UsageError(`help takes one COMMAND at most\nUsage: ${HELP_TOPIC.usage}`);
    }
    const topic = asked === undefined ? undefined : Object.hasOwn(TOPICS, asked) ? TOPICS[asked] : undefined;
    if (asked !== undefined && !topic) throw new UsageError(`no command "${asked}"; try barwright --help`);
    io.stdout((topic ? commandHelp(asked!, topic) : GENERAL_HELP) + '\n');
    return EXIT_OK;
  }
  const command = Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
  if (!command) throw new UsageError(`no command "${name}"; try barwright --help`);
  const { values, positionals } = parseCommandArgs(name, command, rest);
  if (values.help) {
    io.stdout(commandHelp(name, command) + '\n');
    return EXIT_OK;
  }
  if (positionals.length !== 1) throw new UsageError(`${name} needs exactly one FILE\nUsage: ${command.usage}`);
  const path = positionals[0];
  const design = designFromText(await readDesignText(path, io), path === '-' ? 'standard input' : path);
  await command.run(design, values, io);
  return EXIT_OK;
}

function parseCommandArgs(name: string, command: Command, args: string[]) {
  try {
    return parseArgs({ args, options: { ...command.options, help: { type: 'boolean', short: 'h' } }, allowPositionals: true, strict: true });
  } catch (error) {
    throw new UsageError(`${(error as Error).message}\nUsage: ${command.usage}`);
  }
}

async function readDesignText(path: string, io: CliIo): Promise<string> {
  try {
    return await io.readText(path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : (error as Error).message;
    throw new UsageError(`cannot read ${path}: ${reason}`);
  }
}

/** The real world: Node's files and streams. */
export const nodeIo: CliIo = {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  readText: (path) => (path === '-' ? readStdin() : readFile(path, 'utf8')),
  writeFile: (path, content) => writeFile(path, content),
};

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}
