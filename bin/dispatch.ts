import type { CliIO } from './command.js';
import { EXIT_FAILURE } from './command.js';

/** Placeholder until args.ts lands: the CLI issue replaces this file. */
export async function main(_argv: string[], io: CliIO): Promise<number> {
  io.stderr.write('fourfold: not built yet\n');
  return EXIT_FAILURE;
}
