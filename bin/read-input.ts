/**
 * Reading the files a command is given, for every command module: a file
 * name or `-` for standard input in, bytes out, or one line saying why not.
 * Nothing here exits; the command turns `{ error }` into exit code 2.
 */
import { open } from 'node:fs/promises';
import { resolve } from 'node:path';
import { sortDiagnostics, type Diagnostic } from '../shared/diagnostic.js';
import { formatDiagnostics } from '../shared/format-diagnostics.js';
import { MAX_BYTES } from '../parser/limits.js';
import type { Compiled } from '../shared/compile.js';
import type { CliIO } from './command.js';
import { EXIT_FAILURE, EXIT_PATTERN_ERRORS, useColor } from './command.js';

/** What a diagnostic calls standard input. */
export const STDIN_NAME = '<stdin>';

/**
 * Files over the parser's limit are refused by it anyway. Reading one byte
 * past the limit is enough for it to say so, without reading a huge file
 * into memory.
 */
const READ_LIMIT = MAX_BYTES + 1;

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
  // Creating a missing folder where a file of that name stands: ENOTDIR in other words.
  EEXIST: 'a part of the path is not a folder',
  ENOSPC: 'the disk is full',
  EROFS: 'the disk is read-only',
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
  return decodePattern(input);
}

/** Bytes already read as text for the parser, with the same words for bytes that are not text. */
export async function decodePattern(input: Input): Promise<PatternText> {
  let text: string | null = null;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(input.bytes);
  } catch {
    text = null;
  }
  if (text !== null && !text.includes('\0')) return { file: input.file, text, diagnostics: [] };
  // Not text: the parser says why, in its own words; the lossy text only feeds the code frame.
  const lossy = new TextDecoder('utf-8').decode(input.bytes);
  const { parseBytes } = await import('../parser/index.js');
  return { file: input.file, text: lossy, diagnostics: parseBytes(input.bytes).diagnostics };
}

/**
 * Diagnostics of one file in the human form, on standard error, coloured
 * only on a terminal and never with NO_COLOR; a blank line after each file.
 */
export function printDiagnostics(file: string, text: string, diagnostics: readonly Diagnostic[], io: CliIO): void {
  if (diagnostics.length === 0) return;
  io.stderr.write(
    `${formatDiagnostics(sortDiagnostics(diagnostics), text, file, { color: useColor(io, 'stderr') })}\n`,
  );
}

/**
 * Read, decode and compile one pattern, printing its diagnostics: what most
 * commands start with. A number is the exit code to return when there is
 * nothing to work with (2: unreadable; 1: not text). The engine is loaded
 * only here, so commands that never compile stay light.
 */
export async function compilePattern(path: string, io: CliIO): Promise<(PatternText & { value: Compiled }) | number> {
  const input = await readPattern(path, io);
  if ('error' in input) {
    io.stderr.write(`${input.error}\n`);
    return EXIT_FAILURE;
  }
  if (input.diagnostics.length > 0) {
    printDiagnostics(input.file, input.text, input.diagnostics, io);
    return EXIT_PATTERN_ERRORS;
  }
  const { compile } = await import('../shared/compile.js');
  const { value, diagnostics } = compile(input.text);
  printDiagnostics(input.file, input.text, diagnostics, io);
  return { ...input, value, diagnostics };
}
