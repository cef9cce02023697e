/**
 * `fourfold serve [--port 8080] [--demo] [--examples DIR]`, what `npm start`
 * runs: build the web app if it is missing, start the database and the
 * server, convert the examples into out/, print where to go and the demo
 * accounts, and on Ctrl-C (or SIGTERM) close everything cleanly.
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { EXIT_FAILURE, EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';

/** The folder of fourfold's own package.json, from the sources or from dist/. */
function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const manifest = join(dir, 'package.json');
    if (existsSync(manifest) && (JSON.parse(readFileSync(manifest, 'utf8')) as { name?: string }).name === 'fourfold')
      return dir;
    const up = dirname(dir);
    if (up === dir) throw new Error('cannot find the fourfold package folder');
    dir = up;
  }
}

async function buildWebIfMissing(root: string, io: CliIO): Promise<void> {
  if (existsSync(join(root, 'dist', 'web', 'index.html'))) return;
  io.stderr.write('The web app is not built yet; building it (npm run build:web)...\n');
  const { execa } = await import('execa');
  await execa('npm', ['run', 'build:web'], { cwd: root, stdout: 'ignore', stderr: 'inherit' });
}

/** The first SIGINT or SIGTERM; `ignore()` gives the signals back (a failed start must not keep Ctrl-C). */
function untilSignal(): { signal: Promise<string>; ignore(): void } {
  let ignore = () => {};
  const signal = new Promise<string>((done) => {
    const stop = (name: string) => {
      ignore();
      done(name);
    };
    ignore = () => {
      process.off('SIGINT', stop);
      process.off('SIGTERM', stop);
    };
    process.on('SIGINT', stop);
    process.on('SIGTERM', stop);
  });
  return { signal, ignore };
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const root = projectRoot();
  const log = (line: string) => io.stderr.write(`${line}\n`);
  const given = cmd.options.port as number | undefined;
  const port = given !== undefined && given !== 8080 ? given : Number(io.env.PORT || given || 8080);
  const examples = cmd.options.examples ? resolve(io.cwd, cmd.options.examples as string) : undefined;
  // Listen for Ctrl-C from the start, so a stop during start-up still stops MariaDB.
  const stopped = untilSignal();
  await buildWebIfMissing(root, io);
  const { startServer } = await import('../../server/main.js');
  let running;
  try {
    running = await startServer({
      port,
      demo: cmd.options.demo === true,
      examplesDir: examples,
      root,
      env: io.env,
      log,
    });
  } catch (error) {
    const inUse = (error as NodeJS.ErrnoException).code === 'EADDRINUSE';
    const message = inUse
      ? `port ${port} on 127.0.0.1 is already in use; stop what listens there, or pick another with --port or PORT`
      : (error as Error).message;
    io.stderr.write(`fourfold: serve: ${message}\n`);
    stopped.ignore();
    return EXIT_FAILURE;
  }
  if (examples) {
    const { convertPaths } = await import('../convert/index.js');
    const summary = await convertPaths([examples], { out: join(root, 'out'), cwd: io.cwd });
    log(
      `examples: ${summary.converted} converted, ${summary.skipped} up to date, ${summary.failed} with errors, into ${join(root, 'out')}`,
    );
  }
  const { DEMO_ACCOUNTS } = await import('../../server/seed.js');
  const accounts = running.demoPassword
    ? DEMO_ACCOUNTS.map((a) => ({ email: a.email, role: a.role, password: running.demoPassword }))
    : [];
  if (cmd.options.format === 'json') {
    io.stdout.write(`${JSON.stringify({ url: running.url, accounts })}\n`);
  } else {
    io.stdout.write(`Fourfold viewer: ${running.url}\n`);
    if (accounts.length) {
      // On later starts the accounts are the ones the first start made, which may have been changed since.
      const since = running.seeded ? '' : ', unless changed since the first start';
      io.stdout.write(`Demo accounts (password ${running.demoPassword}${since}):\n`);
      for (const a of accounts) io.stdout.write(`  ${a.role.padEnd(9)} ${a.email}\n`);
    }
    io.stdout.write('Press Ctrl-C to stop.\n');
  }
  const signal = await stopped.signal;
  log(`${signal}: stopping...`);
  await running.close();
  log('stopped.');
  return EXIT_OK;
}
