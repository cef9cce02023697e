/**
 * Debian's Chromium through playwright-core, never a downloaded browser, with
 * the flags this closed network needs (no background connections). Shared by
 * the browser benchmark and the end-to-end tests.
 */
import { existsSync } from 'node:fs';
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

export function launchChromium(): Promise<Browser> {
  if (!existsSync(CHROMIUM))
    throw new Error(`${CHROMIUM} is missing: install Debian's chromium package (.ci/run does)`);
  return chromium.launch({
    executablePath: CHROMIUM,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}
