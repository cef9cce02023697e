/**
 * The pure argument parser: argv in, a ParsedCommand (or help text, or a
 * usage error) out. It never touches the process: commander is told to throw
 * instead of exiting and to hand its text back, so tests call it directly and
 * the top level decides what to print and which exit code to use.
 *
 * Values with units are turned into plain numbers here, once, so every
 * command module reads the same names (see docs/cli.md): `spare` is a
 * fraction, lengths end in `Mm`, `pack` is grams.
 */
import { Command, CommanderError, InvalidArgumentError, Option } from 'commander';
import type { ParsedCommand } from './command.js';
import { DEFAULT_OUTPUT_FORMATS, OUTPUT_FORMATS } from './convert/formats.js';

export interface ArgsResult {
  value: ParsedCommand | null;
  /** Text for stdout (from `--help`); exit 0. */
  help?: string;
  /** Usage error text for stderr; exit 2. */
  error?: string;
  /** `--version` was asked for; the caller prints it. */
  version?: boolean;
}

const HELP_WIDTH = 80;

const fail = (why: string): never => {
  throw new InvalidArgumentError(why);
};

/** A whole number within bounds (ports, dpi, job counts, row numbers). */
export const integerIn =
  (min: number, max: number) =>
  (text: string): number => {
    const n = /^\d+$/.test(text) ? Number(text) : NaN;
    return Number.isSafeInteger(n) && n >= min && n <= max ? n : fail(`Expected a whole number from ${min} to ${max}.`);
  };

/** `10%` (or `10`) -> 0.1: the spare margin is always written as a percentage. */
export function parsePercent(text: string): number {
  const m = /^(\d+(?:\.\d+)?)\s*%?$/.exec(text.trim());
  const n = m ? Number(m[1]) : NaN;
  return n >= 0 && n <= 100 ? n / 100 : fail('Expected a percentage from 0% to 100%, like 10%.');
}

const MM_PER: Record<string, number> = { mm: 1, cm: 10, m: 1000, in: 25.4 };

/** `150cm`, `1.5m`, `1500mm`, `59in` -> millimetres; a bare number is centimetres. */
export function parseLength(text: string): number {
  const m = /^(\d+(?:\.\d+)?)\s*(mm|cm|m|in)?$/.exec(text.trim().toLowerCase());
  const mm = m ? Number(m[1]) * MM_PER[m[2] ?? 'cm']! : NaN;
  return mm > 0
    ? Math.round(mm * 1000) / 1000
    : fail('Expected a length above zero, like 150cm, 1.5m, 1500mm or 59in.');
}

/** `5` or `5g` -> 5 (grams per pack). */
export function parseGrams(text: string): number {
  const m = /^(\d+(?:\.\d+)?)\s*g?$/.exec(text.trim().toLowerCase());
  const g = m ? Number(m[1]) : NaN;
  return g > 0 ? g : fail('Expected a pack size in grams above zero, like 5 or 7.5g.');
}

/** A CIEDE2000 distance, `8` or `2.5`: 0 (no warning) to 100 (about black to white). */
export function parseColorDistance(text: string): number {
  const m = /^(\d+(?:\.\d+)?)$/.exec(text.trim());
  const n = m ? Number(m[1]) : NaN;
  return n >= 0 && n <= 100 ? n : fail('Expected a colour distance from 0 (never warn) to 100, like 8.');
}

/** `svg,png` -> ['svg', 'png'], each checked, no repeats. */
export function parseFormatList(text: string): string[] {
  const list = [...new Set(text.split(',').map((s) => s.trim().toLowerCase()))];
  const bad = list.filter((f) => !(OUTPUT_FORMATS as readonly string[]).includes(f));
  return bad.length === 0 && list.length > 0
    ? list
    : fail(`Unknown format '${bad.join(',')}'. Allowed: ${OUTPUT_FORMATS.join(', ')}.`);
}

export function parseUrl(text: string): string {
  let url: URL | null = null;
  try {
    url = new URL(text);
  } catch {
    url = null;
  }
  return url && (url.protocol === 'http:' || url.protocol === 'https:')
    ? url.href.replace(/\/$/, '')
    : fail('Expected a web address starting with http:// or https://, like http://localhost:8080.');
}

const formatOption = (values: string[], def: string) =>
  new Option('--format <format>', 'output format').choices(values).default(def);

/** Buying and thread options, the same for tally and kit. */
const withMaterials = (cmd: Command): Command =>
  cmd
    .addOption(
      new Option('--spare <percent>', 'extra beads to buy for misshapen ones')
        .argParser(parsePercent)
        .default(0.1, '10%'),
    )
    .addOption(
      new Option('--pack <grams>', 'round buy amounts up to whole packs of this many grams').argParser(parseGrams),
    )
    .addOption(
      new Option('--working-length <length>', 'length of one working thread')
        .argParser(parseLength)
        .default(1500, '150cm'),
    )
    .addOption(
      new Option('--tail <length>', 'tail left at the start and the end of each thread')
        .argParser(parseLength)
        .default(150, '15cm'),
    );
const serverOption = (what = 'address of the viewer (default: the one saved by login)') =>
  new Option('--server <url>', what).argParser(parseUrl);
const portOption = (def: number, what = 'port to listen on (0 picks a free one)') =>
  new Option('--port <port>', what).argParser(integerIn(0, 65535)).default(def);

/** Commander's attribute names where a unit belongs in the name. */
const RENAME: Record<string, string> = { workingLength: 'workingLengthMm', tail: 'tailMm' };

function define(program: Command, done: (cmd: ParsedCommand) => void): void {
  const command = (spec: string, summary: string) => program.command(spec).description(summary);
  const finish = (name: string) =>
    function (this: Command) {
      const options: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(this.opts())) options[RENAME[k] ?? k] = v;
      done({ name, operands: this.args, options });
    };

  command('check', 'parse and simulate patterns; print every problem found, render nothing')
    .argument('<files...>', "pattern files ('-' reads standard input)")
    .addOption(
      // No commander default: absent means the design's threshold, which lives with the check.
      new Option(
        '--similar-colors <distance>',
        'warn when two colours are closer than this CIEDE2000 distance (default: 8; 0 never warns)',
      ).argParser(parseColorDistance),
    )
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('check'));

  command('chart', 'draw the chart of a pattern as SVG (or PNG)')
    .argument('<file>', "pattern file ('-' reads standard input)")
    .option('-o, --output <file>', 'write the chart to this file instead of standard output')
    .option('--png', 'write PNG instead of SVG (no browser needed)')
    .addOption(new Option('--dpi <dpi>', 'pixels per inch for --png').argParser(integerIn(24, 2400)).default(192))
    .addOption(
      new Option('--scale <scale>', "'mm' draws at true size for printing").choices(['screen', 'mm']).default('screen'),
    )
    .option('--numbers', 'number every unit')
    .addOption(new Option('--thread <row>', 'draw the thread path of this row').argParser(integerIn(1, 1_000_000)))
    .addOption(new Option('--theme <theme>', 'colour theme').choices(['light', 'dark', 'print']).default('light'))
    .option('--strict', 'draw nothing when the pattern has errors (default: draw what can be built)')
    .addOption(formatOption(['svg', 'json'], 'svg'))
    .action(finish('chart'));

  command('steps', 'write the row-by-row instructions a beader follows')
    .argument('<file>', "pattern file ('-' reads standard input)")
    .addOption(formatOption(['text', 'md', 'html', 'json'], 'text'))
    .action(finish('steps'));

  const tally = command('tally', 'count beads per colour and per row, with grams and thread')
    .argument('<file>', "pattern file ('-' reads standard input)")
    .addOption(formatOption(['table', 'csv', 'json'], 'table'));
  withMaterials(tally).action(finish('tally'));

  const kit = command('kit', 'print a kit sheet: what to buy per colour, thread, needle, cautions')
    .argument('<file>', "pattern file ('-' reads standard input)")
    .addOption(formatOption(['md', 'html', 'json'], 'md'));
  withMaterials(kit).action(finish('kit'));

  command('model', 'print the unit model as JSON (fourfold.model/1)')
    .argument('<file>', "pattern file ('-' reads standard input)")
    .addOption(formatOption(['json'], 'json'))
    .action(finish('model'));

  command('fmt', 'print patterns in the canonical layout, or check or rewrite them')
    .argument('<files...>', "pattern files ('-' reads standard input)")
    .addOption(
      new Option('--check', 'change nothing; exit 1 and list the files that are not formatted').conflicts('write'),
    )
    .addOption(new Option('--write', 'rewrite the files in place'))
    .addOption(new Option('--order <order>', 'convert the colour keys to this order').choices(['pickup', 'placed']))
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('fmt'));

  command('convert', 'convert folders of patterns to charts, steps and JSON in one run')
    .argument('<paths...>', 'files, folders or glob patterns')
    .requiredOption('--out <dir>', 'output folder (the input tree is mirrored inside it)')
    .addOption(
      new Option('--formats <list>', `comma-separated outputs: ${OUTPUT_FORMATS.join(',')}`)
        .argParser(parseFormatList)
        .default([...DEFAULT_OUTPUT_FORMATS], DEFAULT_OUTPUT_FORMATS.join(',')),
    )
    .addOption(new Option('--jobs <n>', 'files converted at once (default: all cores)').argParser(integerIn(1, 256)))
    .option('--force', 'convert even when an output is up to date')
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('convert'));

  command('preview', 'live preview in the browser that redraws on every save')
    .argument('<file>', 'pattern file to watch')
    .addOption(portOption(8081))
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('preview'));

  command('serve', 'serve the web viewer and its API (starts a private MariaDB unless DATABASE_URL is set)')
    .addOption(portOption(8080, 'port on 127.0.0.1, 0 picks a free one (PORT also sets it)'))
    .option('--demo', 'fill an empty database with demo accounts and patterns')
    .option('--examples <dir>', 'folder of patterns to seed the demo with; also converted into out/')
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('serve'));

  command('login', 'get a personal access token from a viewer and keep it for push and pull')
    .addOption(serverOption('address of the viewer to sign in to (default: the one used last time)'))
    .option('--token <token>', 'use this token instead of asking for e-mail and password')
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('login'));

  command('push', 'upload patterns to the viewer (a new version when one exists)')
    .argument('<files...>', 'pattern files')
    .addOption(serverOption())
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('push'));

  command('pull', 'download a pattern from the viewer')
    .argument('<id>', 'pattern id, as shown by the viewer')
    .option('-o, --output <file>', 'write to this file instead of standard output')
    .addOption(serverOption())
    .addOption(formatOption(['text', 'json'], 'text'))
    .action(finish('pull'));
}

const EXAMPLES = `
Exit codes: 0 ok (warnings allowed), 1 a pattern has errors, 2 usage or I/O failure.

Examples:
  fourfold check band.ffp
  fourfold chart band.ffp -o band.svg --numbers
  fourfold tally band.ffp --spare 15% --pack 5
  fourfold fmt --check patterns/*.ffp
`;

export function parseArgs(argv: readonly string[]): ArgsResult {
  if (argv.length === 1 && (argv[0] === '--version' || argv[0] === '-V')) return { value: null, version: true };
  let out = '';
  let err = '';
  let parsed: ParsedCommand | null = null;
  const program = new Command('fourfold')
    .description('Right-angle-weave bead patterns from plain text to charts, tallies and steps.')
    .exitOverride()
    .configureOutput({
      writeOut: (s) => (out += s),
      writeErr: (s) => (err += s),
      getOutHelpWidth: () => HELP_WIDTH,
      getErrHelpWidth: () => HELP_WIDTH,
      getOutHasColors: () => false,
      getErrHasColors: () => false,
    })
    .option('-V, --version', 'print the version')
    .addHelpText('after', EXAMPLES)
    .showSuggestionAfterError(true);
  define(program, (cmd) => (parsed = cmd));
  const asked = argv[0] === 'help' ? argv[1] : undefined;
  if (asked !== undefined && !program.commands.some((c) => c.name() === asked))
    return { value: null, error: withHint(`error: unknown command '${asked}'`) };
  try {
    program.parse([...argv], { from: 'user' });
  } catch (e) {
    if (!(e instanceof CommanderError)) throw e;
    if (e.exitCode === 0) return { value: null, help: out };
    // No command at all: the overview is the whole answer.
    if (e.code === 'commander.help') return { value: null, error: err };
    const page = program.commands.find((c) => c.name() === argv.find((a) => !a.startsWith('-')));
    return { value: null, error: withHint(err || out, page?.name()) };
  }
  if (parsed) return { value: parsed };
  // Only root options were given: `-V` among others, or nothing runnable.
  if (program.opts().version) return { value: null, version: true };
  return { value: null, error: program.helpInformation() };
}

/** Point at the right help page after a usage error. */
const withHint = (text: string, page?: string): string =>
  `${text.trimEnd()}\n(run 'fourfold help${page ? ` ${page}` : ''}' for usage)\n`;
