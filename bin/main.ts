/**
 * The CLI's top level: wire the real process to the CliIO that everything
 * below takes, and set the exit code (never `process.exit`, so output that is
 * still buffered gets written). Argument parsing and command loading live in
 * dispatch.ts, which tests call in-process with a fake CliIO.
 */
import type { CliIO } from './command.js';

export async function run(argv: string[]): Promise<void> {
  // `fourfold steps x | head` closes the pipe early: that is not an error.
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code !== 'EPIPE') throw error;
    process.exit(process.exitCode ?? 0);
  });
  const io: CliIO = {
    stdout: process.stdout,
    stderr: process.stderr,
    readStdin: async () => {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks);
    },
    env: process.env,
    cwd: process.cwd(),
  };
  const { main } = await import('./dispatch.js');
  process.exitCode = await main(argv, io);
}
