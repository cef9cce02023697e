/**
 * What every command module under bin/commands/ gets and gives back. Commands
 * are loaded lazily by bin/main.ts, so `fourfold --version` never loads the
 * engine, the renderer or the server.
 */
export const EXIT_OK = 0;
/** A pattern has errors (warnings alone still exit 0). */
export const EXIT_PATTERN_ERRORS = 1;
/** Usage or I/O failure; in a batch, 2 wins over 1. */
export const EXIT_FAILURE = 2;

export interface CliIO {
  stdout: { write(text: string | Uint8Array): unknown; isTTY?: boolean };
  stderr: { write(text: string): unknown; isTTY?: boolean };
  /** Reads all of standard input (for the file name `-`). */
  readStdin(): Promise<Buffer>;
  env: Record<string, string | undefined>;
  cwd: string;
}

/** The result of the pure argument parser: which command, its operands and its options. */
export interface ParsedCommand {
  name: string;
  operands: string[];
  options: Record<string, unknown>;
}

export type CommandModule = {
  run(cmd: ParsedCommand, io: CliIO): Promise<number>;
};

/** Colour on a TTY only, and never with NO_COLOR (no-color.org). */
export const useColor = (io: CliIO, stream: 'stdout' | 'stderr' = 'stderr'): boolean =>
  Boolean(io[stream].isTTY) && (io.env.NO_COLOR === undefined || io.env.NO_COLOR === '');
