/**
 * `fourfold check FILES...`: parse, simulate and run the material checks on
 * each file; print every problem; render nothing. The exit code is the worst
 * over the batch: 2 (a file could not be read) wins over 1 (a file has errors).
 */
import { compile } from '../../shared/compile.js';
import { materialChecks, type MaterialCheckOptions } from '../../shared/color-checks.js';
import { fileStart, hasErrors, sortDiagnostics, type Diagnostic } from '../../shared/diagnostic.js';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS, type CliIO, type ParsedCommand } from '../command.js';
import { displayName, printDiagnostics, readPattern } from '../read-input.js';

/** The id a file that could not be read gets in the JSON report. */
const READ_ERROR = 'read-error';

export interface CheckedFile {
  file: string;
  ok: boolean;
  diagnostics: Diagnostic[];
}

/** The `fourfold.check/1` shape of PRODUCT.md, field for field. */
export function checkJson(files: readonly CheckedFile[]): string {
  const json = {
    schema: 'fourfold.check/1',
    files: files.map((f) => ({
      file: f.file,
      ok: f.ok,
      diagnostics: f.diagnostics.map((d) => ({
        severity: d.severity,
        id: d.id,
        message: d.message,
        line: d.range.line,
        column: d.range.column,
        endLine: d.range.endLine,
        endColumn: d.range.endColumn,
      })),
    })),
  };
  return `${JSON.stringify(json, null, 2)}\n`;
}

/** Every diagnostic a pattern earns, in one sorted list. */
export function checkText(text: string, options: MaterialCheckOptions = {}): Diagnostic[] {
  const compiled = compile(text);
  return sortDiagnostics([...compiled.diagnostics, ...materialChecks(compiled.value, options)]);
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const json = cmd.options.format === 'json';
  const similar = cmd.options.similarColors;
  const checks: MaterialCheckOptions = typeof similar === 'number' ? { similarColors: similar } : {};
  const files: CheckedFile[] = [];
  let exit = EXIT_OK;
  for (const path of cmd.operands) {
    const input = await readPattern(path, io);
    if ('error' in input) {
      io.stderr.write(`${input.error}\n`);
      exit = EXIT_FAILURE;
      // The report names its own program; the message keeps only what went wrong.
      const message = input.error.replace(/^fourfold: /, '');
      const diagnostic: Diagnostic = { severity: 'error', id: READ_ERROR, message, range: fileStart };
      files.push({ file: displayName(path), ok: false, diagnostics: [diagnostic] });
      continue;
    }
    const diagnostics = sortDiagnostics([
      ...input.diagnostics,
      ...(input.diagnostics.length ? [] : checkText(input.text, checks)),
    ]);
    const ok = !hasErrors(diagnostics);
    if (!ok && exit === EXIT_OK) exit = EXIT_PATTERN_ERRORS;
    files.push({ file: input.file, ok, diagnostics });
    if (!json) printDiagnostics(input.file, input.text, diagnostics, io);
  }
  if (json) io.stdout.write(checkJson(files));
  else io.stderr.write(summary(files));
  return exit;
}

const plural = (n: number, word: string): string => `${n} ${word}${n === 1 ? '' : 's'}`;

function summary(files: readonly CheckedFile[]): string {
  const unreadable = files.filter((f) => f.diagnostics.some((d) => d.id === READ_ERROR)).length;
  const all = files.flatMap((f) => f.diagnostics).filter((d) => d.id !== READ_ERROR);
  const errors = all.filter((d) => d.severity === 'error').length;
  const warnings = all.filter((d) => d.severity === 'warning').length;
  const found = errors + warnings === 0 ? 'no problems' : `${plural(errors, 'error')}, ${plural(warnings, 'warning')}`;
  const missed = unreadable > 0 ? `; ${unreadable} could not be read` : '';
  return `checked ${plural(files.length - unreadable, 'file')}: ${found}${missed}\n`;
}
