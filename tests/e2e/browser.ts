/**
 * Debian's Chromium through playwright-core: never a downloaded browser.
 * Each launch gets a fresh temporary profile (playwright passes its own new
 * --user-data-dir), and each context is as empty as a private window.
 */
import { existsSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';
export const RESULTS = join(process.cwd(), 'test-results');

export async function launchChromium(): Promise<Browser> {
  if (!existsSync(CHROMIUM))
    throw new Error(`${CHROMIUM} is missing: install Debian's chromium package (.ci/run does)`);
  await mkdir(RESULTS, { recursive: true });
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

/**
 * Page errors, and console errors such as a refusal by the Content-Security-Policy,
 * fail the test that caused them instead of passing unseen. A failed request
 * the test provokes on purpose (a not-found answer) is not an error of the page.
 */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error' && !/Failed to load resource: the server responded with a status of 404/.test(m.text()))
      errors.push(m.text());
  });
  return errors;
}

export const shot = (page: Page, name: string) =>
  page.screenshot({ path: join(RESULTS, `${name}.png`), fullPage: true });
