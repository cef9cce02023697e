/**
 * `fourfold preview`: the page in Chromium redraws when the file is saved,
 * over the server-sent event stream; a save with errors keeps the last good
 * chart and shows the diagnostics on top.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { startPreview, type PreviewHandle, type PreviewState } from '../../bin/preview/preview-server.js';
import { launchChromium, shot, watchErrors } from './browser.js';
import { ensureWebBuild } from './web-build.js';

const header = 'title: Live Strip\ndesigner: Ines Marlow\ncolors:\n  A #f4f1ea chalk\n  B #2e6f8e deep teal\n';
/** A flat strip of n units: 3n + 1 beads (NOTATION.md section 8). */
const strip = (n: number) => `${header}row 1: BBBB${' AAB'.repeat(n - 1)}\n`;

let dir: string;
let file: string;
let preview: PreviewHandle;
let browser: Browser;
let page: Page;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'fourfold-preview-'));
  file = join(dir, 'live-strip.ffp');
  await writeFile(file, strip(3));
  [preview, browser] = await Promise.all([
    ensureWebBuild().then((webRoot) => startPreview({ path: file, port: 0, webRoot })),
    launchChromium(),
  ]);
  page = await browser.newPage({ viewport: { width: 1024, height: 800 } });
  page.setDefaultTimeout(10_000);
});
afterAll(async () => {
  await browser?.close();
  await preview?.close();
  if (dir) await rm(dir, { recursive: true, force: true });
});

/** Reads the event stream until a state event satisfies `until`. */
async function nextState(until: (s: PreviewState) => boolean, change: () => Promise<void>): Promise<PreviewState> {
  const res = await fetch(preview.url.replace('/preview', '/api/preview/events'));
  const reader = res.body!.pipeThrough(new TextDecoderStream()).getReader();
  let buffer = '';
  let changed = false;
  try {
    for (;;) {
      const { value, done } = await reader.read();
      if (done) throw new Error('the event stream ended');
      buffer += value;
      let end: number;
      while ((end = buffer.indexOf('\n\n')) >= 0) {
        const frame = buffer.slice(0, end);
        buffer = buffer.slice(end + 2);
        const data = /^data: (.*)$/m.exec(frame)?.[1];
        if (!data) continue;
        const state = JSON.parse(data) as PreviewState;
        if (changed && until(state)) return state;
        // The stream opens with the current state; make the change only once it is connected.
        if (!changed) {
          changed = true;
          await change();
        }
      }
    }
  } finally {
    await reader.cancel();
  }
}

const beadCount = () => page.getByTestId('chart').locator('[data-bead]').count();
const waitForBeads = (n: number) => expect.poll(beadCount, { timeout: 10_000 }).toBe(n);

describe('live preview', () => {
  it('sends a new model over the event stream when the file is saved', async () => {
    const before = preview.state().revision;
    const state = await nextState(
      (s) => s.revision > before && s.model?.beads.length === 3 * 4 + 1,
      () => writeFile(file, strip(4)),
    );
    expect(state.diagnostics).toEqual([]);
    expect(state.stale).toBe(false);
    expect(state.model!.units).toHaveLength(4);
  });

  it('redraws the chart in the browser on every save', async () => {
    const errors = watchErrors(page);
    await page.goto(preview.url);
    await page.getByRole('heading', { name: 'Live Strip' }).waitFor();
    expect(await beadCount()).toBe(3 * 4 + 1);
    await writeFile(file, strip(6));
    await waitForBeads(3 * 6 + 1);
    expect(await page.getByTestId('stepper-place').textContent()).toMatch(/of 6$/);
    await shot(page, 'preview');
    expect(errors).toEqual([]);
  });

  it('keeps the last good chart when a save has errors, shows the diagnostics on top, and clears them when fixed', async () => {
    // Row 1's second unit shares its near bead, so it takes 3 new beads, not 2.
    await writeFile(file, `${header}row 1: BBBB AA AAB\n`);
    const alert = page.getByTestId('preview-diagnostics');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/bead-count/);
    expect(await alert.textContent()).toMatch(/last save without errors/);
    expect(await beadCount()).toBe(3 * 6 + 1);
    await shot(page, 'preview-errors');
    await writeFile(file, strip(2));
    await waitForBeads(3 * 2 + 1);
    await alert.waitFor({ state: 'detached' });
  });

  it('answers only under its loopback name, so another site cannot read the file through DNS rebinding', async () => {
    const { port } = new URL(preview.url);
    const status = await new Promise<number>((resolve, reject) => {
      const req = request(
        { host: '127.0.0.1', port, path: '/api/preview/state', headers: { Host: `attacker.example:${port}` } },
        (res) => {
          res.resume();
          resolve(res.statusCode ?? 0);
        },
      );
      req.on('error', reject);
      req.end();
    });
    expect(status).toBe(403);
  });

  it('runs as `fourfold preview FILE --port 0`: prints its loopback URL, serves the file, and stops cleanly on Ctrl-C', async () => {
    const child = spawn(process.execPath, ['bin/fourfold.js', 'preview', file, '--port', '0', '--format', 'json'], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (out += chunk));
    while (!out.includes('\n')) await once(child.stdout, 'data');
    const { url } = JSON.parse(out) as { url: string };
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/preview$/);
    const state = (await (await fetch(url.replace('/preview', '/api/preview/state'))).json()) as PreviewState;
    expect(state.file).toBe('live-strip.ffp');
    expect(state.model?.header.title).toBe('Live Strip');
    child.kill('SIGINT');
    const [code] = (await once(child, 'exit')) as [number | null];
    expect(code).toBe(0);
  });
});
