/** An in-memory CliIO: what a command wrote, and standard input as given. */
import type { CliIO } from '../../bin/command.js';

export interface FakeIO extends CliIO {
  out(): string;
  err(): string;
}

export function fakeIO(
  options: { stdin?: string | Uint8Array; env?: Record<string, string>; tty?: boolean; cwd?: string } = {},
): FakeIO {
  let out = '';
  let err = '';
  const decoder = new TextDecoder();
  return {
    stdout: {
      write: (t: string | Uint8Array) => (out += typeof t === 'string' ? t : decoder.decode(t)),
      isTTY: options.tty,
    },
    stderr: { write: (t: string) => (err += t), isTTY: options.tty },
    readStdin: async () => Buffer.from(options.stdin ?? ''),
    env: options.env ?? {},
    cwd: options.cwd ?? process.cwd(),
    out: () => out,
    err: () => err,
  };
}
