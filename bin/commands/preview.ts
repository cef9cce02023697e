/**
 * `fourfold preview FILE [--port N]`: a live preview on loopback that redraws
 * on every save. Runs until interrupted (Ctrl-C), then closes cleanly.
 */
import { stat } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { EXIT_FAILURE, EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';
import { cannotRead } from '../read-input.js';
import { findWebRoot, startPreview } from '../preview/preview-server.js';

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const name = cmd.operands[0]!;
  const path = resolve(io.cwd, name);
  if (name === '-') {
    io.stderr.write('fourfold: preview watches a file; standard input cannot be watched\n');
    return EXIT_FAILURE;
  }
  try {
    if (!(await stat(path)).isFile()) throw Object.assign(new Error('not a file'), { code: 'EISDIR' });
  } catch (error) {
    io.stderr.write(`${cannotRead(name, error)}\n`);
    return EXIT_FAILURE;
  }
  const webRoot = findWebRoot(dirname(fileURLToPath(import.meta.url)));
  if (!webRoot) {
    io.stderr.write('fourfold: the web app is not built; run `npm run build:web` first\n');
    return EXIT_FAILURE;
  }
  let preview;
  try {
    preview = await startPreview({ path, port: Number(cmd.options.port ?? 8081), webRoot });
  } catch (error) {
    const code = (error as { code?: string }).code;
    io.stderr.write(
      `fourfold: cannot listen on port ${String(cmd.options.port)}: ${code === 'EADDRINUSE' ? 'it is in use; try --port 0' : String(error)}\n`,
    );
    return EXIT_FAILURE;
  }
  io.stdout.write(
    cmd.options.format === 'json'
      ? `${JSON.stringify({ url: preview.url })}\n`
      : `Previewing ${name} at ${preview.url}\nPress Ctrl-C to stop.\n`,
  );
  await new Promise<void>((done) => {
    const stop = () => {
      process.off('SIGINT', stop);
      process.off('SIGTERM', stop);
      done();
    };
    process.on('SIGINT', stop);
    process.on('SIGTERM', stop);
  });
  await preview.close();
  return EXIT_OK;
}
