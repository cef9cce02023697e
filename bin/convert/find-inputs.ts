/**
 * PATHS... to the list of pattern files to convert, each with the path its
 * outputs take under --out, so the output tree mirrors the input tree:
 * a folder's files keep their path inside the folder, a glob's matches their
 * path below the glob's fixed part, a single file only its name.
 */
import { readdir, stat } from 'node:fs/promises';
import { basename, isAbsolute, join, relative, resolve, sep } from 'node:path';
import { glob, isDynamicPattern } from 'tinyglobby';

export const PATTERN_EXT = '.ffp';

export interface Input {
  /** Absolute path of the pattern. */
  file: string;
  /** Path below --out, with the extension, '/'-separated. */
  rel: string;
}

export interface InputProblem {
  path: string;
  message: string;
}

const toSlash = (p: string): string => p.split(sep).join('/');

/** The leading segments of a glob that hold no special characters. */
function globBase(pattern: string): string {
  const parts = pattern.split('/');
  const fixed: string[] = [];
  for (const part of parts.slice(0, -1)) {
    if (isDynamicPattern(part)) break;
    fixed.push(part);
  }
  return fixed.join('/') || '.';
}

/**
 * Every `.ffp` below a folder, symbolic links included even when they point
 * nowhere, so a broken one is reported instead of silently left out.
 */
async function walk(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true });
  return entries
    .filter((e) => (e.isFile() || e.isSymbolicLink()) && e.name.endsWith(PATTERN_EXT))
    .map((e) => join(e.parentPath, e.name))
    .sort();
}

export async function findInputs(
  paths: readonly string[],
  cwd: string,
): Promise<{ inputs: Input[]; problems: InputProblem[] }> {
  const inputs: Input[] = [];
  const problems: InputProblem[] = [];
  const byRel = new Map<string, string>();
  const add = (file: string, rel: string, path: string): void => {
    const seen = byRel.get(rel);
    if (seen === file) return;
    if (seen !== undefined) {
      problems.push({
        path,
        message: `its outputs would overwrite those of '${toSlash(relative(cwd, seen))}' (both are '${rel}' under --out)`,
      });
      return;
    }
    byRel.set(rel, file);
    inputs.push({ file, rel });
  };

  for (const path of paths) {
    if (isDynamicPattern(path)) {
      const base = resolve(cwd, globBase(path));
      const matches = await glob(path, { cwd, absolute: true, onlyFiles: true });
      if (matches.length === 0) problems.push({ path, message: 'no file matches this pattern' });
      for (const match of matches.sort()) add(resolve(match), toSlash(relative(base, match)), path);
      continue;
    }
    const full = isAbsolute(path) ? path : resolve(cwd, path);
    // A name ending in .ffp is a pattern file, even if it turns out to be a folder.
    const info = path.endsWith(PATTERN_EXT) ? null : await stat(full).catch(() => null);
    if (info?.isDirectory()) {
      try {
        for (const file of await walk(full)) add(file, toSlash(relative(full, file)), path);
      } catch (error) {
        problems.push({ path, message: (error as Error).message });
      }
    } else add(full, basename(full), path);
  }
  return { inputs, problems };
}
