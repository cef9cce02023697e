/**
 * Bundles the modules that re-export a dependency (`parser/chevrotain.ts`,
 * `shared/culori.ts`) over their compiled copies in dist/, after tsc. Those
 * packages point Node at trees of hundreds of small ES modules, and loading
 * them was most of the time a `fourfold` command or a batch-conversion
 * worker took to start. Everything else in dist/ stays as tsc wrote it.
 */
import { defineConfig } from 'rolldown';

export default defineConfig({
  input: { 'parser/chevrotain': 'parser/chevrotain.ts', 'shared/culori': 'shared/culori.ts' },
  platform: 'node',
  logLevel: 'warn',
  output: { dir: 'dist', format: 'esm', entryFileNames: '[name].js', sourcemap: true },
});
