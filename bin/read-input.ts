/**
 * Reading the files a command is given, for every command module: a file
 * name or `-` for standard input in, bytes out, or one line saying why not.
 * Nothing here exits; the command turns `{ error }` into exit code 2.
 */
import { open } from 'node:fs/promises';
import { resolve } from 'node:path';
import { fileStart, type Diagnostic } from '../shared/diagnostic.js';
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

/** Why a file operation failed, in words rather than an errno. */
export function ioReason(error: unknown): string {
  const code = (error as { code?: string } | null)?.code ?? '';
  return REASONS[code] ?? (error instanceof Error ? error.message : String(error));
}

/** The one-line message every command prints when it cannot read an input. */
export const cannotRead = (path: string, error: unknown): string =>
  `fourfold: cannot read '${displayName(path)}': ${ioReason(error)}`;

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

export interface PatternText {
  file: string;
  text: string;
  /** Problems with the bytes themselves (not UTF-8 text); the parser reports the rest. */
  diagnostics: Diagnostic[];
}

/** A file (or `-`) as text for the parser; a byte-order mark is dropped. */
export async function readPattern(path: string, io: CliIO): Promise<PatternText | { error: string }> {
  const input = await readInput(path, io);
  if ('error' in input) return input;
  try {
    return { file: input.file, text: new TextDecoder('utf-8', { fatal: true }).decode(input.bytes), diagnostics: [] };
  } catch {
    const diagnostic: Diagnostic = {
      severity: 'error',
      id: 'not-text',
      message: 'this file is not UTF-8 text',
      range: fileStart,
      hint: 'save the pattern as plain text in UTF-8 (most editors offer it under "Save as" or "Encoding")',
    };
    return { file: input.file, text: new TextDecoder('utf-8').decode(input.bytes), diagnostics: [diagnostic] };
  }
}
