/**
 * Cold start of `fourfold --version` against a bare `node -e 0`: the CLI must
 * not load the parser, the engine or commander just to print its version.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { medianMs, type Bench } from './harness.js';

// Compiled to dist/bench/, so the launcher is two folders up.
const launcher = fileURLToPath(new URL('../../bin/fourfold.js', import.meta.url));

const node = (args: string[]) => () => {
  const r = spawnSync(process.execPath, args, { stdio: ['ignore', 'pipe', 'pipe'] });
  if (r.status !== 0) throw new Error(`node ${args.join(' ')} failed: ${r.stderr.toString()}`);
};

const bench: Bench = {
  name: 'cli',
  async run() {
    // Alternate the two so that machine load drifts affect both alike.
    const base: number[] = [];
    const cli: number[] = [];
    for (let i = 0; i < 3; i++) {
      base.push(await medianMs(node(['-e', '0']), 5, 1));
      cli.push(await medianMs(node([launcher, '--version']), 5, 1));
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[1]!;
    return [
      {
        name: 'fourfold --version cold start vs node -e 0',
        value: median(cli),
        baseline: median(base),
        unit: 'ms',
        goal: { atMost: 1.5 },
      },
    ];
  },
};

export default bench;
