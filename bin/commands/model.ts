/**
 * `fourfold model FILE`: the unit model as `fourfold.model/1` JSON. A pattern
 * with errors still prints the part that could be built (NOTATION.md
 * section 7), with its diagnostics on standard error and exit code 1.
 */
import { hasErrors } from '../../shared/diagnostic.js';
import { EXIT_OK, EXIT_PATTERN_ERRORS, type CliIO, type ParsedCommand } from '../command.js';
import { compilePattern } from '../read-input.js';

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const compiled = await compilePattern(cmd.operands[0]!, io);
  if (typeof compiled === 'number') return compiled;
  io.stdout.write(`${JSON.stringify(compiled.value.model, null, 2)}\n`);
  return hasErrors(compiled.diagnostics) ? EXIT_PATTERN_ERRORS : EXIT_OK;
}
