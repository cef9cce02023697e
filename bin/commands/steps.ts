/**
 * `fourfold steps FILE [--format text|md|html|json]`: the written
 * instructions a beader follows, built from the simulated thread path.
 */
import { buildSteps, type StepsDoc } from '../../shared/steps.js';
import { renderStepsHtml, renderStepsMarkdown, renderStepsText } from '../../shared/steps-render.js';
import { EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';
import { loadModel } from './tally.js';

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const model = await loadModel(cmd, io);
  if (typeof model === 'number') return model;
  const doc = buildSteps(model);
  const render: Record<string, (d: StepsDoc) => string> = {
    json: (d) => `${JSON.stringify(d, null, 2)}\n`,
    md: renderStepsMarkdown,
    html: renderStepsHtml,
    text: renderStepsText,
  };
  io.stdout.write((render[String(cmd.options.format)] ?? renderStepsText)(doc));
  return EXIT_OK;
}
