/**
 * Debian's Chromium through playwright-core: never a downloaded browser.
 * Each launch gets a fresh temporary profile (playwright passes its own new
 * --user-data-dir), and each context is as empty as a private window.
 */
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchChromium as launchBrowser } from '../../bench/chromium.js';

export const RESULTS = join(process.cwd(), 'test-results');

export async function launchChromium(): Promise<Browser> {
  await mkdir(RESULTS, { recursive: true });
  return launchBrowser();
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
