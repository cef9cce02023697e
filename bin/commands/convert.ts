/**
 * `fourfold convert PATHS... --out DIR [--formats svg,png,md,json]
 * [--jobs N] [--force] [--format text|json]`: whole archives in one run.
 * A progress bar on a terminal only; a summary at the end; exit 1 when a
 * pattern had errors, 2 when a file could not be read or written.
 */
import { SingleBar } from 'cli-progress';
import { EXIT_FAILURE, type CliIO, type ParsedCommand } from '../command.js';
import { convertPaths, type ConvertSummary, type OutputFormat } from '../convert/index.js';

export function renderSummary(summary: ConvertSummary): string {
  const failed = summary.files.filter((f) => f.status === 'failed');
  const broken = summary.files.filter((f) => f.status === 'io-error');
  const rows: Array<[string, number]> = [
    ['converted', summary.converted],
    ['skipped (up to date)', summary.skipped],
    ['failed (pattern errors)', summary.failed],
    ['not read or written', summary.ioErrors],
  ];
  const width = Math.max(...rows.map(([label]) => label.length));
  const out = rows.map(([label, n]) => `  ${label.padEnd(width)}  ${String(n).padStart(5)}`);
  if (failed.length > 0)
    out.push(
      '',
      'Failed:',
      ...failed.map((f) => `  ${f.message ?? f.rel}${f.unchanged ? ' (unchanged since the last run)' : ''}`),
    );
  if (broken.length > 0) out.push('', 'Not read or written:', ...broken.map((f) => `  ${f.message ?? f.rel}`));
  return `${out.join('\n')}\n`;
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const out = cmd.options.out;
  if (typeof out !== 'string') {
    io.stderr.write('fourfold: convert needs --out DIR\n');
    return EXIT_FAILURE;
  }
  const bar = io.stderr.isTTY
    ? new SingleBar({
        format: 'converting [{bar}] {value}/{total} files',
        stream: process.stderr,
        hideCursor: true,
        clearOnComplete: true,
      })
    : null;
  const summary = await convertPaths(cmd.operands, {
    out,
    cwd: io.cwd,
    ...(Array.isArray(cmd.options.formats) ? { formats: cmd.options.formats as OutputFormat[] } : {}),
    ...(typeof cmd.options.jobs === 'number' ? { jobs: cmd.options.jobs } : {}),
    force: cmd.options.force === true,
    onStart: (total) => bar?.start(total, 0),
    onResult: () => bar?.increment(),
  });
  bar?.stop();
  io.stdout.write(cmd.options.format === 'json' ? `${JSON.stringify(summary, null, 2)}\n` : renderSummary(summary));
  return summary.exitCode;
}
