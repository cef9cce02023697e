/**
 * The whole viewer in Chromium against the real server and MariaDB: a
 * designer uploads, checks the chart against the tally, steps through a row,
 * downloads the CLI's bytes, shares by link and by invitation; the invited
 * tester sees only that pattern and leaves a note the designer resolves.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchChromium, shot, watchErrors } from './browser.js';
import { PASSWORD, startViewer, type Viewer } from './viewer-server.js';

// Examples of the demo studio: Heron Band is a flat band 3 units wide and 12 rows long.
const EXAMPLE = join(process.cwd(), 'examples', 'heron-band.ffp');
const OTHER = join(process.cwd(), 'examples', 'tern-panel.ffp');
const TITLE = 'Heron Band';
/** Source: NOTATION.md section 8, a flat panel of n units by r rows has n(r + 1) + r(n + 1) beads. */
const panelBeads = (n: number, r: number) => n * (r + 1) + r * (n + 1);
const BEADS = panelBeads(3, 12);
const TESTER = 'new.tester@example.com';

let viewer: Viewer;
let browser: Browser;
let dir: string;
let designer: BrowserContext;
let page: Page;
let patternId = 0;
let errors: string[] = [];

beforeAll(async () => {
  [viewer, browser, dir] = await Promise.all([
    startViewer(),
    launchChromium(),
    mkdtemp(join(tmpdir(), 'fourfold-e2e-')),
  ]);
  designer = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  designer.setDefaultTimeout(10_000);
  page = await designer.newPage();
  errors = watchErrors(page);
});
afterAll(async () => {
  await browser?.close();
  await viewer?.close();
  if (dir) await rm(dir, { recursive: true, force: true });
});

async function signIn(p: Page, email: string, password = PASSWORD) {
  await p.goto(`${viewer.url}/sign-in`);
  await p.getByLabel('E-mail').fill(email);
  await p.getByLabel('Password').fill(password);
  await p.getByRole('button', { name: 'Sign in' }).click();
  await p.getByRole('heading', { name: 'Library', exact: true }).waitFor();
}

const placeText = (p: Page) => p.getByTestId('stepper-place').textContent();

/** The page's cumulative layout shift so far (shifts right after input do not count). */
const layoutShift = (p: Page) =>
  p.evaluate(
    () =>
      new Promise<number>((resolve) => {
        type Shift = { value: number; hadRecentInput: boolean };
        // Typed for Node, whose entry types do not include the browser's 'layout-shift'.
        const init = { type: 'layout-shift' as 'mark', buffered: true };
        new PerformanceObserver((list) =>
          resolve(
            (list.getEntries() as unknown as Shift[]).reduce((sum, e) => sum + (e.hadRecentInput ? 0 : e.value), 0),
          ),
        ).observe(init);
        // With no shift at all there is no entry, and the observer never calls back.
        setTimeout(() => resolve(0), 500);
      }),
  );

describe('designer and tester in the browser', () => {
  it('signs in, uploads a pattern, and sees a chart with as many beads as its tally', async () => {
    await signIn(page, 'designer@example.com');
    await shot(page, 'library');
    await page.getByRole('link', { name: 'Upload', exact: true }).click();
    await page.getByLabel('Pattern files', { exact: true }).setInputFiles(EXAMPLE);
    await page.getByRole('article', { name: 'heron-band.ffp' }).getByText('No problems found').waitFor();
    await shot(page, 'upload-checked');
    await page.getByRole('button', { name: 'Save this pattern' }).click();
    await page.waitForURL(/\/patterns\/\d+$/);
    patternId = Number(/\/patterns\/(\d+)$/.exec(page.url())![1]);
    await page.getByRole('heading', { name: TITLE, exact: true }).waitFor();
    // The move to the new page put focus on its heading, so a screen reader announces it.
    await expect
      .poll(() =>
        page.evaluate(
          () =>
            (globalThis as unknown as { document: { activeElement: { textContent: string } | null } }).document
              .activeElement?.textContent,
        ),
      )
      .toBe(TITLE);

    const tallyText = await page.getByTestId('tally-beads').textContent();
    const beads = await page.getByTestId('chart').locator('[data-bead]').count();
    expect(beads).toBe(Number(tallyText!.replace(/\D/g, '')));
    expect(beads).toBe(BEADS);
    await page.getByTestId('chart').locator('[data-bead]').first().hover();
    expect(await page.getByTestId('bead-tooltip').textContent()).toMatch(/Row \d+, unit \d+, (base|far|top|near)/);
    await shot(page, 'pattern');
  });

  it('loads the pattern page without moving what is already on screen', async () => {
    await page.reload();
    await page.getByTestId('chart').locator('[data-bead]').first().waitFor();
    await page.getByTestId('tally-beads').waitFor();
    // Cumulative layout shift of the whole load; 0.1 is the "good" limit of web.dev's Core Web Vitals (from memory).
    expect(await layoutShift(page)).toBeLessThan(0.1);
    // Fit fills the pane's width: the chart's background is as wide as its box, not a narrow strip in the middle.
    const host = await page.getByTestId('chart').boundingBox();
    const drawn = await page.getByTestId('chart').locator('.ff-background').first().boundingBox();
    expect(Math.abs(drawn!.width - host!.width)).toBeLessThan(4);
    // The measure itself works: pushing the page down by a block is a shift it sees.
    await page.evaluate(() => {
      const doc = (
        globalThis as unknown as {
          document: {
            querySelector(s: string): { prepend(n: unknown): void };
            createElement(t: string): { style: { height: string } };
          };
        }
      ).document;
      const block = doc.createElement('div');
      block.style.height = '300px';
      doc.querySelector('main')!.prepend(block);
    });
    await expect.poll(() => layoutShift(page)).toBeGreaterThan(0);
    await page.reload();
  });

  it('steps through a row with the arrow keys and finds the place again after a reload', async () => {
    expect(await placeText(page)).toBe('Row 1, unit 1 of 3');
    await page.getByRole('heading', { name: TITLE }).click();
    const saved = page.waitForResponse(
      (r) => r.url().endsWith(`/api/patterns/${patternId}/place`) && r.request().method() === 'PUT',
    );
    for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowRight');
    expect(await placeText(page)).toBe('Row 2, unit 1 of 3');
    expect(await page.getByTestId('step-text').textContent()).toMatch(/Pick up/);
    expect(await page.locator('[data-bead].ff-highlight').count()).toBe(3);
    await saved;
    await page.reload();
    await page.getByTestId('stepper-place').waitFor();
    expect(await placeText(page)).toBe('Row 2, unit 1 of 3');
  });

  it('downloads the chart as SVG with the same bytes the CLI writes', async () => {
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Chart (SVG)' }).click(),
    ]);
    const got = await readFile((await download.path())!);
    const cliOut = join(dir, 'cli.svg');
    await promisify(execFile)(process.execPath, ['bin/fourfold.js', 'chart', EXAMPLE, '-o', cliOut]);
    const want = await readFile(cliOut);
    expect(got.length).toBeGreaterThan(1000);
    expect(got.equals(want)).toBe(true);
  });

  let shareUrl = '';
  it('creates a share link that opens in a fresh browser without signing in', async () => {
    await page.getByRole('button', { name: 'Create share link' }).click();
    shareUrl = (await page.getByTestId('share-url').textContent())!;
    expect(shareUrl).toMatch(new RegExp(`^${viewer.url}/s/[A-Za-z0-9_-]{40,}$`));
    // A dark system theme, which the page follows without being told.
    const stranger = await browser.newContext({ colorScheme: 'dark' });
    const p = await stranger.newPage();
    const strangerErrors = watchErrors(p);
    await p.goto(shareUrl);
    await p.getByRole('heading', { name: TITLE }).waitFor();
    expect(await p.getByTestId('chart').locator('[data-bead]').count()).toBe(BEADS);
    expect(await p.getByRole('button', { name: 'Sign out' }).count()).toBe(0);
    await p.keyboard.press('ArrowRight');
    expect(await placeText(p)).toBe('Row 1, unit 2 of 3');
    // Without an account the place is kept in this browser, and found again after a reload.
    const kept = () =>
      p.evaluate(() =>
        Object.keys((globalThis as unknown as { localStorage: object }).localStorage).some((k) =>
          k.startsWith('fourfold.place.s.'),
        ),
      );
    await expect.poll(kept).toBe(true);
    await p.reload();
    await p.getByTestId('stepper-place').waitFor();
    expect(await placeText(p)).toBe('Row 1, unit 2 of 3');
    expect(await p.locator('html').getAttribute('class')).toMatch(/\bdark\b/);
    expect(await p.getByTestId('chart').locator('svg').first().getAttribute('data-theme')).toBe('dark');
    await shot(p, 'shared-view-dark');
    expect(strangerErrors).toEqual([]);
    await stranger.close();
  });

  let inviteLink = '';
  it('invites a tester, whose invitation arrives in the outbox', async () => {
    await page.getByLabel("Tester's e-mail").fill(TESTER);
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${TESTER}.`).waitFor();
    await page.getByText(`Tester`).first().waitFor();
    await shot(page, 'sharing');
    const mail = viewer.mailer.outbox()!.find((m) => m.to.includes(TESTER));
    expect(mail).toBeDefined();
    inviteLink = /https?:\/\/\S+\/reset\?\S+/.exec(mail!.text)![0];
    expect(inviteLink.startsWith(`${viewer.url}/reset?`)).toBe(true);
  });

  let tester: BrowserContext;
  let tp: Page;
  let notedUnit = '';
  it('lets the tester choose a password, see only that pattern, and leave a note on a unit', async () => {
    tester = await browser.newContext({ viewport: { width: 360, height: 740 } });
    tester.setDefaultTimeout(10_000);
    tp = await tester.newPage();
    const testerErrors = watchErrors(tp);
    await tp.goto(inviteLink);
    await tp.getByLabel('New password', { exact: true }).fill('tester-pass-1');
    await tp.getByLabel('New password again').fill('tester-pass-1');
    await tp.getByRole('button', { name: 'Save the password and sign in' }).click();
    await tp.getByRole('heading', { name: 'Library', exact: true }).waitFor();
    const rows = tp.locator('tbody tr');
    expect(await rows.count()).toBe(1);
    expect(await rows.first().getByRole('link').textContent()).toBe(TITLE);
    await shot(tp, 'tester-library-phone');

    await rows.first().getByRole('link').click();
    await tp.getByTestId('chart').waitFor();
    await shot(tp, 'tester-pattern-phone');
    await tp.getByTestId('chart').locator('[data-bead][data-row="3"]').first().click();
    const place = (await placeText(tp))!;
    notedUnit = /Row 3, unit (\d+)/.exec(place)![1]!;
    await tp.getByLabel('Note', { exact: true }).fill('The second bead here reads as chalk on my screen.');
    await tp.getByRole('button', { name: 'Add note' }).click();
    await tp.getByTestId('feedback-note').getByText(`row 3, unit ${notedUnit}`).waitFor();
    await shot(tp, 'tester-note-phone');
    expect(testerErrors).toEqual([]);
  });

  it('shows the designer the open note on the chart, and resolves it', async () => {
    await page.reload();
    const note = page.getByTestId('feedback-note');
    await note.getByText('The second bead here reads as chalk on my screen.').waitFor();
    expect(await page.locator('[data-bead].ff-noted').count()).toBeGreaterThan(0);
    await note.getByRole('button', { name: 'Resolve' }).click();
    await page.getByText('Open notes (0)').waitFor();
    await page.getByText('Resolved notes (1)').waitFor();
    await shot(page, 'resolved');
    expect(errors).toEqual([]);
  });

  it('edits the source with live checks and a redrawn chart, saves a new version, and shows what changed in counts', async () => {
    const scripts: string[] = [];
    page.on('request', (r) => r.resourceType() === 'script' && scripts.push(r.url()));
    await page.reload();
    await page.getByTestId('chart').waitFor();
    // The editor is loaded only with its page.
    expect(scripts.some((u) => /pattern-edit/.test(u))).toBe(false);
    await page.getByRole('link', { name: 'Edit source' }).click();
    const editor = page.locator('.cm-content');
    await editor.waitFor();
    expect(scripts.some((u) => /pattern-edit/.test(u))).toBe(true);
    await editor.click();
    await page.keyboard.press('Control+End');
    // Unit 2 of a later row shares its near and base beads, so three keys are one too many.
    await page.keyboard.type('row 13: AAB BAB AA');
    await page.getByRole('heading', { name: 'Checks: 1 error', exact: true }).waitFor();
    expect(await page.getByText(/bead-count/).count()).toBeGreaterThan(0);
    await shot(page, 'editor-error');
    for (let i = 0; i < 'BAB AA'.length; i++) await page.keyboard.press('Backspace');
    await page.keyboard.type('BA AB');
    await page.getByRole('heading', { name: 'Checks: No problems found', exact: true }).waitFor();
    // One more row of the same width: 3 by 13.
    await expect.poll(() => page.getByTestId('chart').locator('[data-bead]').count()).toBe(panelBeads(3, 13));
    await page.getByRole('button', { name: 'Save as a new version' }).click();
    await page.waitForURL(new RegExp(`/patterns/${patternId}$`));
    await page.getByText('Version 2 against version 1').waitFor();
    expect(await page.getByTestId('count-changes').textContent()).toContain(
      `beads: ${BEADS} → ${panelBeads(3, 13)} (+7)`,
    );
    expect(await page.getByTestId('chart').locator('[data-bead]').count()).toBe(panelBeads(3, 13));
    await shot(page, 'versions');
    expect(errors).toEqual([]);
  });

  it('lays the pattern out for print with every row of steps and the small-parts caution', async () => {
    await page.getByRole('link', { name: 'Print' }).click();
    await page.getByRole('heading', { name: 'Steps', exact: true }).waitFor();
    await shot(page, 'print');
    expect(await page.getByRole('heading', { name: /^Row \d+: / }).count()).toBe(13);
    expect(await page.getByText(/Seed beads and needles are small parts/).count()).toBeGreaterThan(0);
    expect(await page.getByTestId('chart').locator('[data-bead]').count()).toBe(panelBeads(3, 13));
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await shot(page, 'print');
    await page.emulateMedia({ media: 'screen' });
    expect(errors).toEqual([]);
  });

  it('creates a personal access token for the CLI, shown once, that the API accepts', async () => {
    await page.getByRole('link', { name: 'Account' }).click();
    await page.getByLabel('Token name').fill('studio laptop');
    await page.getByRole('button', { name: 'Create token' }).click();
    const token = (await page.getByTestId('new-token').textContent())!.trim();
    const res = await fetch(`${viewer.url}/api/patterns`, { headers: { Authorization: `Bearer ${token}` } });
    expect(res.status).toBe(200);
    await page.reload();
    await page.getByRole('list', { name: 'Your tokens' }).getByText('studio laptop').waitFor();
    expect(await page.getByText(token).count()).toBe(0);
    await shot(page, 'account');
    expect(errors).toEqual([]);
  });

  it('shows the tester a not-found page for a pattern that was not shared with them', async () => {
    const login = await fetch(`${viewer.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'designer@example.com', password: PASSWORD }),
    });
    const { token } = (await login.json()) as { token: string };
    const made = await fetch(`${viewer.url}/api/patterns`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
      body: JSON.stringify({ source: await readFile(OTHER, 'utf8') }),
    });
    const other = ((await made.json()) as { items: { id: number }[] }).items[0]!.id;
    await tp.goto(`${viewer.url}/patterns/${other}`);
    await tp.getByRole('heading', { name: 'Not found', exact: true }).waitFor();
    expect(await tp.getByText('Tern Panel').count()).toBe(0);
    await shot(tp, 'not-found');
    await tester.close();
  });

  it('shows an admin the accounts and the caught invitation mail', async () => {
    const admin = await browser.newContext();
    admin.setDefaultTimeout(10_000);
    const p = await admin.newPage();
    const adminErrors = watchErrors(p);
    await signIn(p, 'admin@example.com');
    await p.getByRole('link', { name: 'Admin' }).click();
    await p.getByRole('cell', { name: TESTER }).waitFor();
    expect(await p.getByLabel(`Role of new.tester`).inputValue()).toBe('tester');
    await p.getByRole('heading', { name: 'Outbox (development)', exact: true }).waitFor();
    expect(await p.getByText(`to ${TESTER}`).count()).toBeGreaterThan(0);
    await shot(p, 'admin');
    expect(adminErrors).toEqual([]);
    await admin.close();
  });
});
