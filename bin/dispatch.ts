/**
 * From argv to an exit code: parse (args.ts, loaded only when needed so that
 * `--version` stays as fast as a bare `node`), load the one command module
 * asked for, run it, and make sure nothing but a short message ever reaches
 * the user when something goes wrong inside.
 */
import { readFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { EXIT_FAILURE, EXIT_OK, type CliIO, type CommandModule } from './command.js';

export async function main(argv: string[], io: CliIO): Promise<number> {
  try {
    if (argv.length === 1 && (argv[0] === '--version' || argv[0] === '-V')) return await printVersion(io);
    const { parseArgs } = await import('./args.js');
    const parsed = parseArgs(argv);
    if (parsed.version) return await printVersion(io);
    if (parsed.help !== undefined) {
      io.stdout.write(parsed.help);
      return EXIT_OK;
    }
    if (!parsed.value) {
      io.stderr.write(parsed.error ?? 'fourfold: nothing to do\n');
      return EXIT_FAILURE;
    }
    const command = await loadCommand(parsed.value.name);
    if (!command) {
      io.stderr.write(`fourfold: the '${parsed.value.name}' command is not available in this build yet\n`);
      return EXIT_FAILURE;
    }
    return await command.run(parsed.value, io);
  } catch (error) {
    return internalError(error, io);
  }
}

/**
 * Only a missing command module means "not available"; a module that fails
 * to load for any other reason (a missing dependency inside it) is a bug.
 */
export async function loadCommand(name: string): Promise<CommandModule | null> {
  try {
    // A plain string (not a template) so bundlers and test runners leave the lookup to run time.
    const specifier = './commands/' + name + '.js';
    const mod = (await import(/* @vite-ignore */ specifier)) as Partial<CommandModule>;
    return typeof mod.run === 'function' ? (mod as CommandModule) : null;
  } catch (error) {
    const e = error as { code?: string; message?: string };
    const missing = e.code === 'ERR_MODULE_NOT_FOUND' || /Failed to load url|Cannot find module/.test(e.message ?? '');
    if (missing && new RegExp(`commands[/\\\\]${name}(\\.[jt]s)?['"\\s]`).test(`${e.message ?? ''} `)) return null;
    throw error;
  }
}

function internalError(error: unknown, io: CliIO): number {
  const message = error instanceof Error ? error.message : String(error);
  io.stderr.write(
    io.env.FOURFOLD_DEBUG === '1' && error instanceof Error && error.stack
      ? `${error.stack}\n`
      : `fourfold: internal error: ${message}\nThis is a bug in fourfold; please report it (FOURFOLD_DEBUG=1 shows the details).\n`,
  );
  return EXIT_FAILURE;
}

async function printVersion(io: CliIO): Promise<number> {
  io.stdout.write(`${await packageVersion()}\n`);
  return EXIT_OK;
}

/** The version in our package.json, found from here whether running from bin/ or dist/bin/. */
async function packageVersion(): Promise<string> {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const pkg = await readFile(join(dir, 'package.json'), 'utf8').then(
      (text) => JSON.parse(text) as { name?: string; version?: string },
      () => null,
    );
    if (pkg?.name === 'fourfold' && pkg.version) return pkg.version;
    const up = dirname(dir);
    if (up === dir) throw new Error('package.json not found');
    dir = up;
  }
}
