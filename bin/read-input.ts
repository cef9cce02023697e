/**
 * Reading the files a command is given, for every command module: a file
 * name or `-` for standard input in, bytes out, or one line saying why not.
 * Nothing here exits; the command turns `{ error }` into exit code 2.
 */
import { open } from 'node:fs/promises';
import { resolve } from 'node:path';
import type { CliIO } from './command.js';

/** What a diagnostic calls standard input. */
export const STDIN_NAME = '<stdin>';

/**
 * Files over 1 MiB are refused by the parser (NOTATION.md section 7). Reading
 * one byte past the limit is enough for it to say so, without reading a huge
 * file into memory.
 */
const READ_LIMIT = 1024 * 1024 + 1;

export interface Input {
  /** The name to show in messages: the path as given, or `<stdin>`. */
  file: string;
  bytes: Uint8Array;
}

export type ReadResult = Input | { error: string };

export const displayName = (path: string): string => (path === '-' ? STDIN_NAME : path);

const REASONS: Record<string, string> = {
  ENOENT: 'no such file or folder',
  EISDIR: 'it is a folder, not a file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  ENOTDIR: 'a part of the path is not a folder',
  ENAMETOOLONG: 'the name is too long',
  ELOOP: 'too many symbolic links',
};

/** The one-line message every command prints when it cannot read an input. */
export function cannotRead(path: string, error: unknown): string {
  const code = (error as { code?: string } | null)?.code ?? '';
  const reason = REASONS[code] ?? (error instanceof Error ? error.message : String(error));
  return `fourfold: cannot read '${displayName(path)}': ${reason}`;
}

export async function readInput(path: string, io: CliIO): Promise<ReadResult> {
  const file = displayName(path);
  try {
    if (path === '-') return { file, bytes: await io.readStdin() };
    const handle = await open(resolve(io.cwd, path), 'r');
    try {
      const stat = await handle.stat();
      if (stat.isDirectory()) return { error: cannotRead(path, { code: 'EISDIR' }) };
      const buffer = Buffer.alloc(Math.min(READ_LIMIT, stat.isFile() ? stat.size : READ_LIMIT));
      let filled = 0;
      // Special files (pipes, /dev/stdin) report size 0, so read until the end or the limit.
      while (filled < buffer.length) {
        const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, null);
        if (bytesRead === 0) break;
        filled += bytesRead;
      }
      return { file, bytes: buffer.subarray(0, filled) };
    } finally {
      await handle.close();
    }
  } catch (error) {
    return { error: cannotRead(path, error) };
  }
}
