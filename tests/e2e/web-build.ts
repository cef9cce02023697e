/**
 * The built web app the servers serve. `npm test` builds it first (pretest);
 * a lone run of these tests builds it here when it is missing.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';

export const WEB_DIR = join(process.cwd(), 'dist', 'web');

export async function ensureWebBuild(): Promise<string> {
  if (!existsSync(join(WEB_DIR, 'index.html'))) {
    const { build } = await import('vite');
    await build({ configFile: join(process.cwd(), 'vite.config.ts'), logLevel: 'warn' });
  }
  return WEB_DIR;
}
