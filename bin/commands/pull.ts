/** `fourfold pull ID [-o FILE]`: the current text of a pattern from the viewer. */
import { writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { ApiError, call } from '../../server/client.js';
import { EXIT_FAILURE, EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';
import { ioReason } from '../read-input.js';
import { remote } from './push.js';

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const viewer = await remote(cmd, io);
  if (!viewer) return EXIT_FAILURE;
  const id = cmd.operands[0]!;
  if (!/^[1-9][0-9]*$/.test(id)) {
    io.stderr.write(`fourfold: '${id}' is not a pattern id (a whole number, as the viewer shows it)\n`);
    return EXIT_FAILURE;
  }
  let source: string;
  try {
    source = (await call<{ source: string }>(viewer.server, viewer.token, 'GET', `/api/patterns/${id}`)).source;
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    io.stderr.write(`fourfold: pull ${id}: ${error.message}\n`);
    return EXIT_FAILURE;
  }
  const output = cmd.options.output as string | undefined;
  if (!output) {
    io.stdout.write(source);
    return EXIT_OK;
  }
  try {
    await writeFile(resolve(io.cwd, output), source);
  } catch (error) {
    io.stderr.write(`fourfold: cannot write '${output}': ${ioReason(error)}\n`);
    return EXIT_FAILURE;
  }
  return EXIT_OK;
}
