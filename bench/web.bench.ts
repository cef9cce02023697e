/**
 * The web app: the JavaScript a first visit downloads (gzipped, goal at most
 * 250 kB, which is why the editor, the engine and the chart are lazy), and
 * the time to the first interactive chart in Chromium for the 5,000-bead
 * round of chart.bench.ts against opening the same chart as a static SVG
 * file, in the same run (goal: at most 3x). Needs the production build
 * (`npm run bench` builds first) and Debian's Chromium.
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Browser } from 'playwright-core';
import { launchChromium } from './chromium.js';
import { renderChartSvg } from '../bin/render/chart-files.js';
import { startPreview } from '../bin/preview/preview-server.js';
import { compile } from '../shared/compile.js';
import { roundPattern } from './chart.bench.js';
import { medianMs, type Bench, type Figure } from './harness.js';

const WEB_DIR = join(process.cwd(), 'dist', 'web');

/** The entry script and every module it preloads: what the browser fetches before the first page shows. */
export async function initialJsGzipBytes(webDir: string): Promise<number> {
  const html = await readFile(join(webDir, 'index.html'), 'utf8');
  const srcs = [
    ...html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g),
    ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g),
  ].map((m) => m[1]!);
  if (srcs.length === 0) throw new Error('no module script in dist/web/index.html: is the web app built?');
  let total = 0;
  for (const src of new Set(srcs)) total += gzipSync(await readFile(join(webDir, src))).length;
  return total;
}

/** Wall time from navigation to `count` bead elements in the document, in a fresh context each time. */
async function timeToBeads(browser: Browser, url: string, count: number): Promise<number> {
  return medianMs(
    async () => {
      const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      const page = await context.newPage();
      await page.goto(url, { waitUntil: 'commit' });
      await page.waitForFunction(`document.querySelectorAll('[data-bead]').length === ${count}`, undefined, {
        polling: 'raf',
        timeout: 60_000,
      });
      await context.close();
    },
    5,
    1,
  );
}

const bench: Bench = {
  name: 'web',
  async run() {
    const figures: Figure[] = [];
    const js = await initialJsGzipBytes(WEB_DIR);
    figures.push({
      name: 'initial JavaScript of the production build, gzipped',
      value: js / 1000,
      unit: 'kB',
      goal: { atMost: 250 },
    });

    const dir = await mkdtemp(join(tmpdir(), 'fourfold-web-bench-'));
    const source = roundPattern(50);
    const model = compile(source).value.model;
    const svg = (await renderChartSvg(model)).svg;
    await writeFile(join(dir, 'round.ffp'), source);
    const files = createServer((req, res) => {
      res.writeHead(200, { 'Content-Type': 'image/svg+xml' }).end(svg);
    });
    await new Promise<void>((resolve) => files.listen(0, '127.0.0.1', resolve));
    const preview = await startPreview({ path: join(dir, 'round.ffp'), port: 0, webRoot: WEB_DIR });
    const browser = await launchChromium();
    try {
      const staticUrl = `http://127.0.0.1:${(files.address() as AddressInfo).port}/round.svg`;
      const app = await timeToBeads(browser, preview.url, model.beads.length);
      const still = await timeToBeads(browser, staticUrl, model.beads.length);
      figures.push({
        name: `time to first chart in Chromium, ${model.beads.length}-bead round: the app's preview page vs the same chart as a static SVG file`,
        value: app,
        baseline: still,
        unit: 'ms',
        goal: { atMost: 3 },
      });
    } finally {
      await browser.close();
      await preview.close();
      files.close();
      await rm(dir, { recursive: true, force: true });
    }
    return figures;
  },
};

export default bench;
