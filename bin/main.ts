/**
 * The CLI's top level: parse arguments (pure, see args.ts), load the one
 * command module needed, and turn whatever happens into an exit code.
 */
import type { CliIO } from './command.js';

export async function run(argv: string[]): Promise<void> {
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
