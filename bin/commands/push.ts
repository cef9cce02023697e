/**
 * `fourfold push FILES...`: uploads each pattern; a pattern of yours with the
 * same title gets a new version (none when the text is unchanged). Prints
 * each pattern's URL and its diagnostics.
 */
import { ApiError, call, loadSaved, type Saved } from '../../server/client.js';
import type { Diagnostic } from '../../shared/diagnostic.js';
import { EXIT_FAILURE, EXIT_OK, EXIT_PATTERN_ERRORS, type CliIO, type ParsedCommand } from '../command.js';
import { printDiagnostics, readPattern } from '../read-input.js';

interface Summary {
  id: number;
  title: string;
  version: number;
  owner: { id: number };
}
interface Detail extends Summary {
  diagnostics: Diagnostic[];
}

/** The viewer and token to use: --server with the saved token, or what login saved. */
export async function remote(cmd: ParsedCommand, io: CliIO): Promise<Saved | null> {
  const saved = await loadSaved(io.env);
  const server = (cmd.options.server as string | undefined) ?? saved?.server;
  if (!saved || !server) {
    io.stderr.write(`fourfold: not signed in; run: fourfold login --server ${server ?? 'URL'}\n`);
    return null;
  }
  return { server, token: saved.token };
}

async function pushOne(viewer: Saved, me: number, source: string): Promise<{ pattern: Detail; note: string }> {
  const { parse } = await import('../../parser/index.js');
  const title = parse(source).value.header.title;
  const found = title
    ? await call<{ items: Summary[] }>(
        viewer.server,
        viewer.token,
        'GET',
        `/api/patterns?q=${encodeURIComponent(title)}&sort=updated&pageSize=100`,
      )
    : { items: [] };
  const mine = found.items.find((p) => p.title === title && p.owner.id === me);
  if (mine) {
    const { created, pattern } = await call<{ created: boolean; pattern: Detail }>(
      viewer.server,
      viewer.token,
      'PUT',
      `/api/patterns/${mine.id}`,
      { source },
    );
    return { pattern, note: created ? `version ${pattern.version}` : `unchanged, version ${pattern.version}` };
  }
  const { items } = await call<{ items: Detail[] }>(viewer.server, viewer.token, 'POST', '/api/patterns', { source });
  return { pattern: items[0]!, note: 'new, version 1' };
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const viewer = await remote(cmd, io);
  if (!viewer) return EXIT_FAILURE;
  let code = EXIT_OK;
  const results: {
    file: string;
    id?: number;
    url?: string;
    version?: number;
    diagnostics?: Diagnostic[];
    error?: string;
  }[] = [];
  let me: number;
  try {
    me = (await call<{ user: { id: number } }>(viewer.server, viewer.token, 'GET', '/api/auth/me')).user.id;
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    io.stderr.write(`fourfold: push: ${error.message}\n`);
    return EXIT_FAILURE;
  }
  for (const path of cmd.operands) {
    const input = await readPattern(path, io);
    if ('error' in input || input.diagnostics.length > 0) {
      if ('error' in input) io.stderr.write(`${input.error}\n`);
      else printDiagnostics(input.file, input.text, input.diagnostics, io);
      results.push({ file: path, error: 'not readable as pattern text' });
      code = EXIT_FAILURE;
      continue;
    }
    try {
      const { pattern, note } = await pushOne(viewer, me, input.text);
      const url = `${viewer.server}/patterns/${pattern.id}`;
      results.push({
        file: input.file,
        id: pattern.id,
        url,
        version: pattern.version,
        diagnostics: pattern.diagnostics,
      });
      if (cmd.options.format !== 'json') {
        io.stdout.write(`${input.file}: ${url} (${note})\n`);
        printDiagnostics(input.file, input.text, pattern.diagnostics, io);
      }
      if (pattern.diagnostics.some((d) => d.severity === 'error') && code === EXIT_OK) code = EXIT_PATTERN_ERRORS;
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      io.stderr.write(`fourfold: push ${input.file}: ${error.message}\n`);
      results.push({ file: input.file, error: error.message });
      code = EXIT_FAILURE;
    }
  }
  if (cmd.options.format === 'json')
    io.stdout.write(`${JSON.stringify({ schema: 'fourfold.push/1', files: results }, null, 2)}\n`);
  return code;
}
