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

const ESC = '\u001b[';
/** Whether text holds an ANSI escape (colour, bold). */
export const hasAnsi = (text: string): boolean => text.includes(ESC);
/** Text with its ANSI colour escapes removed. */
export const stripAnsi = (text: string): string =>
  text
    .split(ESC)
    .map((part, i) => (i === 0 ? part : part.replace(/^[0-9;]*m/, '')))
    .join('');
