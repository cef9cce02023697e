/**
 * `fourfold chart FILE [-o OUT] [--png] [--dpi N] [--scale mm] [--numbers]
 * [--thread ROW] [--theme light|dark|print] [--strict] [--format svg|json]`.
 * A pattern with errors still draws what could be built, with the failing
 * unit marked, and exits 1; `--strict` draws nothing then.
 */
import { buildScene } from '../../shared/chart/scene.js';
import type { SceneOptions } from '../../shared/chart/scene-types.js';
import { isThemeName } from '../../shared/chart/themes.js';
import { hasErrors } from '../../shared/diagnostic.js';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS, type CliIO, type ParsedCommand } from '../command.js';
import { writeFileAtomic } from '../convert/atomic-write.js';
import { compilePattern, ioReason } from '../read-input.js';
import { renderChartFiles } from '../render/chart-files.js';
import { FontCacheError } from '../render/font.js';
import { resolve } from 'node:path';

/** The scene options as args.ts hands them over. */
export function sceneOptions(options: Record<string, unknown>): SceneOptions {
  const theme = typeof options.theme === 'string' && isThemeName(options.theme) ? options.theme : 'light';
  return {
    theme,
    ...(options.numbers === true ? { numbers: true } : {}),
    ...(typeof options.thread === 'number' ? { thread: options.thread } : {}),
    ...(options.scale === 'mm' ? { scale: 'mm' as const } : {}),
  };
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const compiled = await compilePattern(cmd.operands[0]!, io);
  if (typeof compiled === 'number') return compiled;
  const failed = hasErrors(compiled.diagnostics);
  if (failed && cmd.options.strict === true) {
    io.stderr.write('fourfold: no chart drawn: the pattern has errors (--strict)\n');
    return EXIT_PATTERN_ERRORS;
  }
  const { model } = compiled.value;
  const options = sceneOptions(cmd.options);
  const png = cmd.options.png === true;
  const output = typeof cmd.options.output === 'string' ? cmd.options.output : undefined;

  let bytes: string | Uint8Array;
  if (cmd.options.format === 'json') {
    const scene = buildScene(model, options);
    if (hasErrors(scene.diagnostics)) return optionErrors(scene.diagnostics, io);
    bytes = `${JSON.stringify({ schema: 'fourfold.scene/1', ...scene.value }, null, 2)}\n`;
  } else {
    if (png && output === undefined && io.stdout.isTTY) {
      io.stderr.write('fourfold: not writing a PNG to the terminal; use -o FILE.png or redirect the output\n');
      return EXIT_FAILURE;
    }
    const dpi = typeof cmd.options.dpi === 'number' ? cmd.options.dpi : undefined;
    let files: Awaited<ReturnType<typeof renderChartFiles>>;
    try {
      files = await renderChartFiles(model, { ...options, png, ...(dpi === undefined ? {} : { dpi }) });
    } catch (error) {
      if (!(error instanceof FontCacheError)) throw error;
      io.stderr.write(`fourfold: ${error.message}\n`);
      return EXIT_FAILURE;
    }
    if (hasErrors(files.diagnostics)) return optionErrors(files.diagnostics, io);
    bytes = files.png ?? files.svg;
  }

  if (output === undefined) io.stdout.write(bytes);
  else {
    try {
      writeFileAtomic(resolve(io.cwd, output), bytes);
    } catch (error) {
      io.stderr.write(`fourfold: cannot write '${output}': ${ioReason(error)}\n`);
      return EXIT_FAILURE;
    }
  }
  return failed ? EXIT_PATTERN_ERRORS : EXIT_OK;
}

/** A bad `--thread` row is a usage error: exit 2, like any other bad option value. */
function optionErrors(diagnostics: readonly { message: string }[], io: CliIO): number {
  for (const d of diagnostics) io.stderr.write(`fourfold: ${d.message}\n`);
  return EXIT_FAILURE;
}
