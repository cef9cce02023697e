/**
 * `fourfold fmt FILES... [--check | --write] [--order pickup|placed]`: the
 * canonical layout. A file whose structure could not be read is never
 * formatted (the formatter would drop what the parser could not place): its
 * diagnostics are printed instead and the exit code is 1.
 */
import { randomBytes } from 'node:crypto';
import { chmod, rename, stat, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { format, parse } from '../../parser/index.js';
import { convertOrder } from '../../shared/order.js';
import { hasErrors, type Diagnostic } from '../../shared/diagnostic.js';
import type { KeyOrder } from '../../parser/ast.js';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS, type CliIO, type ParsedCommand } from '../command.js';
import { ioReason, printDiagnostics, readPattern } from '../read-input.js';

interface FmtOutcome {
  file: string;
  ok: boolean;
  changed: boolean;
  written: boolean;
}

/** Formatted text, or the diagnostics that stop formatting. */
export function formatText(text: string, order?: KeyOrder): { text: string | null; diagnostics: Diagnostic[] } {
  const parsed = parse(text);
  if (hasErrors(parsed.diagnostics.filter(blocksFormatting))) return { text: null, diagnostics: parsed.diagnostics };
  if (!order || order === parsed.value.header.order) return { text: format(parsed.value), diagnostics: [] };
  const converted = convertOrder(parsed.value, order);
  if (hasErrors(converted.diagnostics)) return { text: null, diagnostics: converted.diagnostics };
  return { text: format(converted.value), diagnostics: converted.diagnostics };
}

/**
 * Checks about meaning (an unknown colour, a wrong row number) leave the
 * file's structure intact, so it can still be laid out; only problems that
 * lose text (syntax, too large, not text at all) stop the formatter.
 */
const LOSES_TEXT = new Set(['syntax', 'too-large', 'not-text', 'internal']);
const blocksFormatting = (d: Diagnostic): boolean => LOSES_TEXT.has(d.id);

/** Write beside the file, then rename over it, so a crash never leaves half a pattern. */
export async function writeAtomic(path: string, text: string): Promise<void> {
  const temp = join(dirname(path), `.${basename(path)}.${randomBytes(6).toString('hex')}.tmp`);
  const mode = await stat(path).then(
    (s) => s.mode & 0o777,
    () => 0o644,
  );
  try {
    await writeFile(temp, text, { flag: 'wx', mode });
    await chmod(temp, mode);
    await rename(temp, path);
  } catch (error) {
    await unlink(temp).catch(() => undefined);
    throw error;
  }
}

type Mode = 'print' | 'check' | 'write';

/** One file: its outcome for the JSON report and the exit code it earns. */
async function fmtOne(path: string, mode: Mode, order: KeyOrder | undefined, io: CliIO, json: boolean) {
  const outcome: FmtOutcome = { file: path, ok: false, changed: false, written: false };
  const input = await readPattern(path, io);
  if ('error' in input) {
    io.stderr.write(`${input.error}\n`);
    return { outcome, exit: EXIT_FAILURE };
  }
  outcome.file = input.file;
  const result = input.diagnostics.length
    ? { text: null, diagnostics: input.diagnostics }
    : formatText(input.text, order);
  printDiagnostics(input.file, input.text, result.diagnostics, io);
  if (result.text === null) {
    // Said once, after the diagnostics, so no one takes the silence on standard output for success.
    const what = order && !result.diagnostics.some(blocksFormatting) ? `converted to ${order} order` : 'formatted';
    if (!json) io.stderr.write(`fourfold: '${input.file}' is not ${what}: fix the errors above first\n`);
    return { outcome, exit: EXIT_PATTERN_ERRORS };
  }
  outcome.ok = true;
  outcome.changed = result.text !== input.text;
  if (mode === 'check') {
    if (outcome.changed && !json) io.stdout.write(`${input.file}\n`);
    return { outcome, exit: outcome.changed ? EXIT_PATTERN_ERRORS : EXIT_OK };
  }
  if (mode === 'print' || path === '-') {
    if (!json) io.stdout.write(result.text);
    return { outcome, exit: EXIT_OK };
  }
  if (!outcome.changed) return { outcome, exit: EXIT_OK };
  try {
    await writeAtomic(resolve(io.cwd, path), result.text);
  } catch (error) {
    io.stderr.write(`fourfold: cannot write '${input.file}': ${ioReason(error)}\n`);
    return { outcome, exit: EXIT_FAILURE };
  }
  outcome.written = true;
  if (!json) io.stdout.write(`formatted ${input.file}\n`);
  return { outcome, exit: EXIT_OK };
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const mode: Mode = cmd.options.check ? 'check' : cmd.options.write ? 'write' : 'print';
  const order = cmd.options.order as KeyOrder | undefined;
  const json = cmd.options.format === 'json';
  const outcomes: FmtOutcome[] = [];
  let exit = EXIT_OK;
  for (const path of cmd.operands) {
    const one = await fmtOne(path, mode, order, io, json);
    outcomes.push(one.outcome);
    exit = Math.max(exit, one.exit);
  }
  if (json) io.stdout.write(`${JSON.stringify({ schema: 'fourfold.fmt/1', files: outcomes }, null, 2)}\n`);
  else if (mode === 'check' && outcomes.some((o) => o.changed))
    io.stderr.write("fourfold: the files listed are not in the canonical layout; 'fourfold fmt --write' fixes them\n");
  return exit;
}
