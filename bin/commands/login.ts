/**
 * `fourfold login --server URL [--token TOKEN]`: exchanges e-mail and
 * password for a personal access token named after this machine (or checks
 * the token given) and keeps it, mode 600, in the user's config folder.
 */
import { hostname } from 'node:os';
import { createInterface } from 'node:readline/promises';
import { ApiError, call, loadSaved, save } from '../../server/client.js';
import { EXIT_FAILURE, EXIT_OK, type CliIO, type ParsedCommand } from '../command.js';

interface Me {
  user: { name: string; email: string; role: string };
}

/** E-mail and password: asked on a terminal (the password unechoed), else the first two lines of standard input. */
async function askCredentials(io: CliIO): Promise<{ email: string; password: string }> {
  if (!process.stdin.isTTY || io.stdout !== process.stdout) {
    const [email = '', password = ''] = (await io.readStdin()).toString('utf8').split(/\r?\n/);
    return { email: email.trim(), password };
  }
  const rl = createInterface({ input: process.stdin, output: process.stdout, terminal: true });
  try {
    const email = (await rl.question('E-mail: ')).trim();
    const output = rl as unknown as { _writeToOutput: (s: string) => void };
    const write = output._writeToOutput.bind(rl);
    // Echo nothing while the password is typed.
    output._writeToOutput = (s: string) => (s.startsWith('Password') ? write(s) : undefined);
    const password = await rl.question('Password: ');
    output._writeToOutput = write;
    io.stdout.write('\n');
    return { email, password };
  } finally {
    rl.close();
  }
}

export async function run(cmd: ParsedCommand, io: CliIO): Promise<number> {
  const server = (cmd.options.server as string | undefined) ?? (await loadSaved(io.env))?.server;
  if (!server) {
    io.stderr.write('fourfold: say which viewer to sign in to: fourfold login --server https://...\n');
    return EXIT_FAILURE;
  }
  try {
    let token = cmd.options.token as string | undefined;
    if (!token) {
      const { email, password } = await askCredentials(io);
      const session = await call<{ token: string }>(server, null, 'POST', '/api/auth/login', { email, password });
      const made = await call<{ token: string }>(server, session.token, 'POST', '/api/tokens', { name: hostname() });
      await call(server, session.token, 'POST', '/api/auth/logout');
      token = made.token;
    }
    const me = await call<Me>(server, token, 'GET', '/api/auth/me');
    const file = await save(io.env, { server, token });
    if (cmd.options.format === 'json') io.stdout.write(`${JSON.stringify({ server, user: me.user, config: file })}\n`);
    else
      io.stdout.write(
        `Signed in to ${server} as ${me.user.name} <${me.user.email}> (${me.user.role}); token kept in ${file}\n`,
      );
    return EXIT_OK;
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    io.stderr.write(`fourfold: login failed: ${error.message}\n`);
    return EXIT_FAILURE;
  }
}
