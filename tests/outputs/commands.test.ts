/** The tally, steps and kit commands end to end: argv through args.ts, the pattern on standard input. */
import { describe, expect, it } from 'vitest';
import { XMLValidator } from 'fast-xml-parser';
import { parseArgs } from '../../bin/args.js';
import type { CommandModule } from '../../bin/command.js';
import * as kit from '../../bin/commands/kit.js';
import * as steps from '../../bin/commands/steps.js';
import * as tallyCmd from '../../bin/commands/tally.js';
import { SMALL_PARTS_CAUTION } from '../../shared/caution.js';
import { fakeIO } from '../cli/fake-io.js';

const PATTERN = `title: Kestrel Fan
designer: Ines Marlow
colors:
  A  #F4F1EA  chalk
  B  #2E6F8E  deep teal
  C  #C98B2B  honey
row 1: BBBB
row 2: *AAAA BA +AAA
row 3: *AAAA AB CC BA +AAA
row 4: *BBBB BA (AC CC)x2 +BBB
`;

async function run(mod: CommandModule, argv: string[], stdin = PATTERN, tty = false) {
  const parsed = parseArgs(argv);
  expect(parsed.error).toBeUndefined();
  const io = fakeIO({ stdin, tty });
  const code = await mod.run(parsed.value!, io);
  return { code, out: io.out(), err: io.err() };
}

describe('fourfold tally', () => {
  it('prints the fourfold.tally/1 JSON; the fan has 2R^2 + 3R - 1 beads', async () => {
    const { code, out } = await run(tallyCmd, ['tally', '-', '--format', 'json']);
    expect(code).toBe(0);
    const t = JSON.parse(out);
    // Source: NOTATION.md section 8, the growing fan after R = 4 rows: 2*16 + 12 - 1 = 43.
    expect(t.beads).toBe(43);
    expect(t.rows.map((r: { units: number }) => r.units)).toEqual([1, 3, 5, 7]);
  });

  it('applies --spare, --pack, --working-length and --tail', async () => {
    const base = JSON.parse((await run(tallyCmd, ['tally', '-', '--format', 'json'])).out);
    const t = JSON.parse(
      (
        await run(tallyCmd, [
          'tally',
          '-',
          '--format',
          'json',
          '--spare',
          '50%',
          '--pack',
          '5',
          '--working-length',
          '40cm',
          '--tail',
          '15cm',
        ])
      ).out,
    );
    expect(t.spare).toBe(0.5);
    for (const c of t.colors) expect(c.buyGrams % 5).toBe(0);
    // 10 cm of beading thread per 40 cm piece: more threads than with 150 cm.
    expect(t.thread.threads).toBeGreaterThan(base.thread.threads);
  });

  it('refuses a working length that the tails use up, as a usage error', async () => {
    const { code, err } = await run(tallyCmd, ['tally', '-', '--working-length', '30cm', '--tail', '15cm']);
    expect(code).toBe(2);
    expect(err).toContain('leaves no thread to bead with');
  });

  it('prints a table with swatches only on a colour terminal, and CSV', async () => {
    expect((await run(tallyCmd, ['tally', '-'])).out).not.toContain('\x1b[');
    expect((await run(tallyCmd, ['tally', '-'], PATTERN, true)).out).toContain('\x1b[48;2;244;241;234m');
    expect((await run(tallyCmd, ['tally', '-', '--format', 'csv'])).out.split('\r\n')[0]).toMatch(/^kind,key,name/);
  });

  it('prints the errors and nothing else for a broken pattern (exit 1)', async () => {
    const { code, out, err } = await run(
      tallyCmd,
      ['tally', '-'],
      PATTERN.replace('BA +AAA\nrow 3', 'BAA +AAA\nrow 3'),
    );
    expect(code).toBe(1);
    expect(out).toBe('');
    expect(err).toContain('bead-count');
  });

  it('closes the diagnostics of a broken pattern with one line saying nothing was printed, for steps and kit too', async () => {
    const broken = PATTERN.replace('BA +AAA\nrow 3', 'BAA +AAA\nrow 3');
    const cases: [CommandModule, string, string][] = [
      [tallyCmd, 'tally', 'tally'],
      [steps, 'steps', 'steps'],
      [kit, 'kit', 'kit sheet'],
    ];
    for (const [mod, name, what] of cases) {
      const { code, out, err } = await run(mod, [name, '-'], broken);
      expect(code).toBe(1);
      expect(out).toBe('');
      expect(err.endsWith(`fourfold: no ${what} for '<stdin>': fix the errors above first\n`)).toBe(true);
    }
  });
});

describe('fourfold steps', () => {
  it('prints text by default and JSON, Markdown and HTML on request', async () => {
    const text = await run(steps, ['steps', '-']);
    expect(text.code).toBe(0);
    expect(text.out).toContain('Row 4: 7 units, 17 new beads, working right to left');
    expect(JSON.parse((await run(steps, ['steps', '-', '--format', 'json'])).out).schema).toBe('fourfold.steps/1');
    expect((await run(steps, ['steps', '-', '--format', 'md'])).out).toMatch(/^# Kestrel Fan/);
    expect(XMLValidator.validate((await run(steps, ['steps', '-', '--format', 'html'])).out)).toBe(true);
  });
});

describe('fourfold kit', () => {
  it('prints Markdown with the caution, HTML, and JSON', async () => {
    const md = await run(kit, ['kit', '-', '--pack', '5']);
    expect(md.code).toBe(0);
    expect(md.out).toContain(SMALL_PARTS_CAUTION);
    expect(md.out).toContain('x 5 g pack');
    expect(XMLValidator.validate((await run(kit, ['kit', '-', '--format', 'html'])).out)).toBe(true);
    const json = JSON.parse((await run(kit, ['kit', '-', '--format', 'json'])).out);
    expect(json.schema).toBe('fourfold.kit/1');
    expect(json.tally.beads).toBe(43);
    expect(json.caution).toBe(SMALL_PARTS_CAUTION);
  });
});
