/**
 * `fourfold kit FILE [--format md|html|json]`: the kit sheet. The JSON form
 * is the tally plus what the sheet adds (tool suggestion, caution), so a shop
 * system gets the same figures as the printed sheet.
 */
import { SMALL_PARTS_CAUTION } from '../../shared/caution.js';
import { renderKitHtml, renderKitMarkdown, toolSuggestion } from '../../shared/kit.js';
import { EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';
import { loadTally } from './tally.js';

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const loaded = await loadTally(cmd, io);
  if (typeof loaded === 'number') return loaded;
  const { model, tally, options } = loaded;
  const format = cmd.options.format ?? 'md';
  if (format === 'json') {
    const kit = {
      schema: 'fourfold.kit/1',
      tally,
      pack: options.packGrams ?? null,
      workingLengthMm: options.workingLengthMm,
      tailMm: options.tailMm,
      tools: toolSuggestion(model.header.beads.size),
      caution: SMALL_PARTS_CAUTION,
    };
    io.stdout.write(`${JSON.stringify(kit, null, 2)}\n`);
  } else {
    io.stdout.write(
      format === 'html' ? renderKitHtml(model, tally, options) : renderKitMarkdown(model, tally, options),
    );
  }
  return EXIT_OK;
}
